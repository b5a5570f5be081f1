package dev.proofrun.report;

import dev.proofrun.paper.PageCanvas;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.paper.PlotArea;
import dev.proofrun.paper.Typeface;
import java.util.Arrays;

/**
 * A probability plot under the fitted model ({@link ModelCurve}): the ordered readings, straightened, against
 * the model's quantiles at Blom's plotting positions, with the model's line. Points that bend away from the
 * line are where the model does not describe the data. At most {@value #MOST} points are drawn (evenly
 * spaced in rank, the extremes always).
 */
final class ProbabilityPlotBlock extends PlotBlock {

    private static final int MOST = 1500;
    private static final float HEIGHT = 150f;

    private final double[] readings;
    private final ModelCurve curve;

    ProbabilityPlotBlock(double[] readings, ModelCurve curve, String title, Typeface regular, Typeface bold) {
        super(HEIGHT, title, regular, bold);
        this.readings = readings;
        this.curve = curve;
    }

    @Override
    void drawPlot(PageCanvas c, float left, float top, float width) {
        double[] sorted = readings.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        int shown = Math.min(n, MOST);
        double[] q = new double[shown];
        double[] y = new double[shown];
        double yLo = Double.POSITIVE_INFINITY;
        double yHi = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < shown; j++) {
            int i = shown == 1 ? 0 : (int) Math.round((double) j * (n - 1) / (shown - 1));
            double p = (i + 1 - 0.375) / (n + 0.25);
            q[j] = curve.quantile(p);
            y[j] = curve.straighten(sorted[i]);
            if (Double.isFinite(y[j])) {
                yLo = Math.min(yLo, y[j]);
                yHi = Math.max(yHi, y[j]);
            }
        }
        double qLo = q[0];
        double qHi = q[shown - 1];
        yLo = Math.min(yLo, curve.line(qLo));
        yHi = Math.max(yHi, curve.line(qHi));
        double pad = (yHi - yLo) * 0.06;
        double qPad = (qHi - qLo) * 0.04;
        PlotArea area = plotArea(left, top, width, MARGIN, FOOT, HEIGHT - 38, qLo - qPad, qHi + qPad, yLo - pad,
                yHi + pad);
        area.axes(c, regular, true);
        c.pen(LineStyle.solid(1f));
        c.line(area.x(qLo - qPad), area.y(curve.line(qLo - qPad)), area.x(qHi + qPad), area.y(curve.line(qHi + qPad)));
        c.pen(LineStyle.solid(0.5f));
        for (int j = 0; j < shown; j++) {
            if (Double.isFinite(y[j])) {
                c.marker(PageCanvas.Marker.RING, area.x(q[j]), area.y(y[j]), shown > 300 ? 2f : 3f);
            }
        }
        String[] names = curve.axisNames();
        caption(c, area, top, names[0] + " (plotting position (i \u2212 3/8)/(N + 1/4)) "
                + "against " + names[1] + (n > shown ? "; " + shown + " of " + n + " readings shown" : ""));
    }
}
