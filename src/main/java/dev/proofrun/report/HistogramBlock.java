package dev.proofrun.report;

import dev.proofrun.paper.Canvas;
import dev.proofrun.paper.Pen;
import dev.proofrun.paper.PlotArea;
import dev.proofrun.paper.Typeface;
import dev.proofrun.stats.SpecLimits;

/**
 * The readings as a histogram (outlined bars, light grey), the specification limits as heavy lines, the
 * nominal dotted, and the fitted model's density scaled to counts (N × bin width × f(x)) as a solid curve.
 * Bins ({@link #bins}): about ⌈√N⌉ of them, between 8 and 40. With a known gauge step h every bin is a whole
 * number m of steps wide and its edges lie half a step off the gauge's grid, so each possible reading falls in
 * one bin and every bin holds the same number of possible readings; equal-width bins that ignore the step
 * hold one grid value in some and two in others, and the histogram turns into a comb. Without a step: equal
 * width over the readings' range.
 */
final class HistogramBlock extends PlotBlock {

    private static final float HEIGHT = 150f;

    private final double[] readings;
    private final SpecLimits limits;
    private final double nominal;
    private final double step;
    private final ModelCurve curve;

    /**
     * @param step the gauge's step (resolution), or NaN when unknown
     */
    HistogramBlock(double[] readings, SpecLimits limits, double nominal, double step, ModelCurve curve, String title,
            Typeface regular, Typeface bold) {
        super(HEIGHT, title, regular, bold);
        this.readings = readings;
        this.limits = limits;
        this.nominal = nominal;
        this.step = step;
        this.curve = curve;
    }

    @Override
    void drawPlot(Canvas c, float left, float top, float width) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double x : readings) {
            min = Math.min(min, x);
            max = Math.max(max, x);
        }
        Bins b = bins(min, max, readings.length, step);
        int bins = b.count();
        double w = b.width();
        double start = b.start();
        long[] counts = new long[bins];
        for (double x : readings) {
            counts[Math.max(0, Math.min(bins - 1, (int) Math.floor((x - start) / w)))]++;
        }
        double lo = min;
        double hi = max;
        if (limits.lower().isPresent()) {
            lo = Math.min(lo, limits.lower().getAsDouble());
            hi = Math.max(hi, limits.lower().getAsDouble());
        }
        if (limits.upper().isPresent()) {
            lo = Math.min(lo, limits.upper().getAsDouble());
            hi = Math.max(hi, limits.upper().getAsDouble());
        }
        double pad = (hi - lo) * 0.06;
        lo -= pad;
        hi += pad;
        long most = 1;
        for (long k : counts) {
            most = Math.max(most, k);
        }
        int steps = 200;
        double[] xs = new double[steps + 1];
        double[] ys = new double[steps + 1];
        double peak = 0;
        for (int i = 0; i <= steps; i++) {
            double x = lo + (hi - lo) * i / steps;
            xs[i] = x;
            ys[i] = readings.length * w * curve.density(x);
            if (Double.isFinite(ys[i])) {
                peak = Math.max(peak, ys[i]);
            }
        }
        double yMax = Math.max(most, Math.min(peak, most * 3.0)) * 1.12;
        PlotArea area = plotArea(left, top, width, MARGIN, FOOT, HEIGHT - 48, lo, hi, 0, yMax);
        for (int i = 0; i < bins; i++) {
            if (counts[i] == 0) {
                continue;
            }
            float x0 = area.x(start + i * w);
            float x1 = area.x(start + (i + 1) * w);
            float y1 = area.y(counts[i]);
            c.fillRect(x0, area.bottom(), x1 - x0, y1 - area.bottom(), 0.85f);
            c.pen(Pen.HAIR);
            c.rect(x0, area.bottom(), x1 - x0, y1 - area.bottom());
        }
        area.axes(c, regular, true);
        double[] px = new double[steps + 1];
        double[] py = new double[steps + 1];
        for (int i = 0; i <= steps; i++) {
            px[i] = area.x(xs[i]);
            py[i] = Double.isFinite(ys[i]) && ys[i] <= yMax ? area.y(ys[i]) : Double.NaN;
        }
        c.pen(Pen.solid(1.1f));
        c.polyline(px, py);
        Pen limit = Pen.solid(1.6f);
        limits.lower().ifPresent(v -> area.vline(c, limit, v, bold, "LSL " + Fmt.value(v)));
        limits.upper().ifPresent(v -> area.vline(c, limit, v, bold, "USL " + Fmt.value(v)));
        if (Double.isFinite(nominal)) {
            area.vline(c, Pen.dashed(0.6f, 1, 2), nominal, regular, null);
        }
        caption(c, area, top, "reading; bars: counts in " + bins + " bins" + b.words() + "; curve: fitted " + curve.model().id() + " model" + (Double.isFinite(nominal) ? "; dotted: nominal" : ""));
    }

    /**
     * The bins of a histogram.
     *
     * @param start left edge of the first bin
     * @param width width of every bin
     * @param count number of bins
     * @param steps gauge steps per bin, or 0 when the step is unknown
     */
    record Bins(double start, double width, int count, int steps) {

        /** What the caption says about the bins: "of 2 gauge steps", or nothing without a step. */
        String words() {
            return steps == 0 ? "" : steps == 1 ? " of one gauge step" : " of " + steps + " gauge steps";
        }
    }

    /**
     * Bins for readings from min to max: about ⌈√N⌉ (8 to 40); with a gauge step h, m·h wide with m the smallest
     * whole number that keeps the count at most that many, edges at min − h/2 + j·m·h.
     */
    static Bins bins(double min, double max, int n, double step) {
        int wanted = (int) Math.max(8, Math.min(40, Math.ceil(Math.sqrt(n))));
        if (step > 0 && Double.isFinite(step)) {
            long grid = Math.round((max - min) / step) + 1; // possible readings from min to max
            int m = (int) Math.max(1, (grid + wanted - 1) / wanted);
            double width = m * step;
            double start = min - step / 2;
            int count = (int) Math.max(1, (grid + m - 1) / m);
            return new Bins(start, width, count, m);
        }
        double width = max > min ? (max - min) / wanted : 1;
        return new Bins(min, width, wanted, 0);
    }
}
