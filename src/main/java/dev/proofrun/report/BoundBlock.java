package dev.proofrun.report;

import dev.proofrun.grade.IndexEvidence;
import dev.proofrun.paper.PageCanvas;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.paper.PlotArea;
import dev.proofrun.paper.Typeface;

/**
 * The capability argument in one picture: a scale of the index, the requirement c₀ as a heavy vertical line,
 * the estimate as a filled square, and a bar from the one-sided lower confidence bound to the estimate (to the
 * upper bound when the grade computed it, i.e. for an estimate below c₀). Demonstrated means the bar's left
 * end is at or right of the line.
 */
final class BoundBlock extends PlotBlock {

    private static final float HEIGHT = 70f;
    private static final float NOTE = 12f;
    /** The scale's strip in the frame: its axis this far above the frame's bottom edge, and its height. */
    private static final float SCALE_FOOT = 26f;
    private static final float SCALE_HEIGHT = 22f;

    private final IndexEvidence e;
    private final boolean notValid;

    /**
     * @param notValid the verdict is not-valid: the picture then says in its caption that the figures describe
     *                 the study's past, not the process, so the bar is not read as a capability statement
     */
    BoundBlock(IndexEvidence e, boolean notValid, Typeface regular, Typeface bold) {
        super(HEIGHT, null, regular, bold);
        this.e = e;
        this.notValid = notValid;
    }

    @Override
    public float height(float width) {
        return super.height(width) + (notValid ? NOTE : 0);
    }

    @Override
    void drawPlot(PageCanvas c, float left, float top, float width) {
        if (notValid) {
            c.text(bold, 7.5f, left + AXIS_LABELS, top - 8,
                    "Not valid: these figures describe the study's past, not the process.");
            top -= NOTE; // the frame starts under the note
        }
        String sym = e.index().symbol();
        double lo = min(e.lower(), e.required(), e.estimate());
        double hi = max(e.upper(), e.required(), e.estimate());
        double pad = (hi - lo) * 0.12 + 0.05;
        PlotArea area = plotArea(left, top, width, MARGIN, SCALE_FOOT, SCALE_HEIGHT, lo - pad, hi + pad, 0, 1);
        c.pen(LineStyle.HAIR);
        c.line(area.left(), area.bottom(), area.right(), area.bottom());
        for (double t : PlotArea.ticks(lo - pad, hi + pad, 8)) {
            float x = area.x(t);
            c.line(x, area.bottom() - 3, x, area.bottom());
            c.textCentred(regular, 7.5f, x, area.bottom() - 11, ReportNumbers.index(t));
        }
        float mid = area.y(0.5);
        // the bar runs from the lower bound (what the verdict compares with c0) to the upper bound when it was
        // computed (not-demonstrated), else to the estimate; each bound is one-sided at the stated confidence
        boolean hasUpper = Double.isFinite(e.upper());
        if (Double.isFinite(e.lower())) {
            double end = hasUpper ? e.upper() : e.estimate();
            c.pen(LineStyle.solid(2.2f));
            c.line(area.x(e.lower()), mid, area.x(end), mid);
            c.pen(LineStyle.solid(0.9f));
            c.line(area.x(e.lower()), mid - 5, area.x(e.lower()), mid + 5);
            c.textCentred(regular, 7.5f, area.x(e.lower()), mid + 8, "lower " + ReportNumbers.index(e.lower()));
            if (hasUpper) {
                c.line(area.x(e.upper()), mid - 5, area.x(e.upper()), mid + 5);
                c.textCentred(regular, 7.5f, area.x(e.upper()), mid + 8, "upper " + ReportNumbers.index(e.upper()));
            }
        }
        c.marker(PageCanvas.Marker.SQUARE, area.x(e.estimate()), mid, 5f);
        c.pen(LineStyle.dashed(1.4f, 3, 1.5f));
        float rx = area.x(e.required());
        // the requirement's label sits above the bounds' labels, so the two never overlap
        c.line(rx, area.bottom(), rx, area.top() + 13);
        c.text(bold, 7.5f, rx + 3, area.top() + 10, "required " + sym + " \u2265 " + ReportNumbers.index(e.required()));
        c.text(regular, 7.5f, left, mid - 2.6f, sym);
        String conf = ReportNumbers.fixed(e.confidence() * 100, 0) + " %";
        String bar = hasUpper ? "bar: lower to upper " + conf + " bound (each one-sided)"
                : "bar: lower " + conf + " bound (one-sided) to the estimate";
        caption(c, area, top, "square: estimate " + ReportNumbers.index(e.estimate()) + "; " + bar + "; dashed: the requirement");
    }

    private static double min(double... v) {
        double m = Double.POSITIVE_INFINITY;
        for (double d : v) {
            if (Double.isFinite(d)) {
                m = Math.min(m, d);
            }
        }
        return Double.isFinite(m) ? m : 0;
    }

    private static double max(double... v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            if (Double.isFinite(d)) {
                m = Math.max(m, d);
            }
        }
        return Double.isFinite(m) ? m : 1;
    }
}
