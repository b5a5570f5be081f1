package dev.proofrun.control;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The grader's own stability risks for a study of k subgroups of n: the chance that {@link StabilityRule}
 * calls a stable process unstable, and the chance that it calls unstable a process whose mean moves by δ·σ_within
 * for the second half of the study (the last k − ⌊k/2⌋ subgroups). Both by seeded simulation of normal studies
 * put through {@link StabilityRule#decide} — the very decision the grader makes, with the same chance reference
 * ({@link ChanceSignalCounts}, shared through its cache).
 *
 * <p>Why simulation: the decision compares counts of signalled points with a simulated reference and adds an
 * ANOVA test; no closed form describes it. The decision is invariant to the location and scale of the readings,
 * so for normal readings it does not depend on μ or σ, only on (chart, n, k, δ): the figures are computed once per
 * such key and kept for the life of the JVM.
 *
 * <p>The false-unstable rate is read from the grader's own chance reference, each of its simulated stable studies
 * judged against the others ({@link ChanceSignalCounts#falseUnstableShare}: up to 2,000 studies, standard error ≤
 * 0.0023 near 1 %); where that reference holds blocks instead of whole studies, {@value #STABLE_STUDIES} stable
 * studies are simulated. Detection: {@value #SHIFTED_STUDIES} shifted studies (standard error ≤ 0.023). The errors
 * are returned beside the figures.
 *
 * <p>For the default charts (individuals for n = 1, X̄–R for n = 2…10) and within requirements, the false-unstable
 * rate comes from a stored table of these very simulations on a grid of k ({@link StabilityRiskTable}), linearly
 * interpolated between its points (it is small and moves by its own simulation error between neighbours), so that
 * the search for k does not simulate; elsewhere it is simulated when asked. Detection is always simulated at the
 * row's own k: the decision's count thresholds step with k, and detection jumps by up to 0.05 between neighbouring
 * k (0.89 at 164 individuals, 0.84 at 165), which no interpolation follows. For the default charts, within
 * requirements and δ = 1.5 it is stored at every k up to 500 readings ({@link DetectionTable}: the same simulation
 * run once, so the same figure), so that a design table of typical studies simulates nothing.
 * For an overall requirement with n ≥ 2 (the means on their own chart, two chance
 * references) the stable studies are simulated too.
 */
public final class StabilityRisk {

    static final int STABLE_STUDIES = 2000;
    static final int SHIFTED_STUDIES = 500;
    private static final long SEED = 0x57ab_1e5eL;

    /**
     * @param falseUnstable      P(the grader calls a stable normal process unstable)
     * @param falseUnstableError its Monte-Carlo standard error
     * @param detection          P(the grader calls unstable a process whose mean moves by δσ_w for the second half)
     * @param detectionError     its Monte-Carlo standard error
     * @param shift              δ
     */
    public record Figures(double falseUnstable, double falseUnstableError, double detection, double detectionError,
            double shift) {
    }

    record Key(ChartKind kind, int n, int k, double shift, boolean overallIndex) {
    }

    private static final Map<Key, double[]> FALSE_UNSTABLE = new ConcurrentHashMap<>();
    private static final Map<Key, Double> DETECTION = new ConcurrentHashMap<>();
    private static final int CACHE_SIZE = 256;

    private StabilityRisk() {
    }

    /**
     * The grader's risks for k subgroups of n on these charts.
     *
     * @param kind  the charts the grader draws (from the plan's sigma method)
     * @param n     subgroup size (1 for individuals)
     * @param k     number of subgroups, at least 2
     * @param shift δ, the mean's move in within standard deviations for the second half
     * @throws IllegalArgumentException if k &lt; 2 or the chart does not suit n (as {@link ControlCharts#of})
     */
    public static Figures of(ChartKind kind, int n, int k, double shift) {
        return of(kind, n, k, shift, false);
    }

    /**
     * As {@link #of(ChartKind, int, int, double)}, for a requirement on an overall index when {@code overallIndex}
     * (the means judged on their own chart, see {@link StabilityRule}).
     */
    public static Figures of(ChartKind kind, int n, int k, double shift, boolean overallIndex) {
        double[] fu = falseUnstableWithError(kind, n, k, overallIndex);
        Key key = new Key(kind, n, k, shift, overallIndex);
        Double known = DETECTION.get(key);
        double detection;
        // for individuals the overall rule is the within rule (the means are the readings)
        java.util.OptionalDouble stored = overallIndex && n > 1 ? java.util.OptionalDouble.empty()
                : DetectionTable.get().detection(kind, n, k, shift);
        if (known != null) {
            detection = known;
        } else if (stored.isPresent()) {
            detection = stored.getAsDouble();
        } else {
            UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(SEED ^ ((long) n << 40)
                    ^ ((long) k << 8) ^ Double.doubleToLongBits(shift));
            detection = share(kind, n, k, shift, SHIFTED_STUDIES, ZigguratSampler.NormalizedGaussian.of(rng),
                    overallIndex);
            if (DETECTION.size() >= CACHE_SIZE) {
                DETECTION.clear();
            }
            DETECTION.putIfAbsent(key, detection);
        }
        return new Figures(fu[0], fu[1], detection, error(detection, SHIFTED_STUDIES), shift);
    }

    /**
     * P(the grader calls a stable normal process unstable) for k subgroups of n: the cheap half of {@link #of},
     * for a power curve that needs it at many k.
     *
     * @throws IllegalArgumentException as {@link #of}
     */
    public static double falseUnstable(ChartKind kind, int n, int k) {
        return falseUnstable(kind, n, k, false);
    }

    /** As {@link #falseUnstable(ChartKind, int, int)}, for an overall requirement when {@code overallIndex}. */
    public static double falseUnstable(ChartKind kind, int n, int k, boolean overallIndex) {
        return falseUnstableWithError(kind, n, k, overallIndex)[0];
    }

    private static double[] falseUnstableWithError(ChartKind kind, int n, int k, boolean overallIndex) {
        if (k < 2) {
            throw new IllegalArgumentException("at least two subgroups: " + k);
        }
        // for individuals the overall rule is the within rule (the means are the readings)
        boolean own = overallIndex && n > 1;
        Key key = new Key(kind, n, k, 0, own);
        double[] known = FALSE_UNSTABLE.get(key);
        if (known != null) {
            return known;
        }
        if (!own) {
            java.util.OptionalDouble stored = StabilityRiskTable.get().falseUnstable(kind, n, k);
            if (stored.isPresent()) {
                return new double[] {stored.getAsDouble(), error(stored.getAsDouble(), ChanceSignalCounts.MAX_STUDIES)};
            }
        }
        return simulatedFalseUnstable(kind, n, k, own, key);
    }

    /** u(n, k) simulated (the grader's reference, leave one out), not read from the stored table; kept under key. */
    static double[] simulatedFalseUnstable(ChartKind kind, int n, int k, boolean own, Key key) {
        double p = Double.NaN;
        int studies = 0;
        if (!own) {
            ChanceSignalCounts chance = ChanceSignalCounts.simulate(kind, n, k, StabilityRule.rules());
            p = chance.falseUnstableShare();
            studies = chance.studies();
        }
        if (Double.isNaN(p)) {
            UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(SEED ^ ((long) n << 40) ^ ((long) k << 8));
            p = share(kind, n, k, 0, STABLE_STUDIES, ZigguratSampler.NormalizedGaussian.of(rng), own);
            studies = STABLE_STUDIES;
        }
        double[] figures = {p, error(p, studies)};
        if (key != null) {
            if (FALSE_UNSTABLE.size() >= CACHE_SIZE) {
                FALSE_UNSTABLE.clear();
            }
            FALSE_UNSTABLE.putIfAbsent(key, figures);
        }
        return figures;
    }

    /**
     * The figures simulated now, never from the stored table: what {@link StabilityRiskTable} stores (its writer
     * calls this) and what the table's check compares with.
     */
    static Figures simulated(ChartKind kind, int n, int k, double shift) {
        double[] fu = simulatedFalseUnstable(kind, n, k, false, null);
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(SEED ^ ((long) n << 40)
                ^ ((long) k << 8) ^ Double.doubleToLongBits(shift));
        double detection = share(kind, n, k, shift, SHIFTED_STUDIES, ZigguratSampler.NormalizedGaussian.of(rng), false);
        return new Figures(fu[0], fu[1], detection, error(detection, SHIFTED_STUDIES), shift);
    }

    /** The share of simulated studies the rule calls unstable; the last k − ⌊k/2⌋ subgroups moved by shift. */
    private static double share(ChartKind kind, int n, int k, double shift, int studies,
            ZigguratSampler.NormalizedGaussian g, boolean overallIndex) {
        int quiet = k / 2;
        int unstable = 0;
        for (int s = 0; s < studies; s++) {
            List<double[]> groups = new ArrayList<>(k);
            for (int i = 0; i < k; i++) {
                double mean = i < quiet ? 0 : shift;
                double[] x = new double[n];
                for (int j = 0; j < n; j++) {
                    x[j] = mean + g.sample();
                }
                groups.add(x);
            }
            if (!StabilityRule.decide(kind, groups, overallIndex).stable()) {
                unstable++;
            }
        }
        return unstable / (double) studies;
    }

    private static double error(double p, int studies) {
        return Math.sqrt(Math.max(p * (1 - p), 1.0 / studies) / studies);
    }
}
