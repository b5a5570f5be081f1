package dev.proofrun.paper;

import java.util.List;

/**
 * Blocks stacked inside a frame with padding, kept on one page: a call-out such as a caution, or the
 * verdict box of a report.
 *
 * @param blocks the content, top to bottom
 * @param pad    padding inside the frame, points
 * @param pen    the frame's line
 * @param shade  background grey (1 for none)
 */
public record Framed(List<Block> blocks, float pad, LineStyle pen, float shade) implements Block {

    public Framed {
        blocks = List.copyOf(blocks);
    }

    /** A frame with a firm rule, 6 pt padding and no shade. */
    public static Framed of(List<Block> blocks) {
        return new Framed(blocks, 6f, LineStyle.RULE, 1f);
    }

    @Override
    public float height(float width) {
        float h = 2 * pad;
        for (Block b : blocks) {
            h += b.height(width - 2 * pad);
        }
        return h;
    }

    @Override
    public void draw(PageCanvas canvas, float left, float top, float width) {
        float h = height(width);
        if (shade < 1f) {
            canvas.fillRect(left, top - h, width, h, shade);
        }
        canvas.pen(pen);
        canvas.rect(left, top - h, width, h);
        float y = top - pad;
        for (Block b : blocks) {
            b.draw(canvas, left + pad, y, width - 2 * pad);
            y -= b.height(width - 2 * pad);
        }
    }
}
