package dev.proofrun.paper;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A rectangle on a page that maps data coordinates to page points, with axes, ticks at round numbers and
 * labels: the frame the report's charts draw into. Data outside the ranges is drawn as given (callers
 * choose ranges that include their data).
 */
public final class PlotArea {

    private final float left;
    private final float bottom;
    private final float width;
    private final float height;
    private final double xMin;
    private final double xMax;
    private final double yMin;
    private final double yMax;

    private PlotArea(float left, float bottom, float width, float height, double xMin, double xMax, double yMin,
            double yMax) {
        this.left = left;
        this.bottom = bottom;
        this.width = width;
        this.height = height;
        this.xMin = xMin;
        this.xMax = xMax;
        this.yMin = yMin;
        this.yMax = yMax;
    }

    /**
     * A plot area; an empty or non-finite range is widened to one unit around its value.
     *
     * @throws IllegalArgumentException if the box has no size
     */
    public static PlotArea of(float left, float bottom, float width, float height, double xMin, double xMax,
            double yMin, double yMax) {
        if (!(width > 0 && height > 0)) {
            throw new IllegalArgumentException("a plot area needs a positive size");
        }
        double[] x = widen(xMin, xMax);
        double[] y = widen(yMin, yMax);
        return new PlotArea(left, bottom, width, height, x[0], x[1], y[0], y[1]);
    }

    private static double[] widen(double lo, double hi) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            return new double[] {0, 1};
        }
        if (hi - lo <= Math.abs(hi) * 1e-12 || hi <= lo) {
            double d = Math.max(Math.abs(lo) * 0.01, 0.5);
            return new double[] {lo - d, hi + d};
        }
        return new double[] {lo, hi};
    }

    public float x(double value) {
        return (float) (left + (value - xMin) / (xMax - xMin) * width);
    }

    public float y(double value) {
        return (float) (bottom + (value - yMin) / (yMax - yMin) * height);
    }

    public float left() {
        return left;
    }

    public float bottom() {
        return bottom;
    }

    public float right() {
        return left + width;
    }

    public float top() {
        return bottom + height;
    }

    /** Frame, ticks and tick labels on the left and bottom axes, in the given face at 7.5 pt. */
    public void axes(PageCanvas c, Typeface face, boolean xTicks) {
        float size = 7.5f;
        c.pen(LineStyle.HAIR);
        c.rect(left, bottom, width, height);
        List<Double> ys = ticks(yMin, yMax, 5);
        for (double t : ys) {
            float py = y(t);
            c.line(left - 3, py, left, py);
            c.textRight(face, size, left - 5, py - size * 0.35f, label(t, ys));
        }
        if (xTicks) {
            List<Double> xs = ticks(xMin, xMax, 8);
            for (double t : xs) {
                float px = x(t);
                c.line(px, bottom - 3, px, bottom);
                c.textCentred(face, size, px, bottom - 4 - size, label(t, xs));
            }
        }
    }

    /** A horizontal line across the area at a data value, with a label at the right end. */
    public void hline(PageCanvas c, LineStyle pen, double value, Typeface face, String label) {
        c.pen(pen);
        float py = y(value);
        c.line(left, py, right(), py);
        if (label != null) {
            c.text(face, 7.5f, right() + 3, py - 2.6f, label);
        }
    }

    /** A vertical line across the area at a data value, with a label above the top. */
    public void vline(PageCanvas c, LineStyle pen, double value, Typeface face, String label) {
        c.pen(pen);
        float px = x(value);
        c.line(px, bottom, px, top());
        if (label != null) {
            c.textCentred(face, 7.5f, px, top() + 3, label);
        }
    }

    /**
     * Round tick values inside [lo, hi]: steps of 1, 2 or 5 times a power of ten, about {@code count} of
     * them (the usual "nice numbers" choice, {@link #step}).
     */
    public static List<Double> ticks(double lo, double hi, int count) {
        List<Double> out = new ArrayList<>();
        double span = hi - lo;
        if (!(span > 0) || !Double.isFinite(span)) {
            return out;
        }
        double step = step(span, count);
        for (double t = Math.ceil(lo / step) * step; t <= hi + step * 1e-9; t += step) {
            out.add(Math.abs(t) < step * 1e-9 ? 0.0 : t);
        }
        return out;
    }

    /**
     * The one tick rule of proofrun's charts, on paper and on screen: the step of 1, 2 or 5 × 10<sup>m</sup>
     * nearest to {@code span / count} (the raw step's mantissa below 1.5 → 1, below 3 → 2, below 7 → 5, else
     * 10). The density, {@code count}, is each chart's own choice: the report's blocks ask for 5 on the y axis and
     * 8 on the x axis, the screen for as many as its size holds with room for their labels. 1 for a span that
     * is not positive and finite.
     */
    public static double step(double span, int count) {
        double raw = span / Math.max(1, count);
        if (!(raw > 0) || !Double.isFinite(raw)) {
            return 1;
        }
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double norm = raw / mag;
        return (norm < 1.5 ? 1 : norm < 3 ? 2 : norm < 7 ? 5 : 10) * mag;
    }

    /** A tick label with as many decimals as the tick step needs (step 5 → 0, 0.002 → 3, 0.0005 → 4). */
    public static String label(double value, List<Double> ticks) {
        double step = ticks.size() > 1 ? ticks.get(1) - ticks.get(0) : Math.abs(value);
        int decimals = step > 0 ? Math.max(0, (int) Math.ceil(-Math.log10(step) - 1e-9)) : 0;
        return String.format(Locale.ROOT, "%." + Math.min(decimals, 8) + "f", value);
    }
}
