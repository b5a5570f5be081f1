package dev.proofrun.report;

import dev.proofrun.grade.Verdict;
import dev.proofrun.paper.Block;
import dev.proofrun.paper.PageCanvas;
import dev.proofrun.paper.Paragraph;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.paper.Typeface;

/**
 * A verdict's badge followed by text: a framed tag holding a shape and the verdict in words, then the text
 * wrapped beside it. The report is black and white, and the shape, not a colour, tells the verdicts apart at a
 * glance (also for colour-blind readers and on a photocopy); the word says it in full.
 *
 * <ul>
 * <li>{@link Verdict#DEMONSTRATED}: a filled disc.</li>
 * <li>{@link Verdict#INCONCLUSIVE}: an open ring.</li>
 * <li>{@link Verdict#NOT_DEMONSTRATED}: an open triangle standing on its point.</li>
 * <li>{@link Verdict#NOT_VALID}: a crossed square.</li>
 * </ul>
 *
 * @param verdict the verdict
 * @param text    what follows the badge (may be empty)
 * @param face    the text's face (the badge's word is always bold)
 * @param bold    the bold face
 * @param size    font size of both
 */
record VerdictBadge(Verdict verdict, String text, Typeface face, Typeface bold, float size) implements Block {

    private static final float PAD = 3f;

    /** Width of the tag: shape, word and padding. */
    float badgeWidth() {
        return PAD + shapeSize() + PAD + bold.width(verdict.words(), size) + PAD;
    }

    private float shapeSize() {
        return size * 0.8f;
    }

    private float badgeHeight() {
        return size * 1.45f;
    }

    private Paragraph body(float width) {
        return new Paragraph(text, face, size, 1.3f, 0);
    }

    private float bodyWidth(float width) {
        return width - badgeWidth() - PAD * 2;
    }

    @Override
    public float height(float width) {
        float body = text.isEmpty() ? 0 : body(width).height(bodyWidth(width));
        return Math.max(badgeHeight() + 1, body);
    }

    @Override
    public void draw(PageCanvas c, float left, float top, float width) {
        float h = badgeHeight();
        float bottom = top - h;
        c.pen(LineStyle.solid(0.9f));
        c.rect(left, bottom, badgeWidth(), h);
        float s = shapeSize();
        float cx = left + PAD + s / 2;
        float cy = bottom + h / 2;
        drawShape(c, verdict, cx, cy, s);
        float base = cy - bold.capHeight(size) / 2;
        c.text(bold, size, left + PAD + s + PAD, base, verdict.words());
        if (!text.isEmpty()) {
            body(width).draw(c, left + badgeWidth() + PAD * 2, top, bodyWidth(width));
        }
    }

    /** The verdict's shape, centred on (x, y), of the given size. */
    static void drawShape(PageCanvas c, Verdict v, float x, float y, float size) {
        float r = size / 2;
        switch (v) {
            case DEMONSTRATED -> c.marker(PageCanvas.Marker.DOT, x, y, size);
            case INCONCLUSIVE -> {
                c.pen(LineStyle.solid(1.1f));
                c.marker(PageCanvas.Marker.RING, x, y, size - 1f);
            }
            case CONTINUE -> { // an open triangle pointing on: collect the next stage
                c.pen(LineStyle.solid(1.1f));
                c.polyline(new double[] {x - r, x + r, x - r, x - r}, new double[] {y + r, y, y - r, y + r});
            }
            case NOT_DEMONSTRATED -> {
                c.pen(LineStyle.solid(1.1f));
                c.polyline(new double[] {x - r, x + r, x, x - r}, new double[] {y + r, y + r, y - r, y + r});
            }
            default -> {
                c.pen(LineStyle.solid(0.9f));
                c.rect(x - r, y - r, size, size);
                c.marker(PageCanvas.Marker.CROSS, x, y, size);
            }
        }
    }
}
