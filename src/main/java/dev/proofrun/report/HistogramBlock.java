package dev.proofrun.report;

import dev.proofrun.paper.PageCanvas;
import dev.proofrun.paper.LineStyle;
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
    void drawPlot(PageCanvas c, float left, float top, float width) {
        Histogram h = Histogram.of(readings, limits, nominal, step, curve);
        PlotArea area = plotArea(left, top, width, MARGIN, FOOT, HEIGHT - 48, h.lo(), h.hi(), 0, h.yMax());
        for (int i = 0; i < h.counts().length; i++) {
            if (h.counts()[i] == 0) {
                continue;
            }
            float x0 = area.x(h.edge(i));
            float x1 = area.x(h.edge(i + 1));
            float y1 = area.y(h.counts()[i]);
            c.fillRect(x0, area.bottom(), x1 - x0, y1 - area.bottom(), 0.85f);
            c.pen(LineStyle.HAIR);
            c.rect(x0, area.bottom(), x1 - x0, y1 - area.bottom());
        }
        area.axes(c, regular, true);
        int points = h.curveX().length;
        double[] px = new double[points];
        double[] py = new double[points];
        for (int i = 0; i < points; i++) {
            px[i] = area.x(h.curveX()[i]);
            py[i] = Double.isFinite(h.curveY()[i]) && h.curveY()[i] <= h.yMax() ? area.y(h.curveY()[i]) : Double.NaN;
        }
        c.pen(LineStyle.solid(1.1f));
        c.polyline(px, py);
        LineStyle limit = LineStyle.solid(1.6f);
        limits.lower().ifPresent(v -> area.vline(c, limit, v, bold, "LSL " + ReportNumbers.value(v)));
        limits.upper().ifPresent(v -> area.vline(c, limit, v, bold, "USL " + ReportNumbers.value(v)));
        if (Double.isFinite(nominal)) {
            area.vline(c, LineStyle.dashed(0.6f, 1, 2), nominal, regular, null);
        }
        caption(c, area, top, h.caption());
    }

    /** The bins for readings from min to max, see {@link Histogram#bins}. */
    static Histogram.Bins bins(double min, double max, int n, double step) {
        return Histogram.bins(min, max, n, step);
    }
}
