package dev.proofrun.paper;

/**
 * Something laid out top to bottom that must not be split across pages: a paragraph, a table row, a
 * chart. {@link Flow} asks its height for the width available and then draws it.
 */
public interface Block {

    /** Height in points when laid out at the given width. */
    float height(float width);

    /**
     * Draws the block.
     *
     * @param canvas where to draw
     * @param left   left edge, points from the page's left
     * @param top    top edge, points from the page's bottom
     * @param width  width available (the same as passed to {@link #height})
     */
    void draw(PageCanvas canvas, float left, float top, float width);

    /** An empty block of a fixed height: vertical space. */
    static Block space(float height) {
        return new Block() {
            @Override
            public float height(float width) {
                return height;
            }

            @Override
            public void draw(PageCanvas canvas, float left, float top, float width) {
                // nothing to draw
            }
        };
    }

    /** Several blocks stacked as one, so that a page break never falls between them (a short table with its note). */
    static Block stack(java.util.List<? extends Block> blocks) {
        java.util.List<Block> parts = java.util.List.copyOf(blocks);
        return new Block() {
            @Override
            public float height(float width) {
                float h = 0;
                for (Block b : parts) {
                    h += b.height(width);
                }
                return h;
            }

            @Override
            public void draw(PageCanvas canvas, float left, float top, float width) {
                float y = top;
                for (Block b : parts) {
                    b.draw(canvas, left, y, width);
                    y -= b.height(width);
                }
            }
        };
    }
}
