package dev.proofrun.design;

import dev.proofrun.control.RunRule;
import dev.proofrun.control.RunRules;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.Set;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Seeded simulation of standardized mean-chart points (centre 0, limits ±3) under all eight run rules: the
 * source of {@code rule-risks.txt} ({@link RuleRiskTableWriter}) and of the checks in {@code RuleRisksTest}.
 */
final class RunRuleSimulation {

    private static final Set<RunRule> ALL = EnumSet.allOf(RunRule.class);

    private RunRuleSimulation() {
    }

    /**
     * For each draw, the number of shifted points up to and including the first signal ({@code longest + 1}
     * when none within {@code longest}), after {@code runIn} stable points without a signal (drawn by
     * rejection); sorted.
     */
    static int[] firstSignals(double shift, int runIn, int draws, int longest, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        int[] counts = new int[draws];
        for (int d = 0; d < draws; d++) {
            double[] z;
            do {
                z = new double[runIn];
                for (int i = 0; i < runIn; i++) {
                    z[i] = gauss.sample();
                }
            } while (runIn > 0 && RunRules.firstSignal(z, ALL) >= 0);
            int filled = runIn;
            int first = -1;
            while (first < 0 && filled - runIn < longest) {
                int target = runIn + Math.min(longest, Math.max(16, 2 * (filled - runIn)));
                z = Arrays.copyOf(z, target);
                for (int i = filled; i < target; i++) {
                    z[i] = gauss.sample() + shift;
                }
                filled = target;
                first = RunRules.firstSignal(z, ALL);
            }
            counts[d] = first < 0 ? longest + 1 : first - runIn + 1;
        }
        Arrays.sort(counts);
        return counts;
    }

    /** The number of sorted first-signal counts that are ≤ m. */
    static int atOrBefore(int[] sorted, int m) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] <= m) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /**
     * A direct simulation of one whole study: P(at least one signal in k points whose last k − ⌊k/2⌋ are
     * shifted by s), without the run-in decomposition.
     */
    static double directDetection(int k, double s, int draws, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        int quiet = k / 2;
        double[] z = new double[k];
        int hits = 0;
        for (int d = 0; d < draws; d++) {
            for (int i = 0; i < k; i++) {
                z[i] = gauss.sample() + (i < quiet ? 0 : s);
            }
            if (RunRules.firstSignal(z, ALL) >= 0) {
                hits++;
            }
        }
        return hits / (double) draws;
    }
}
