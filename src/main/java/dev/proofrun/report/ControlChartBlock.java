package dev.proofrun.report;

import dev.proofrun.control.ControlChart;
import dev.proofrun.control.RuleFiring;
import dev.proofrun.paper.PageCanvas;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.paper.PlotArea;
import dev.proofrun.paper.Typeface;
import java.util.BitSet;

/**
 * One control chart drawn for print: the points joined by a thin line, the centre line solid, the control
 * limits dashed and labelled with their values, and every point at which a run rule fired marked with an
 * open ring (so flagged points stand out without colour). The horizontal axis is the subgroup number.
 * With more than {@value #DETAIL} points the line is drawn as the range of each of {@value #DETAIL} buckets.
 */
final class ControlChartBlock extends PlotBlock {

    private static final int DETAIL = 1500;
    private static final float HEIGHT = 132f;
    /** Room right of the plot area for the limits' labels. */
    private static final float LIMIT_LABELS = 74f;

    private final ControlChart chart;

    ControlChartBlock(ControlChart chart, String title, Typeface regular, Typeface bold) {
        super(HEIGHT, title, regular, bold);
        this.chart = chart;
    }

    @Override
    void drawPlot(PageCanvas c, float left, float top, float width) {
        double[] pts = chart.points();
        int count = pts.length;
        double lo = Math.min(chart.lcl(), chart.center());
        double hi = Math.max(chart.ucl(), chart.center());
        for (int i = 0; i < count; i++) {
            if (Double.isFinite(pts[i])) {
                lo = Math.min(lo, pts[i]);
                hi = Math.max(hi, pts[i]);
            }
            if (chart.pointUcl() != null && i < chart.pointUcl().length && Double.isFinite(chart.pointUcl()[i])) {
                hi = Math.max(hi, chart.pointUcl()[i]);
            }
        }
        double pad = (hi - lo) * 0.08;
        int first = chart.firstSubgroup() + 1;
        PlotArea area = plotArea(left, top, width, LIMIT_LABELS, FOOT, HEIGHT - 38, first - 0.5, first + count - 0.5,
                lo - pad, hi + pad);
        area.axes(c, regular, true);
        boolean varying = varies(chart.pointUcl()) || varies(chart.pointLcl());
        LineStyle limit = LineStyle.dashed(0.8f, 4, 2);
        if (varying) {
            steps(c, area, chart.pointUcl(), first, limit);
            steps(c, area, chart.pointLcl(), first, limit);
            c.text(regular, 7.5f, area.right() + 3, area.y(chart.ucl()) - 2.6f, "UCL varies");
        } else {
            int d = ReportNumbers.decimalsForSpan(chart.ucl() - chart.lcl());
            area.hline(c, limit, chart.ucl(), regular, "UCL " + ReportNumbers.value(chart.ucl(), d));
            area.hline(c, limit, chart.lcl(), regular, "LCL " + ReportNumbers.value(chart.lcl(), d));
        }
        int dc = varying ? -1 : ReportNumbers.decimalsForSpan(chart.ucl() - chart.lcl());
        area.hline(c, LineStyle.solid(0.6f), chart.center(), regular, "CL " + ReportNumbers.value(chart.center(), dc));

        c.pen(LineStyle.solid(0.5f));
        if (count <= DETAIL) {
            double[] xs = new double[count];
            double[] ys = new double[count];
            for (int i = 0; i < count; i++) {
                xs[i] = area.x(first + i);
                ys[i] = area.y(pts[i]);
            }
            c.polyline(xs, ys);
            for (int i = 0; i < count; i++) {
                if (Double.isFinite(pts[i])) {
                    c.marker(PageCanvas.Marker.DOT, (float) xs[i], (float) ys[i], count > 200 ? 1.2f : 2.2f);
                }
            }
        } else {
            int per = (count + DETAIL - 1) / DETAIL;
            for (int b = 0; b < count; b += per) {
                double mn = Double.POSITIVE_INFINITY;
                double mx = Double.NEGATIVE_INFINITY;
                for (int i = b; i < Math.min(count, b + per); i++) {
                    mn = Math.min(mn, pts[i]);
                    mx = Math.max(mx, pts[i]);
                }
                float x = area.x(first + b + per / 2.0);
                c.line(x, area.y(mn), x, area.y(mx) + 0.3f);
            }
        }
        BitSet flagged = new BitSet(count);
        for (RuleFiring s : chart.signals()) {
            flagged.set(s.index());
        }
        c.pen(LineStyle.solid(0.9f));
        for (int i = flagged.nextSetBit(0); i >= 0; i = flagged.nextSetBit(i + 1)) {
            c.marker(PageCanvas.Marker.RING, area.x(first + i), area.y(pts[i]), 6.5f);
        }
        caption(c, area, top, "subgroup; ring: a run rule fired at this point (" + flagged.cardinality() + " of "
                + count + ")");
    }

    private static boolean varies(double[] v) {
        if (v == null || v.length == 0) {
            return false;
        }
        for (double d : v) {
            if (Math.abs(d - v[0]) > 1e-12 * Math.max(1, Math.abs(v[0]))) {
                return true;
            }
        }
        return false;
    }

    private static void steps(PageCanvas c, PlotArea area, double[] v, int first, LineStyle pen) {
        double[] xs = new double[2 * v.length];
        double[] ys = new double[2 * v.length];
        for (int i = 0; i < v.length; i++) {
            xs[2 * i] = area.x(first + i - 0.5);
            xs[2 * i + 1] = area.x(first + i + 0.5);
            ys[2 * i] = area.y(v[i]);
            ys[2 * i + 1] = area.y(v[i]);
        }
        c.pen(pen);
        c.polyline(xs, ys);
    }
}
