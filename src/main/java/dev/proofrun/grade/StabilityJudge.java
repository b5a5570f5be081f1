package dev.proofrun.grade;

import dev.proofrun.control.ChanceSignalCounts;
import dev.proofrun.control.ChartKind;
import dev.proofrun.control.ChartPair;
import dev.proofrun.control.ControlChart;
import dev.proofrun.control.RunRule;
import dev.proofrun.control.RuleFiring;
import dev.proofrun.control.StabilityRule;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * Turns the charts into the stability finding, in words. The decision itself is {@link StabilityRule}'s (in
 * {@code control}, so that the designer can run the same decision on simulated studies); this class places
 * the signals on the returned slots and says what was found. A few signals within chance are reported by
 * rule and subgroup but do not make the process unstable.
 */
final class StabilityJudge {

    static final double CHANCE_LEVEL = StabilityRule.CHANCE_LEVEL;
    static final double ANOVA_LEVEL = StabilityRule.ANOVA_LEVEL;
    static final double RATIO_LIMIT = StabilityRule.RATIO_LIMIT;

    private StabilityJudge() {
    }

    /** The rules applied to the location chart: all eight. */
    static Set<RunRule> rules() {
        return StabilityRule.rules();
    }

    /** Judges stability for a within requirement; {@code reasons} receives the stability sentences. */
    static Stability judge(ChartKind kind, List<double[]> subgroups, List<String> slots, List<Reason> reasons) {
        return judge(kind, subgroups, slots, reasons, false);
    }

    /**
     * Judges stability; {@code reasons} receives the stability sentences.
     *
     * @param overall whether the requirement is on an overall index (Pp, Ppk, …): then the subgroup means are judged
     *                on their own chart ({@link StabilityRule})
     */
    static Stability judge(ChartKind kind, List<double[]> subgroups, List<String> slots, List<Reason> reasons,
            boolean overall) {
        int k = subgroups.size();
        StabilityRule.Decision d = StabilityRule.decide(kind, subgroups, overall);
        ChartPair charts = d.charts();
        List<SlotSignal> signals = new ArrayList<>();
        place(charts.location(), slots, signals);
        place(charts.spread(), slots, signals);
        int locationPoints = d.locationPoints();
        int spreadPoints = d.spreadPoints();
        ChanceSignalCounts chance = d.chance();
        ChanceSignalCounts locationChance = d.locationReference();
        double pLocation = d.locationChance();
        double pSpread = d.spreadChance();
        double floor = chance.floor();
        double ratio = d.ratio();
        boolean signalled = d.signalled();
        boolean between = d.between();
        String loc = d.meansOnOwnChart() ? "subgroup means' own" : kind.location().token();
        String spr = kind.spread().token();
        if (signalled) {
            reasons.add(new Reason(Step.STABILITY, true, GradeMessage.REASON_UNSTABLE_SIGNALS.format(SignalPatterns.points(locationPoints), loc,
                    spreadPoints, spr, k, locationChance.expectedLocation(), chance.expectedSpread(),
                    Stability.chanceText(pLocation, pLocation <= floor && floor > 0, "%.2g"),
                    Stability.chanceText(pSpread, pSpread <= floor && floor > 0, "%.2g"), describe(signals))));
        } else if (signals.isEmpty()) {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_STABLE_QUIET.format(loc, spr, k,
                    locationChance.expectedLocation() + chance.expectedSpread())));
        } else {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_STABLE_CHANCE.format(SignalPatterns.points(locationPoints), loc,
                    spreadPoints, spr, k, locationChance.expectedLocation(), chance.expectedSpread(),
                    Stability.chanceText(pLocation, pLocation <= floor && floor > 0, "%.3f"),
                    Stability.chanceText(pSpread, pSpread <= floor && floor > 0, "%.3f"),
                    describe(signals))));
        }
        if (d.meansOnOwnChart()) {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_MEANS_OWN_CHART.format(ratio,
                    d.anovaF().getAsDouble(), Stability.pText(d.anovaP().getAsDouble()))));
        } else if (between) {
            reasons.add(new Reason(Step.STABILITY, true,
                    GradeMessage.REASON_UNSTABLE_BETWEEN.format(ratio, d.anovaF().getAsDouble(), Stability.pText(d.anovaP().getAsDouble()))));
        } else if (d.anovaF().isPresent()) {
            reasons.add(new Reason(Step.STABILITY, false,
                    GradeMessage.REASON_RATIO.format(ratio, d.anovaF().getAsDouble(), Stability.pText(d.anovaP().getAsDouble()))));
        } else {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_RATIO_INDIVIDUALS.format(ratio)));
        }
        return new Stability(charts, signals, locationPoints, locationChance.expectedLocation(), pLocation, spreadPoints,
                chance.expectedSpread(), pSpread, ratio, d.anovaF(), d.anovaP(), d.stable(), floor);
    }

    private static void place(ControlChart chart, List<String> slots, List<SlotSignal> out) {
        for (RuleFiring s : chart.signals()) {
            int g = chart.subgroupOf(s.index());
            out.add(new SlotSignal(chart.statistic(), s.rule(), g + 1, slots.get(g)));
        }
    }

    /** The signals as patterns, see {@link SignalPatterns#describe}. */
    static String describe(List<SlotSignal> signals) {
        return SignalPatterns.describe(signals);
    }

    /** The sample standard deviation of all readings (divisor N − 1), see {@link StabilityRule#overallSd}. */
    static double overallSd(List<double[]> subgroups) {
        return StabilityRule.overallSd(subgroups);
    }

    /** One-way ANOVA of the subgroups: {F, p}, see {@link StabilityRule#anova}. */
    static double[] anova(List<double[]> subgroups) {
        return StabilityRule.anova(subgroups);
    }
}
