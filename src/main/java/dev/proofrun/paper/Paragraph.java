package dev.proofrun.paper;

import java.util.List;

/**
 * Wrapped text in one face and size, drawn as one {@link Block}: a paragraph that fits a page never splits
 * across pages; one taller than a page (a 10,000-character remark) is placed in page-sized parts by
 * {@link Flow#place} ({@link #split}).
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
        return LineBreaker.wrap(text, face, size, width - indent);
    }

    /**
     * This paragraph in parts, each at most {@code maxHeight} points tall at this width (at least one line each),
     * whose lines together are this paragraph's lines.
     */
    public List<Paragraph> split(float width, float maxHeight) {
        List<String> lines = lines(width);
        int per = Math.max(1, (int) Math.floor(maxHeight / (size * leading)));
        List<Paragraph> parts = new java.util.ArrayList<>();
        for (int i = 0; i < lines.size(); i += per) {
            parts.add(new Paragraph(String.join("\n", lines.subList(i, Math.min(lines.size(), i + per))), face, size,
                    leading, indent));
        }
        return parts;
    }

    @Override
    public float height(float width) {
        return lines(width).size() * size * leading;
    }

    @Override
    public void draw(PageCanvas canvas, float left, float top, float width) {
        float baseline = top - face.ascent(size) - (leading * size - face.ascent(size) - face.descent(size)) / 2;
        for (String line : lines(width)) {
            canvas.text(face, size, left + indent, baseline, line);
            baseline -= size * leading;
        }
    }
}
