package dev.proofrun.paper;

/**
 * A list item: a label ("1.", "–") in the left gutter and a paragraph beside it with a hanging indent.
 *
 * @param label  the label, set in the paragraph's face and size
 * @param body   the text
 * @param gutter width of the label column, points
 */
public record Item(String label, Paragraph body, float gutter) implements Block {

    @Override
    public float height(float width) {
        return body.height(width - gutter);
    }

    @Override
    public void draw(PageCanvas canvas, float left, float top, float width) {
        Paragraph label1 = new Paragraph(label, body.face(), body.size(), body.leading(), 0);
        label1.draw(canvas, left, top, gutter);
        body.draw(canvas, left + gutter, top, width - gutter);
    }
}
