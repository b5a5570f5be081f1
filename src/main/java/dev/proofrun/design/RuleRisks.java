package dev.proofrun.design;

import dev.proofrun.control.RunRule;
import dev.proofrun.control.RunRules;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The stability side with all eight run rules ({@link RunRule}, applied by {@link RunRules#firstSignal}),
 * by seeded simulation of standardized chart points (centre 0, limits ±3, true limits as in
 * {@link ChartRisks}).
 *
 * <ul>
 * <li>False alarm: {@value #FALSE_ALARM_DRAWS} stable sequences, each run until its first signal (or
 * {@value #LONGEST} points); P(signal within k) is the share whose first signal comes at or before point k,
 * so one simulation answers every k. Standard error ≤ 0.5/√{@value #FALSE_ALARM_DRAWS} = 0.005.</li>
 * <li>Detection (mean δ·σ_w off centre for the last k − ⌊k/2⌋ subgroups, shift s = δ√n in chart units):
 * 1 − (1 − FA(⌊k/2⌋))·(1 − G_s(k − ⌊k/2⌋)), where G_s(m) is the chance of a signal within m shifted
 * points that follow a run of R = min(15, ⌊k/2⌋) stable points without a signal (drawn by rejection).
 * No rule looks back more than 15 points, so conditioning on the last 15 stable points stands in for
 * conditioning on the whole quiet first half; {@value #DETECTION_DRAWS} draws per (s, R), standard
 * error ≤ 0.005. {@code RuleRisksTest} checks the decomposition against a direct simulation.</li>
 * </ul>
 * Results are cached per shift, so the wizard pays for each simulation once.
 */
final class RuleRisks {

    static final int FALSE_ALARM_DRAWS = 10_000;
    static final int DETECTION_DRAWS = 10_000;
    static final int LONGEST = 1 << 13;
    private static final int RUN_IN = 15;
    private static final long SEED = 20_270_301L;
    private static final Set<RunRule> ALL = EnumSet.allOf(RunRule.class);

    private static volatile int[] stableFirstSignals;
    private static final Map<Long, int[]> SHIFTED = new ConcurrentHashMap<>();

    private RuleRisks() {
    }

    /** P(at least one signal in k stable points), all eight rules. */
    static double falseAlarm(int subgroups) {
        return shareAtOrBefore(stable(), subgroups);
    }

    /** P(at least one signal when the last k − ⌊k/2⌋ of k points are shifted by δ√n), all eight rules. */
    static double detection(int subgroups, int subgroupSize, double shift) {
        int quiet = subgroups / 2;
        int shifted = subgroups - quiet;
        double s = shift * Math.sqrt(subgroupSize);
        int runIn = Math.min(RUN_IN, quiet);
        double g = shareAtOrBefore(shifted(s, runIn), shifted);
        return 1 - (1 - falseAlarm(quiet)) * (1 - g);
    }

    /** Share of the sorted first-signal counts (1-based point numbers) that are ≤ k. */
    private static double shareAtOrBefore(int[] sortedCounts, int k) {
        int idx = Arrays.binarySearch(sortedCounts, k + 1);
        int below;
        if (idx < 0) {
            below = -idx - 1;
        } else {
            while (idx > 0 && sortedCounts[idx - 1] == k + 1) {
                idx--;
            }
            below = idx;
        }
        return below / (double) sortedCounts.length;
    }

    private static int[] stable() {
        int[] s = stableFirstSignals;
        if (s == null) {
            synchronized (RuleRisks.class) {
                s = stableFirstSignals;
                if (s == null) {
                    s = simulate(0, 0, FALSE_ALARM_DRAWS, SEED);
                    stableFirstSignals = s;
                }
            }
        }
        return s;
    }

    private static int[] shifted(double s, int runIn) {
        long key = Math.round(s * 1e4) * 64 + runIn;
        return SHIFTED.computeIfAbsent(key, kk -> simulate(s, runIn, DETECTION_DRAWS, SEED + kk));
    }

    /**
     * For each draw, the number of shifted points up to and including the first signal (LONGEST + 1 when
     * none), after runIn quiet stable points; sorted.
     */
    static int[] simulate(double shift, int runIn, int draws, long seed) {
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
            while (first < 0 && filled - runIn < LONGEST) {
                int target = runIn + Math.min(LONGEST, Math.max(16, 2 * (filled - runIn)));
                z = Arrays.copyOf(z, target);
                for (int i = filled; i < target; i++) {
                    z[i] = gauss.sample() + shift;
                }
                filled = target;
                first = RunRules.firstSignal(z, ALL);
            }
            counts[d] = first < 0 ? LONGEST + 1 : first - runIn + 1;
        }
        Arrays.sort(counts);
        return counts;
    }
}
