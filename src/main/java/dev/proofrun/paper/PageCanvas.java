package dev.proofrun.paper;

import java.io.IOException;
import java.io.UncheckedIOException;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.util.Matrix;

/**
 * Vector drawing on one page, in PDF points with the origin at the bottom left. A thin layer over
 * PDFBox's content stream that the sheet and the report share: text in an embedded {@link Typeface},
 * lines, polylines, rectangles, dashed lines and point markers. I/O failures surface as
 * {@link UncheckedIOException}.
 */
public final class PageCanvas implements AutoCloseable {

    /** Shapes for plotted points; distinguishable in black and white. */
    public enum Marker {
        /** A filled dot: an ordinary point. */
        DOT,
        /** An open circle with a larger radius: a point that drew attention. */
        RING,
        /** A filled square. */
        SQUARE,
        /** A diagonal cross. */
        CROSS
    }

    /** Bézier factor for a quarter circle, 4/3·(√2 − 1). */
    private static final float KAPPA = 0.5522848f;

    private final PDPageContentStream out;
    private LineStyle pen;

    PageCanvas(PDPageContentStream out) {
        this.out = out;
    }

    /** Draws text with its baseline starting at (x, baseline). Returns the width drawn. */
    public float text(Typeface face, float size, float x, float baseline, String text) {
        String s = face.printable(text);
        if (s.isEmpty()) {
            return 0;
        }
        try {
            out.beginText();
            out.setFont(face.font(), size);
            out.newLineAtOffset(x, baseline);
            out.showText(s);
            out.endText();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return face.width(s, size);
    }

    /** Draws text ending at {@code right}. */
    public void textRight(Typeface face, float size, float right, float baseline, String text) {
        text(face, size, right - face.width(text, size), baseline, text);
    }

    /** Draws text centred on {@code centre}. */
    public void textCentred(Typeface face, float size, float centre, float baseline, String text) {
        text(face, size, centre - face.width(text, size) / 2, baseline, text);
    }

    /** Draws text rotated by {@code radians} counter-clockwise about its start (x, y). */
    public void textRotated(Typeface face, float size, float x, float y, double radians, String text) {
        String s = face.printable(text);
        try {
            out.beginText();
            out.setFont(face.font(), size);
            out.setTextMatrix(Matrix.getRotateInstance(radians, x, y));
            out.showText(s);
            out.endText();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Sets the grey level for text and fills (0 black … 1 white). */
    public void fillGray(float gray) {
        try {
            out.setNonStrokingColor(gray);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Sets the pen for the lines that follow. */
    public void pen(LineStyle next) {
        if (next.equals(pen)) {
            return;
        }
        try {
            out.setLineWidth(next.width());
            out.setStrokingColor(next.gray());
            out.setLineDashPattern(next.dash(), 0);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        pen = next;
    }

    /** A straight line. */
    public void line(float x1, float y1, float x2, float y2) {
        try {
            out.moveTo(x1, y1);
            out.lineTo(x2, y2);
            out.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * A polyline through the points; a non-finite coordinate breaks the line there (the next finite
     * point starts a new piece).
     */
    public void polyline(double[] xs, double[] ys) {
        if (xs.length != ys.length) {
            throw new IllegalArgumentException("polyline needs as many x as y values");
        }
        try {
            boolean open = false;
            boolean any = false;
            for (int i = 0; i < xs.length; i++) {
                if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[i])) {
                    open = false;
                    continue;
                }
                if (open) {
                    out.lineTo((float) xs[i], (float) ys[i]);
                } else {
                    out.moveTo((float) xs[i], (float) ys[i]);
                    open = true;
                }
                any = true;
            }
            if (any) {
                out.stroke();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The outline of a rectangle with its lower left corner at (x, y). */
    public void rect(float x, float y, float width, float height) {
        try {
            out.addRect(x, y, width, height);
            out.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A filled rectangle in a grey level; the fill grey is reset to black afterwards. */
    public void fillRect(float x, float y, float width, float height, float gray) {
        try {
            out.setNonStrokingColor(gray);
            out.addRect(x, y, width, height);
            out.fill();
            out.setNonStrokingColor(0f);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A point marker of the given size (diameter or side) centred on (x, y), in the current pen. */
    public void marker(Marker shape, float x, float y, float size) {
        float r = size / 2;
        try {
            switch (shape) {
                case DOT -> {
                    circlePath(x, y, r);
                    out.fill();
                }
                case RING -> {
                    circlePath(x, y, r);
                    out.stroke();
                }
                case SQUARE -> {
                    out.addRect(x - r, y - r, size, size);
                    out.fill();
                }
                case CROSS -> {
                    out.moveTo(x - r, y - r);
                    out.lineTo(x + r, y + r);
                    out.moveTo(x - r, y + r);
                    out.lineTo(x + r, y - r);
                    out.stroke();
                }
                default -> throw new IllegalStateException(shape.name());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void circlePath(float x, float y, float r) throws IOException {
        float k = KAPPA * r;
        out.moveTo(x + r, y);
        out.curveTo(x + r, y + k, x + k, y + r, x, y + r);
        out.curveTo(x - k, y + r, x - r, y + k, x - r, y);
        out.curveTo(x - r, y - k, x - k, y - r, x, y - r);
        out.curveTo(x + k, y - r, x + r, y - k, x + r, y);
        out.closePath();
    }

    @Override
    public void close() {
        try {
            out.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
