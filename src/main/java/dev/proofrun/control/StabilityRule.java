package dev.proofrun.control;

import dev.proofrun.stats.SampleMoments;
import java.util.EnumSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import org.hipparchus.special.Beta;

/**
 * The stability decision the grader makes, on its own (the grader's {@code StabilityJudge} adds the reporting;
 * the designer's {@link StabilityRisk} runs the same decision on simulated studies, so the risks a plan shows
 * are the grader's).
 *
 * <p><b>The rule</b> (proofrun's, documented here and tested): a stable process also signals by chance, the
 * more often the more subgroups and rules there are. So the count of signalled points is compared with what
 * chance gives a stable study of the same size with the same rules ({@link ChanceSignalCounts}), separately for
 * the location chart (all eight rules) and the spread chart (points beyond its limits). The process is
 * judged <em>unstable</em> when either count is so high that a stable study reaches it with probability
 * below {@value #CHANCE_LEVEL} (two charts, so about 1 % of stable studies are called unstable at most; the
 * counts are discrete, so fewer), or when the subgroup means vary clearly more than the within-subgroup
 * variation explains: the one-way ANOVA F test of the subgroups is significant at {@value #ANOVA_LEVEL}
 * <em>and</em> σ_overall/σ_within ≥ {@value #RATIO_LIMIT} (then Cpk overstates Ppk by a fifth or more).
 *
 * <p><b>Overall requirements</b> (Pp, Ppk, Ppu, Ppl) with subgroups of two or more: the overall index already
 * counts the variation between subgroups, so a process whose subgroup means vary at random but predictably is not
 * unstable for that purpose (ISO 22514-2 describes such time models: a location that varies at random). For them
 * the means are judged on their own chart — an individuals chart of the subgroup means, limits from the means'
 * moving ranges, all eight rules, its count compared with chance for k such points — together with the spread
 * chart as above; the ANOVA criterion does not apply (it is shown, not used). Within requirements (Cp, Cpk, …)
 * keep the rule above: variation between subgroups makes Cpk overstate what the process delivers.
 *
 * <p>ANOVA: F = [Σ nᵢ(x̄ᵢ − x̿)²/(k−1)] / [ΣΣ(x − x̄ᵢ)²/(N−k)] with F(k−1, N−k) (Fisher; e.g. Montgomery,
 * <em>Design and Analysis of Experiments</em>, ch. 3); not defined for individuals (n = 1).
 */
public final class StabilityRule {

    /** The chance below which a chart's count of signalled points makes the process unstable. */
    public static final double CHANCE_LEVEL = 0.005;
    /** The level of the ANOVA F test between subgroups. */
    public static final double ANOVA_LEVEL = 0.001;
    /** The smallest σ_overall/σ_within that, with a significant F, makes the process unstable. */
    public static final double RATIO_LIMIT = 1.2;

    private StabilityRule() {
    }

    /** The rules applied to the location chart: all eight. */
    public static Set<RunRule> rules() {
        return EnumSet.allOf(RunRule.class);
    }

    /**
     * The decision and the figures it rests on.
     *
     * @param charts         both charts with limits from the data
     * @param locationPoints points of the location chart at which some rule fired
     * @param spreadPoints   points beyond the spread chart's limits
     * @param chance         what chance gives a stable study of this size
     * @param locationChance P(a stable study signals at ≥ locationPoints points)
     * @param spreadChance   P(a stable study has ≥ spreadPoints points beyond the spread limits)
     * @param ratio          σ_overall/σ_within (infinite when σ_within = 0)
     * @param anovaF         the ANOVA F (empty for n = 1)
     * @param anovaP         its p-value (empty for n = 1)
     * @param signalled      a chart's count is beyond chance
     * @param between        the means vary clearly more than the within variation explains (never for an
     *                       overall requirement, see the class comment)
     * @param meansChance    the chance reference of the means' own chart (overall requirements with n ≥ 2), or null
     *                       when the location chart is the usual one and {@code chance} serves both charts
     */
    public record Decision(ChartPair charts, int locationPoints, int spreadPoints, ChanceSignalCounts chance,
            double locationChance, double spreadChance, double ratio, OptionalDouble anovaF, OptionalDouble anovaP,
            boolean signalled, boolean between, ChanceSignalCounts meansChance) {

        /** Whether the means were judged on their own chart (an overall requirement with n ≥ 2). */
        public boolean meansOnOwnChart() {
            return meansChance != null;
        }

        /** The chance reference of the location chart. */
        public ChanceSignalCounts locationReference() {
            return meansChance != null ? meansChance : chance;
        }

        /** The finding: neither a chart's count beyond chance nor a clear between-subgroup variation. */
        public boolean stable() {
            return !(signalled || between);
        }
    }

    /**
     * Decides one study.
     *
     * @param kind      the charts
     * @param subgroups the readings by subgroup in time order, all of one size
     * @throws IllegalArgumentException as {@link ControlCharts#of} does
     */
    public static Decision decide(ChartKind kind, List<double[]> subgroups) {
        return decide(kind, subgroups, false);
    }

    /**
     * Decides one study for a requirement on a within index ({@code overallIndex} false) or an overall one (true).
     *
     * @throws IllegalArgumentException as {@link ControlCharts#of} does
     */
    public static Decision decide(ChartKind kind, List<double[]> subgroups, boolean overallIndex) {
        int k = subgroups.size();
        int n = subgroups.get(0).length;
        Set<RunRule> rules = rules();
        ChartPair charts = ControlCharts.of(kind, subgroups, rules);
        ChanceSignalCounts chance = ChanceSignalCounts.simulate(kind, n, k, rules);
        ChanceSignalCounts meansChance = null;
        if (overallIndex && n > 1) {
            List<double[]> means = subgroups.stream().map(g -> new double[] {SampleMoments.meanOf(g)}).toList();
            ChartPair ofMeans = ControlCharts.of(ChartKind.INDIVIDUALS, means, rules);
            charts = new ChartPair(kind, ofMeans.location(), charts.spread(), charts.sigmaWithin());
            meansChance = ChanceSignalCounts.simulate(ChartKind.INDIVIDUALS, 1, k, rules);
        }
        int locationPoints = distinctPoints(charts.location());
        int spreadPoints = distinctPoints(charts.spread());
        double pLocation = (meansChance != null ? meansChance : chance).locationTail(locationPoints);
        double pSpread = chance.spreadTail(spreadPoints);
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
        boolean between = meansChance == null && p.isPresent() && p.getAsDouble() < ANOVA_LEVEL
                && ratio >= RATIO_LIMIT;
        return new Decision(charts, locationPoints, spreadPoints, chance, pLocation, pSpread, ratio, f, p,
                signalled, between, meansChance);
    }

    /** The number of distinct points of a chart at which some rule fired. */
    public static int distinctPoints(ControlChart chart) {
        int count = 0;
        int last = -1;
        for (RuleFiring s : chart.signals()) {
            if (s.index() != last) {
                count++;
                last = s.index();
            }
        }
        return count;
    }

    /** The sample standard deviation of all readings (divisor N − 1), two-pass. */
    public static double overallSd(List<double[]> subgroups) {
        long count = readings(subgroups);
        double mean = grandMean(subgroups);
        double ss = 0;
        for (double[] g : subgroups) {
            for (double v : g) {
                ss += (v - mean) * (v - mean);
            }
        }
        return Math.sqrt(ss / (count - 1));
    }

    /** One-way ANOVA of the subgroups: {F, p}. */
    public static double[] anova(List<double[]> subgroups) {
        int k = subgroups.size();
        long count = readings(subgroups);
        double grand = grandMean(subgroups);
        double between = 0;
        double within = 0;
        for (double[] g : subgroups) {
            double m = SampleMoments.meanOf(g);
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

    /** N, the number of readings in all subgroups. */
    private static long readings(List<double[]> subgroups) {
        long count = 0;
        for (double[] g : subgroups) {
            count += g.length;
        }
        return count;
    }

    /** The mean of all readings, summed in reading order. */
    private static double grandMean(List<double[]> subgroups) {
        double sum = 0;
        for (double[] g : subgroups) {
            for (double v : g) {
                sum += v;
            }
        }
        return sum / readings(subgroups);
    }
}
