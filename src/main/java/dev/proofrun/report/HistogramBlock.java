package dev.proofrun.report;

import dev.proofrun.sheet.layout.Canvas;
import dev.proofrun.sheet.layout.Pen;
import dev.proofrun.sheet.layout.PlotArea;
import dev.proofrun.sheet.layout.Typeface;
import dev.proofrun.stats.SpecLimits;

/**
 * The readings as a histogram (outlined bars, light grey), the specification limits as heavy lines, the
 * nominal dotted, and the fitted model's density scaled to counts (N × bin width × f(x)) as a solid curve.
 * Bins: ⌈√N⌉ between 8 and 40, equal width over the readings' range.
 */
final class HistogramBlock extends PlotBlock {

    private static final float HEIGHT = 150f;

    private final double[] readings;
    private final SpecLimits limits;
    private final double nominal;
    private final ModelCurve curve;

    HistogramBlock(double[] readings, SpecLimits limits, double nominal, ModelCurve curve, String title,
            Typeface regular, Typeface bold) {
        super(HEIGHT, title, regular, bold);
        this.readings = readings;
        this.limits = limits;
        this.nominal = nominal;
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
        int bins = (int) Math.max(8, Math.min(40, Math.ceil(Math.sqrt(readings.length))));
        double w = max > min ? (max - min) / bins : 1;
        long[] counts = new long[bins];
        for (double x : readings) {
            counts[Math.min(bins - 1, (int) ((x - min) / w))]++;
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
        for (int b = 0; b < bins; b++) {
            if (counts[b] == 0) {
                continue;
            }
            float x0 = area.x(min + b * w);
            float x1 = area.x(min + (b + 1) * w);
            float y1 = area.y(counts[b]);
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
        caption(c, area, top, "reading; bars: counts in " + bins + " bins; curve: fitted " + curve.model().id() + " model" + (Double.isFinite(nominal) ? "; dotted: nominal" : ""));
    }
}
