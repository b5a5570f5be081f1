package dev.proofrun.report;

import dev.proofrun.capability.CapabilityResult;
import dev.proofrun.grade.SlotSignal;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.Completeness;
import dev.proofrun.grade.ModelFit;
import dev.proofrun.grade.Reason;
import dev.proofrun.grade.Shape;
import dev.proofrun.grade.Stability;
import dev.proofrun.grade.Step;
import dev.proofrun.paper.Block;
import dev.proofrun.paper.Flow;
import dev.proofrun.paper.Item;
import dev.proofrun.paper.Paragraph;
import dev.proofrun.paper.TextTable;
import dev.proofrun.paper.TextTable.Column;
import dev.proofrun.paper.Typeface;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.Subgroups;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The evidence for one characteristic, in the order of the argument: 1 completeness, 2 stability (control
 * charts), 3 shape (histogram with limits and fitted curve, probability plot), 4 capability (the bound
 * against the requirement, then the nonconforming parts in one sentence ({@link NonconformingWords}), the
 * required index with its bound first and the others after). Each step opens with the reasons the grade gave
 * for it.
 */
final class EvidenceSection {

    private final Typeface regular;
    private final Typeface bold;

    EvidenceSection(Typeface regular, Typeface bold) {
        this.regular = regular;
        this.bold = bold;
    }

    /**
     * @param nominal the plan's nominal, or NaN
     * @param step    the gauge's step (resolution), or NaN when the plan names no gauge
     */
    void place(Flow flow, CharacteristicGrade g, double nominal, double step) {
        flow.newPage();
        String unit = g.unit() == null || g.unit().isEmpty() ? "" : " (" + g.unit() + ")";
        flow.place(Paragraph.of(g.id() + "  " + ReportNumbers.name(g.name()) + unit, bold, 14));
        flow.gap(2);
        flow.place(new VerdictBadge(g.verdict(), "", regular, bold, 11));
        flow.gap(2);
        String gloss = VerdictSection.gloss(g.verdict());
        flow.place(Paragraph.of(Character.toUpperCase(gloss.charAt(0)) + gloss.substring(1) + ".", regular, 9));
        g.additionalSubgroups().ifPresent(k -> flow.place(Paragraph.of(String.format(Locale.ROOT,
                "About %d more subgroups at the plan's frequency would likely settle it (a planning figure: grading"
                        + " again with more data is a new look that raises the false-pass risk).", k), regular, 9)));

        List<Block> c = new ArrayList<>();
        Completeness m = g.completeness();
        if (m != null) {
            TextTable t = table();
            c.add(t.header());
            c.add(t.row("planned subgroups", Integer.toString(m.plannedSubgroups()), "subgroup size", Integer.toString(m.subgroupSize())));
            c.add(t.row("complete (graded)", Integer.toString(m.completeSubgroups()), "readings graded", Long.toString(m.readings())));
            c.add(t.row("incomplete", Integer.toString(m.incompleteSubgroups()), "missing slots", Integer.toString(m.missingSubgroups())));
            c.add(t.row("taken late or out of order", Integer.toString(m.lateSubgroups()), "readings flagged", Integer.toString(m.flaggedReadings())));
            c.add(t.row("unusable subgroups allowed", Integer.toString(m.allowedShortfall()), "shortfall", Integer.toString(m.shortfall())));
        }
        step(flow, ReportMessage.heading(Step.COMPLETENESS).format(), g, Step.COMPLETENESS, c);

        List<Block> s = new ArrayList<>();
        Stability st = g.stability();
        if (st != null) {
            var charts = st.charts();
            s.add(new ControlChartBlock(charts.location(), chartTitle(charts.location().statistic().token()), regular, bold));
            s.add(Block.space(4));
            s.add(new ControlChartBlock(charts.spread(), chartTitle(charts.spread().statistic().token()), regular, bold));
            TextTable t = table();
            s.add(Block.space(4));
            s.add(t.header());
            // in words a reader takes in: "about 0.4 expected", "below 0.0005", not "(by chance 0.4)", "< 0.00050"
            s.add(t.row("location points signalling", st.locationSignalPoints() + " (about "
                    + ReportNumbers.fixed(st.expectedLocationByChance(), 1) + " expected)", "chance of as many if stable",
                    chance(st.locationAtFloor(), st.locationChance())));
            s.add(t.row("spread points beyond limits", st.spreadSignalPoints() + " (about "
                    + ReportNumbers.fixed(st.expectedSpreadByChance(), 1) + " expected)", "chance of as many if stable",
                    chance(st.spreadAtFloor(), st.spreadChance())));
            s.add(t.row("\u03c3 overall / \u03c3 within", ReportNumbers.fixed(st.stabilityRatio(), 3), "ANOVA F (p)",
                    st.anovaF().isPresent() ? ReportNumbers.fixed(st.anovaF().getAsDouble(), 2) + " (" + ReportNumbers.p(st.anovaP().orElse(Double.NaN)) + ")" : ReportNumbers.NONE));
            if (!st.signals().isEmpty()) {
                s.add(Block.space(3));
                s.add(Paragraph.of("Signals by rule: " + signals(st.signals()), regular, 8.5f));
            }
        }
        step(flow, ReportMessage.heading(Step.STABILITY).format(), g, Step.STABILITY, s);

        List<Block> h = new ArrayList<>();
        Shape sh = g.shape();
        double[] x = Subgroups.flatten(g.subgroups());
        if (sh != null && x.length > 0) {
            ModelCurve curve = Histogram.curve(sh, x);
            h.add(new HistogramBlock(x, g.limits(), nominal, step, curve, "Readings against the limits", regular, bold));
            h.add(Block.space(4));
            h.add(new ProbabilityPlotBlock(x, curve, "Probability plot under the " + curve.model().token() + " model", regular, bold));
            h.add(Block.space(4));
            TextTable t = TextTable.of(List.of(Column.left("Planned model", 2), Column.right("parameter 1", 2),
                    Column.right("parameter 2", 2), Column.right("A\u00b2", 1.5f), Column.left("fits at 1 %", 2)),
                    regular, bold, 8);
            h.add(t.header());
            for (ModelFit f : sh.fits()) {
                h.add(t.row(f.model().token(), ReportNumbers.value(f.first()), ReportNumbers.value(f.second()),
                        ReportNumbers.fixed(sh.andersonDarling(), 3), (f.fits() ? "yes" : "no")
                                + (Double.isNaN(sh.pValue()) ? "" : ", p " + ReportNumbers.p(sh.pValue()))));
            }
            h.add(Paragraph.of("The plan declares the " + sh.family().token() + " shape; only that model is fitted"
                    + (sh.modelFits() ? "." : ", and it does not fit these readings."), regular, 8.5f));
        }
        step(flow, ReportMessage.heading(Step.SHAPE).format(), g, Step.SHAPE, h);

        List<Block> k = new ArrayList<>();
        if (g.judged() != null) {
            k.add(new BoundBlock(g.judged(), g.verdict() == dev.proofrun.grade.Verdict.NOT_VALID, regular, bold));
        }
        CapabilityResult f = g.capability();
        k.add(Block.space(4));
        k.add(Paragraph.of(NonconformingWords.statement(g), regular, 9));
        if (f != null) {
            TextTable t = TextTable.of(List.of(Column.left("Index", 1.3f), Column.right("estimate", 1.3f),
                    Column.right("lower bound", 1.3f), Column.left("", 5f)), regular, bold, 8);
            List<Block> figures = new ArrayList<>();
            figures.add(Block.space(4));
            figures.add(t.header());
            IndexKind required = g.judged() == null ? null : g.judged().index();
            if (required != null) {
                figures.add(t.row(required.symbol(), ReportNumbers.index(g.judged().estimate()), ReportNumbers.index(g.judged().lower()),
                        "required \u2265 " + ReportNumbers.index(g.judged().required()) + ", as graded above"));
            }
            for (IndexKind kind : OTHERS) {
                if (kind == required || f.indices().of(kind).isEmpty()) {
                    continue;
                }
                figures.add(t.row(kind.symbol(), ix(f.indices().of(kind)), ix(lowerOf(f, kind)), ""));
            }
            f.indices().cpm().ifPresent(v -> figures.add(t.row("Cpm", ReportNumbers.index(v), ReportNumbers.NONE, "with the nominal as target")));
            figures.add(Block.space(4));
            String size = f.subgroupSize().isPresent() ? " of " + f.subgroupSize().getAsInt() : "";
            figures.add(Paragraph.of(String.format(Locale.ROOT,
                    "Mean %s, \u03c3 within %s (%s), \u03c3 overall %s from %d readings in %d subgroups%s. The "
                            + "other indices are normal-model figures on the readings' own scale, lower bounds at "
                            + "%s %% confidence.",
                    ReportNumbers.value(f.mean()), ReportNumbers.value(f.within().value()), f.within().method().token(),
                    ReportNumbers.value(f.sigmaOverall()), f.readings(), f.subgroups(), size, ReportNumbers.fixed(f.confidence() * 100, 0)),
                    regular, 8.5f));
            k.add(Block.stack(figures));
        }
        step(flow, ReportMessage.heading(Step.CAPABILITY).format(), g, Step.CAPABILITY, k);
    }

    /**
     * The indices after the required one, in this order: the other of Cpk/Ppk first. The one-sided indices
     * (Cpu, Cpl, …) are left out: Cpk is the smaller of its two, and with one limit it is the one.
     */
    private static final List<IndexKind> OTHERS = List.of(IndexKind.CPK, IndexKind.PPK, IndexKind.CP, IndexKind.PP);

    private static java.util.OptionalDouble lowerOf(CapabilityResult f, IndexKind kind) {
        switch (kind) {
            case CP:
                return f.lower().cp();
            case CPK:
                return f.lower().cpk();
            case PP:
                return f.lower().pp();
            case PPK:
                return f.lower().ppk();
            default:
                return java.util.OptionalDouble.empty();
        }
    }

    /** A chance in words: "below 0.0005" at the simulation's floor, "below 0.001", or three decimals. */
    private static String chance(boolean atFloor, double p) {
        if (atFloor) {
            return Stability.below(p);
        }
        return p < 0.001 ? "below 0.001" : ReportNumbers.p(p);
    }

    private static String ix(java.util.OptionalDouble v) {
        return v.isPresent() ? ReportNumbers.index(v.getAsDouble()) : ReportNumbers.NONE;
    }

    private TextTable table() {
        return TextTable.of(List.of(Column.left("Figure", 3), Column.right("value", 2), Column.left("Figure", 3),
                Column.right("value", 2)), regular, bold, 8);
    }

    /** A step: heading and its reasons kept with the first evidence block; the rest flows. */
    private void step(Flow flow, String title, CharacteristicGrade g, Step step, List<Block> evidence) {
        flow.gap(10);
        List<Block> head = new ArrayList<>();
        head.add(Paragraph.of(title, bold, 11));
        head.add(Block.space(3));
        for (Reason r : g.reasons()) {
            if (r.step() == step) {
                head.add(new Item(r.decisive() ? "\u25a0" : "\u2013", new Paragraph(r.text(), regular, 9, 1.3f, 0), 11));
            }
        }
        if (evidence.isEmpty()) {
            head.add(Paragraph.of("Not enough usable data for this step.", regular, 9));
            flow.placeTogether(head);
            return;
        }
        head.add(Block.space(4));
        head.add(evidence.get(0));
        flow.placeTogether(head);
        for (Block b : evidence.subList(1, evidence.size())) {
            flow.place(b);
        }
    }

    private static String chartTitle(String statistic) {
        switch (statistic) {
            case "mean":
                return "Subgroup means";
            case "range":
                return "Subgroup ranges";
            case "sd":
                return "Subgroup standard deviations";
            case "individual":
                return "Individual readings";
            default:
                return "Moving ranges";
        }
    }

    /** One entry per pattern (a run of one rule over consecutive subgroups), as the reasons say it. */
    private static String signals(List<SlotSignal> signals) {
        return dev.proofrun.grade.SignalPatterns.describe(signals);
    }
}
