package dev.proofrun.paper;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A table of wrapped text cells with a shaded header row and hairline borders. Each row is one
 * {@link Block} (rows never split); start the table in a {@link Flow} with {@link #header()} so the header
 * repeats on every page the table runs onto.
 */
public final class TextTable {

    /** Horizontal alignment inside a cell. */
    public enum Align { LEFT, RIGHT, CENTRE }

    /**
     * A column.
     *
     * @param label header text
     * @param share relative width; the columns share the table's width in these proportions
     * @param align alignment of body cells
     */
    public record Column(String label, float share, Align align) {
        public Column {
            Objects.requireNonNull(label, "label");
            if (!(share > 0)) {
                throw new IllegalArgumentException("column share must be > 0");
            }
        }

        public static Column left(String label, float share) {
            return new Column(label, share, Align.LEFT);
        }

        public static Column right(String label, float share) {
            return new Column(label, share, Align.RIGHT);
        }
    }

    /** Cell padding in points. */
    public static final float PAD = 3f;
    /** Header shade (0 black … 1 white): light enough to print grey on any laser printer. */
    public static final float HEADER_GRAY = 0.88f;

    private final List<Column> columns;
    private final Typeface regular;
    private final Typeface bold;
    private final float size;

    private TextTable(List<Column> columns, Typeface regular, Typeface bold, float size) {
        this.columns = List.copyOf(columns);
        this.regular = regular;
        this.bold = bold;
        this.size = size;
    }

    /**
     * A table with the given columns, body text in {@code regular} at {@code size}, header in {@code bold}.
     *
     * @throws IllegalArgumentException if there are no columns or the size is below 6 pt
     */
    public static TextTable of(List<Column> columns, Typeface regular, Typeface bold, float size) {
        if (columns.isEmpty() || size < 6) {
            throw new IllegalArgumentException("a table needs columns and text of at least 6 pt");
        }
        return new TextTable(columns, regular, bold, size);
    }

    /** The header row. */
    public Block header() {
        List<String> labels = new ArrayList<>();
        for (Column c : columns) {
            labels.add(c.label());
        }
        return new Row(labels, bold, true, 0);
    }

    /**
     * A body row.
     *
     * @throws IllegalArgumentException if the number of cells differs from the number of columns
     */
    public Block row(List<String> cells) {
        if (cells.size() != columns.size()) {
            throw new IllegalArgumentException("a row needs one cell per column");
        }
        return new Row(clipped(cells), regular, false, 0);
    }

    /** Longest cell text set in a body row; longer text is cut with an ellipsis, so a row always fits a page. */
    public static final int CELL_CHARACTERS = 600;

    private static List<String> clipped(List<String> cells) {
        List<String> out = new java.util.ArrayList<>(cells.size());
        for (String c : cells) {
            out.add(c.length() <= CELL_CHARACTERS ? c : c.substring(0, CELL_CHARACTERS - 1) + "\u2026");
        }
        return List.copyOf(out);
    }

    /** A body row at least {@code minHeight} points tall (room to write or sign by hand). */
    public Block row(float minHeight, List<String> cells) {
        if (cells.size() != columns.size()) {
            throw new IllegalArgumentException("a row needs one cell per column");
        }
        return new Row(clipped(cells), regular, false, minHeight);
    }

    /** A body row. */
    public Block row(String... cells) {
        return row(List.of(cells));
    }

    private float[] widths(float width) {
        float total = 0;
        for (Column c : columns) {
            total += c.share();
        }
        float[] w = new float[columns.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = width * columns.get(i).share() / total;
        }
        return w;
    }

    private final class Row implements Block {
        private final List<String> cells;
        private final Typeface face;
        private final boolean head;
        private final float minHeight;
        private float laidOutWidth = -1;
        private List<List<String>> lines;

        Row(List<String> cells, Typeface face, boolean head, float minHeight) {
            this.cells = cells;
            this.face = face;
            this.head = head;
            this.minHeight = minHeight;
        }

        private List<List<String>> lines(float width) {
            if (width != laidOutWidth) {
                float[] w = widths(width);
                lines = new ArrayList<>();
                for (int i = 0; i < w.length; i++) {
                    lines.add(LineBreaker.wrap(cells.get(i), face, size, Math.max(1, w[i] - 2 * PAD)));
                }
                laidOutWidth = width;
            }
            return lines;
        }

        @Override
        public float height(float width) {
            int most = 1;
            for (List<String> l : lines(width)) {
                most = Math.max(most, l.size());
            }
            return Math.max(minHeight, most * size * 1.25f + 2 * PAD);
        }

        @Override
        public void draw(PageCanvas canvas, float left, float top, float width) {
            float h = height(width);
            float[] w = widths(width);
            if (head) {
                canvas.fillRect(left, top - h, width, h, HEADER_GRAY);
            }
            canvas.pen(LineStyle.HAIR);
            float x = left;
            for (int i = 0; i < w.length; i++) {
                canvas.rect(x, top - h, w[i], h);
                float baseline = top - PAD - face.ascent(size);
                Align align = head ? Align.LEFT : columns.get(i).align();
                for (String line : lines(width).get(i)) {
                    switch (align) {
                        case LEFT -> canvas.text(face, size, x + PAD, baseline, line);
                        case RIGHT -> canvas.textRight(face, size, x + w[i] - PAD, baseline, line);
                        case CENTRE -> canvas.textCentred(face, size, x + w[i] / 2, baseline, line);
                        default -> throw new IllegalStateException(align.name());
                    }
                    baseline -= size * 1.25f;
                }
                x += w[i];
            }
        }
    }
}
