package dev.proofrun.grade;

import dev.proofrun.control.ChartKind;
import dev.proofrun.control.ChartPair;
import dev.proofrun.control.ControlChart;
import dev.proofrun.control.ControlCharts;
import dev.proofrun.control.RunRule;
import dev.proofrun.control.Signal;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeMap;
import org.hipparchus.special.Beta;

/**
 * Turns the charts into the stability finding.
 *
 * <p><b>The rule</b> (proofrun's, documented here and tested): a stable process also signals by chance, the
 * more often the more subgroups and rules there are. So the count of signalled points is compared with what
 * chance gives a stable study of the same size with the same rules ({@link ChanceSignals}), separately for
 * the location chart (all eight rules) and the spread chart (points beyond its limits). The process is
 * judged <em>unstable</em> when either count is so high that a stable study reaches it with probability
 * below {@value #CHANCE_LEVEL} (two charts, so about 1 % of stable studies are called unstable), or when
 * the subgroup means vary clearly more than the within-subgroup variation explains: the one-way ANOVA F test
 * of the subgroups is significant at {@value #ANOVA_LEVEL} <em>and</em> σ_overall/σ_within ≥
 * {@value #RATIO_LIMIT} (then Cpk overstates Ppk by a fifth or more). A few signals within chance are
 * reported by rule and subgroup but do not make the process unstable.
 *
 * <p>ANOVA: F = [Σ nᵢ(x̄ᵢ − x̿)²/(k−1)] / [ΣΣ(x − x̄ᵢ)²/(N−k)] with F(k−1, N−k) (Fisher; e.g. Montgomery,
 * <em>Design and Analysis of Experiments</em>, ch. 3); not defined for individuals (n = 1).
 */
final class StabilityJudge {

    static final double CHANCE_LEVEL = 0.005;
    static final double ANOVA_LEVEL = 0.001;
    static final double RATIO_LIMIT = 1.2;
    private static final int LISTED_SIGNALS = 8;

    private StabilityJudge() {
    }

    /** The rules applied to the location chart: all eight. */
    static Set<RunRule> rules() {
        return EnumSet.allOf(RunRule.class);
    }

    /** Judges stability; {@code reasons} receives the stability sentences. */
    static Stability judge(ChartKind kind, List<double[]> subgroups, List<String> slots, List<Reason> reasons) {
        int k = subgroups.size();
        int n = subgroups.get(0).length;
        Set<RunRule> rules = rules();
        ChartPair charts = ControlCharts.of(kind, subgroups, rules);
        List<ChartSignal> signals = new ArrayList<>();
        place(charts.location(), slots, signals);
        place(charts.spread(), slots, signals);
        int locationPoints = distinctPoints(charts.location());
        int spreadPoints = distinctPoints(charts.spread());
        ChanceSignals chance = ChanceSignals.simulate(kind, n, k, rules);
        double pLocation = chance.locationTail(locationPoints);
        double pSpread = chance.spreadTail(spreadPoints);
        double floor = chance.floor();

        double overall = overallSd(subgroups);
        double ratio = charts.sigmaWithin() > 0 ? overall / charts.sigmaWithin() : Double.POSITIVE_INFINITY;
        OptionalDouble f = OptionalDouble.empty();
        OptionalDouble p = OptionalDouble.empty();
        if (n > 1) {
            double[] fp = anova(subgroups);
            f = OptionalDouble.of(fp[0]);
            p = OptionalDouble.of(fp[1]);
        }
        boolean signalled = pLocation < CHANCE_LEVEL || pSpread < CHANCE_LEVEL;
        boolean between = p.isPresent() && p.getAsDouble() < ANOVA_LEVEL && ratio >= RATIO_LIMIT;
        String loc = kind.location().id();
        String spr = kind.spread().id();
        if (signalled) {
            reasons.add(new Reason(Step.STABILITY, true, GradeMessage.REASON_UNSTABLE_SIGNALS.format(locationPoints, loc,
                    spreadPoints, spr, k, chance.expectedLocation(), chance.expectedSpread(),
                    Stability.chanceText(pLocation, pLocation <= floor && floor > 0, "%.2g"),
                    Stability.chanceText(pSpread, pSpread <= floor && floor > 0, "%.2g"), describe(signals))));
        } else if (signals.isEmpty()) {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_STABLE_QUIET.format(loc, spr, k,
                    chance.expectedLocation() + chance.expectedSpread())));
        } else {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_STABLE_CHANCE.format(locationPoints, loc,
                    spreadPoints, spr, k, chance.expectedLocation(), chance.expectedSpread(),
                    Stability.chanceText(pLocation, pLocation <= floor && floor > 0, "%.3f"),
                    Stability.chanceText(pSpread, pSpread <= floor && floor > 0, "%.3f"),
                    describe(signals))));
        }
        if (between) {
            reasons.add(new Reason(Step.STABILITY, true,
                    GradeMessage.REASON_UNSTABLE_BETWEEN.format(ratio, f.getAsDouble(), p.getAsDouble())));
        } else if (f.isPresent()) {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_RATIO.format(ratio, f.getAsDouble(), p.getAsDouble())));
        } else {
            reasons.add(new Reason(Step.STABILITY, false, GradeMessage.REASON_RATIO_INDIVIDUALS.format(ratio)));
        }
        return new Stability(charts, signals, locationPoints, chance.expectedLocation(), pLocation, spreadPoints,
                chance.expectedSpread(), pSpread, ratio, f, p, !(signalled || between), floor);
    }

    private static void place(ControlChart chart, List<String> slots, List<ChartSignal> out) {
        for (Signal s : chart.signals()) {
            int g = chart.subgroupOf(s.index());
            out.add(new ChartSignal(chart.statistic(), s.rule(), g + 1, slots.get(g)));
        }
    }

    private static int distinctPoints(ControlChart chart) {
        int count = 0;
        int last = -1;
        for (Signal s : chart.signals()) {
            if (s.index() != last) {
                count++;
                last = s.index();
            }
        }
        return count;
    }

    /** "trend at S07, S08; beyond-limits at S12 (range)", at most a few subgroups per rule. */
    static String describe(List<ChartSignal> signals) {
        TreeMap<String, List<String>> byRule = new TreeMap<>();
        for (ChartSignal s : signals) {
            String key = s.rule().id() + (s.chart().id().equals("mean") || s.chart().id().equals("individual") ? "" : " (" + s.chart().id() + ")");
            byRule.computeIfAbsent(key, x -> new ArrayList<>()).add(s.slot());
        }
        StringBuilder sb = new StringBuilder();
        byRule.forEach((rule, at) -> {
            if (sb.length() > 0) {
                sb.append("; ");
            }
            sb.append(rule).append(" at ");
            sb.append(String.join(", ", at.subList(0, Math.min(LISTED_SIGNALS, at.size()))));
            if (at.size() > LISTED_SIGNALS) {
                sb.append(String.format(Locale.ROOT, " and %d more", at.size() - LISTED_SIGNALS));
            }
        });
        return sb.length() == 0 ? "none" : sb.toString();
    }

    /** The sample standard deviation of all readings (divisor N − 1), two-pass. */
    static double overallSd(List<double[]> subgroups) {
        double sum = 0;
        long count = 0;
        for (double[] g : subgroups) {
            for (double v : g) {
                sum += v;
            }
            count += g.length;
        }
        double mean = sum / count;
        double ss = 0;
        for (double[] g : subgroups) {
            for (double v : g) {
                ss += (v - mean) * (v - mean);
            }
        }
        return Math.sqrt(ss / (count - 1));
    }

    /** One-way ANOVA of the subgroups: {F, p}. */
    static double[] anova(List<double[]> subgroups) {
        int k = subgroups.size();
        double total = 0;
        long count = 0;
        for (double[] g : subgroups) {
            for (double v : g) {
                total += v;
            }
            count += g.length;
        }
        double grand = total / count;
        double between = 0;
        double within = 0;
        for (double[] g : subgroups) {
            double s = 0;
            for (double v : g) {
                s += v;
            }
            double m = s / g.length;
            between += g.length * (m - grand) * (m - grand);
            for (double v : g) {
                within += (v - m) * (v - m);
            }
        }
        double df1 = k - 1;
        double df2 = count - k;
        if (!(within > 0)) {
            return new double[] {between > 0 ? Double.POSITIVE_INFINITY : Double.NaN, between > 0 ? 0.0 : 1.0};
        }
        double f = (between / df1) / (within / df2);
        // upper tail without cancellation: P(F > f) = I_{df2/(df2 + df1 f)}(df2/2, df1/2)
        double p = Beta.regularizedBeta(df2 / (df2 + df1 * f), df2 / 2, df1 / 2);
        return new double[] {f, p};
    }
}
