package dev.proofrun.sheet.layout;

import java.util.List;

/**
 * Wrapped text in one face and size, drawn as one {@link Block} (so a paragraph never splits across
 * pages; keep paragraphs short).
 *
 * @param text    the text; newlines start new lines
 * @param face    the face
 * @param size    font size in points
 * @param leading distance between baselines as a multiple of the size (1.25 reads well)
 * @param indent  left indent in points
 */
public record Paragraph(String text, Typeface face, float size, float leading, float indent) implements Block {

    /** Body text: the face at the size with 1.3 leading and no indent. */
    public static Paragraph of(String text, Typeface face, float size) {
        return new Paragraph(text, face, size, 1.3f, 0);
    }

    /** The same paragraph with a left indent. */
    public Paragraph indented(float points) {
        return new Paragraph(text, face, size, leading, points);
    }

    private List<String> lines(float width) {
        return Text.wrap(text, face, size, width - indent);
    }

    @Override
    public float height(float width) {
        return lines(width).size() * size * leading;
    }

    @Override
    public void draw(Canvas canvas, float left, float top, float width) {
        float baseline = top - face.ascent(size) - (leading * size - face.ascent(size) - face.descent(size)) / 2;
        for (String line : lines(width)) {
            canvas.text(face, size, left + indent, baseline, line);
            baseline -= size * leading;
        }
    }
}
