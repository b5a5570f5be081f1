package dev.proofrun.app.grading;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.chart.CurvePlot.Pen;
import dev.proofrun.app.grading.GradingDisplay.Chart;
import dev.proofrun.app.grading.GradingDisplay.IndexRow;
import dev.proofrun.app.grading.GradingDisplay.IndexTable;
import dev.proofrun.app.grading.GradingDisplay.StepEvidence;
import dev.proofrun.app.grading.GradingDisplay.Tone;
import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.control.ControlChart;
import dev.proofrun.control.RuleFiring;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.Reason;
import dev.proofrun.grade.Step;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.Gauge;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.report.Histogram;
import dev.proofrun.report.ReportMessage;
import dev.proofrun.stats.IndexKind;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Turns one characteristic's grade into what the Grading step shows ({@link GradingDisplay.Characteristic}): the
 * steps of the argument with their reasons (a step the argument did not reach is named once, not shown as an
 * empty heading), every index with its bound, the control charts, the readings against the limits and the
 * histogram the report draws ({@link Histogram}: the same bins, following the gauge's step, and the same fitted
 * curve). Part of {@link GradingViewModel}.
 */
final class EvidenceDisplay {

    private EvidenceDisplay() {
    }

    /** The tone of a verdict; a verdict this code does not know is neither good nor short. */
    static Tone tone(Verdict v) {
        switch (v) {
            case DEMONSTRATED:
                return Tone.GOOD;
            case NOT_DEMONSTRATED:
            case NOT_VALID:
                return Tone.SHORT;
            default:
                return Tone.OPEN;
        }
    }

    /**
     * @param plan the plan graded against (the nominal and the gauge's step for the histogram), or null
     */
    static GradingDisplay.Characteristic of(CharacteristicGrade g, StudyPlan plan) {
        String heading = AppMessage.GRADING_CHARACTERISTIC.format(g.id(), g.name(), g.verdict().words());
        if (g.additionalSubgroups().isPresent()) {
            heading = AppMessage.GRADING_MORE_SUBGROUPS.format(heading, g.additionalSubgroups().getAsInt());
        }
        List<StepEvidence> steps = new ArrayList<>();
        List<String> notReached = new ArrayList<>();
        for (Step step : Step.values()) {
            List<String> reasons = g.reasons().stream().filter(r -> r.step() == step).map(Reason::text).toList();
            if (reasons.isEmpty()) {
                notReached.add(step.token());
            } else {
                steps.add(new StepEvidence(step.token(), ReportMessage.heading(step).format(), String.join("\n", reasons)));
            }
        }
        String unit = g.unit() == null || g.unit().isEmpty() ? "" : " (" + g.unit() + ")";
        Optional<Characteristic> planned = plan == null ? Optional.empty() : plan.characteristic(g.id());
        double nominal = planned.filter(c -> c.nominal().isPresent()).map(c -> c.nominal().getAsDouble()).orElse(Double.NaN);
        double step = planned.flatMap(Characteristic::gauge).map(Gauge::resolution).orElse(Double.NaN);
        return new GradingDisplay.Characteristic(heading, tone(g.verdict()), steps,
                notReached.isEmpty() ? "" : AppMessage.GRADING_NOT_REACHED.format(String.join(", ", notReached)),
                g.judged() == null ? "" : g.judged().summary(), g.capability() == null ? null : indices(g.capability()),
                g.stability() == null ? Chart.empty("Location chart", "subgroup", "value")
                        : control(g.stability().charts().location(), unit),
                g.stability() == null ? Chart.empty("Spread chart", "subgroup", "value")
                        : control(g.stability().charts().spread(), unit),
                readings(g, unit), histogram(g, nominal, step, unit));
    }

    /** The histogram the report draws, as lines: the bars' outline, the fitted curve, the limits and the nominal. */
    static Chart histogram(CharacteristicGrade g, double nominal, double step, String unit) {
        String title = AppMessage.GRADING_HISTOGRAM.format();
        Optional<Histogram> made = Histogram.of(g, nominal, step);
        if (made.isEmpty()) {
            return Chart.empty(title, "reading" + unit, "count");
        }
        Histogram h = made.get();
        int bins = h.counts().length;
        double[] xs = new double[2 * bins + 2];
        double[] ys = new double[2 * bins + 2];
        xs[0] = h.edge(0);
        for (int i = 0; i < bins; i++) {
            xs[2 * i + 1] = h.edge(i);
            ys[2 * i + 1] = h.counts()[i];
            xs[2 * i + 2] = h.edge(i + 1);
            ys[2 * i + 2] = h.counts()[i];
        }
        xs[2 * bins + 1] = h.edge(bins);
        List<Line> lines = new ArrayList<>();
        String bars = bins + " bins" + h.bins().words();
        lines.add(new Line(AppMessage.GRADING_HISTOGRAM_BARS.format(bars), Pen.CURVE, xs, ys));
        List<double[]> curve = new ArrayList<>();
        for (int i = 0; i < h.curveX().length; i++) {
            double y = h.curveY()[i];
            if (Double.isFinite(y) && y <= h.yMax()) {
                curve.add(new double[] {h.curveX()[i], y});
            }
        }
        lines.add(line(AppMessage.GRADING_HISTOGRAM_CURVE.format(h.model()), Pen.CENTRE, curve));
        double span = h.hi() - h.lo();
        h.limits().lower().ifPresent(v -> lines.add(new Line("LSL " + num(v, span), Pen.LIMIT, new double[] {v, v},
                new double[] {0, h.yMax()})));
        h.limits().upper().ifPresent(v -> lines.add(new Line("USL " + num(v, span), Pen.LIMIT, new double[] {v, v},
                new double[] {0, h.yMax()})));
        if (Double.isFinite(h.nominal())) {
            lines.add(new Line("nominal " + num(h.nominal(), span), Pen.WANTED, new double[] {h.nominal(), h.nominal()},
                    new double[] {0, h.yMax()}));
        }
        return new Chart(title, "reading" + unit, "count", lines);
    }

    private static Chart readings(CharacteristicGrade g, String unit) {
        String title = AppMessage.GRADING_READINGS_CHART.format() + unit;
        List<double[]> pts = new ArrayList<>();
        int i = 1;
        for (double[] sub : g.subgroups()) {
            for (double v : sub) {
                pts.add(new double[] {i++, v});
            }
        }
        if (pts.isEmpty()) {
            return Chart.empty(title, "reading", "value");
        }
        List<Line> lines = new ArrayList<>();
        lines.add(line("readings", Pen.CURVE, pts));
        double hi = g.limits().upper().orElse(pts.stream().mapToDouble(p -> p[1]).max().orElse(0));
        double lo = g.limits().lower().orElse(pts.stream().mapToDouble(p -> p[1]).min().orElse(0));
        OptionalDouble[] limits = {g.limits().lower(), g.limits().upper()};
        String[] names = {"LSL ", "USL "};
        for (int k = 0; k < 2; k++) {
            if (limits[k].isPresent()) {
                double v = limits[k].getAsDouble();
                lines.add(Line.horizontal(names[k] + num(v, hi - lo), Pen.LIMIT, v, 1, pts.size()));
            }
        }
        return new Chart(title, "reading", "value", lines);
    }

    private static Chart control(ControlChart cc, String unit) {
        String statistic = cc.statistic().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        String title = statistic + " chart" + unit;
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < cc.points().length; i++) {
            pts.add(new double[] {cc.subgroupOf(i) + 1, cc.points()[i]});
        }
        if (pts.isEmpty()) {
            return Chart.empty(title, "subgroup", "value");
        }
        double x0 = pts.get(0)[0];
        double x1 = pts.get(pts.size() - 1)[0];
        double span = cc.ucl() - cc.lcl();
        List<Line> shown = new ArrayList<>(List.of(line(statistic, Pen.CURVE, pts),
                Line.horizontal("centre " + num(cc.center(), span), Pen.CENTRE, cc.center(), x0, x1),
                Line.horizontal("UCL " + num(cc.ucl(), span), Pen.LIMIT, cc.ucl(), x0, x1),
                Line.horizontal("LCL " + num(cc.lcl(), span), Pen.LIMIT, cc.lcl(), x0, x1)));
        List<double[]> flagged = new ArrayList<>();
        for (RuleFiring sig : cc.signals()) {
            if (sig.index() < pts.size() && flagged.stream().noneMatch(p -> p == pts.get(sig.index()))) {
                flagged.add(pts.get(sig.index()));
            }
        }
        if (!flagged.isEmpty()) {
            shown.add(line("signal (" + flagged.size() + ")", Pen.FLAGGED, flagged));
        }
        return new Chart(title, "subgroup", "value", shown);
    }

    /** Every index the readings define, with its lower bound where the core gives one. */
    private static IndexTable indices(CapabilityResult c) {
        List<IndexRow> rows = new ArrayList<>();
        for (IndexKind k : IndexKind.values()) {
            OptionalDouble v = c.index(k);
            if (v.isPresent()) {
                OptionalDouble lo = c.lowerBound(k);
                rows.add(new IndexRow(k.symbol(), fmt(v.getAsDouble()), lo.isPresent() ? fmt(lo.getAsDouble()) : "—"));
            }
        }
        c.indices().cpm().ifPresent(v -> rows.add(new IndexRow("Cpm", fmt(v), "—")));
        return new IndexTable(AppMessage.GRADING_INDICES.format(),
                AppMessage.GRADING_LOWER_HEAD.format(100 * c.confidence()), rows);
    }

    private static Line line(String name, Pen pen, List<double[]> pts) {
        double[] xs = new double[pts.size()];
        double[] ys = new double[pts.size()];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = pts.get(i)[0];
            ys[i] = pts.get(i)[1];
        }
        return new Line(name, pen, xs, ys);
    }

    /** Limits printed to a precision that fits the chart: two digits below the spread between them. */
    static String num(double v, double span) {
        int decimals = span > 0 ? (int) Math.max(0, Math.min(8, 2 - Math.floor(Math.log10(span)))) : 4;
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }
}
