package dev.proofrun.paper;

import java.util.ArrayList;
import java.util.List;

/** Line breaking for text set in one face and size. */
public final class LineBreaker {

    private LineBreaker() {
    }

    /**
     * Breaks text into lines no wider than {@code width}: greedily at spaces, at explicit newlines, and
     * inside a word only when the word alone is wider than a line. Runs of spaces collapse to one.
     *
     * @param text  the text
     * @param face  the face it is set in
     * @param size  font size in points
     * @param width the line width in points, &gt; 0
     * @return the lines, at least one (possibly empty)
     * @throws IllegalArgumentException if width is not positive
     */
    public static List<String> wrap(String text, Typeface face, float size, float width) {
        if (!(width > 0)) {
            throw new IllegalArgumentException("wrap width must be > 0");
        }
        List<String> lines = new ArrayList<>();
        for (String paragraph : text.split("\n", -1)) {
            wrapParagraph(face.printable(paragraph), face, size, width, lines);
        }
        return lines;
    }

    private static void wrapParagraph(String text, Typeface face, float size, float width, List<String> lines) {
        float space = face.width(" ", size);
        StringBuilder line = new StringBuilder();
        float lineWidth = 0;
        for (String word : text.trim().split(" +")) {
            if (word.isEmpty()) {
                continue;
            }
            float w = face.width(word, size);
            if (line.length() > 0 && lineWidth + space + w <= width) {
                line.append(' ').append(word);
                lineWidth += space + w;
                continue;
            }
            if (line.length() > 0) {
                lines.add(line.toString());
                line.setLength(0);
                lineWidth = 0;
            }
            if (w <= width) {
                line.append(word);
                lineWidth = w;
                continue;
            }
            // A word wider than the line: cut it where it must be cut.
            int start = 0;
            for (int i = 1; i <= word.length(); i++) {
                if (face.width(word.substring(start, i), size) > width && i - 1 > start) {
                    lines.add(word.substring(start, i - 1));
                    start = i - 1;
                }
            }
            line.append(word.substring(start));
            lineWidth = face.width(line.toString(), size);
        }
        lines.add(line.toString());
    }

    /**
     * The text shortened with an ellipsis so that it fits the width (whole text when it fits).
     *
     * @return the printable text, shortened if needed
     */
    public static String fit(String text, Typeface face, float size, float width) {
        String s = face.printable(text);
        if (face.width(s, size) <= width) {
            return s;
        }
        String dots = "\u2026";
        int end = s.length();
        while (end > 0 && face.width(s.substring(0, end) + dots, size) > width) {
            end--;
        }
        return s.substring(0, end) + dots;
    }
}
