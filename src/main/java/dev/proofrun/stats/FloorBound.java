package dev.proofrun.stats;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Confidence bounds of the percentile index of a threshold shape ({@link ShapeFamily#LOGNORMAL3},
 * {@link ShapeFamily#WEIBULL3}) whose threshold θ is not known, only a <em>floor</em> below it: the plan knows the
 * stop or datum the process cannot go below, not where the readings really start.
 *
 * <p><b>The set of thresholds.</b> Under the true θ, y = ln(x − θ) is normal (lognormal3) or smallest-extreme-value
 * (weibull3), a location–scale family, so the sample skewness g₁ = m₃/m₂^{3/2} of y (moments with divisor N) has a
 * distribution that depends on N and the family only. A θ too high stretches the lower tail of the logs and drives
 * g₁ down. The 1 − γ confidence set keeps every θ in [floor, x₍₁₎) whose g₁ is not below the γ-quantile of that
 * null distribution ({@value #SKEW_DRAWS} standard samples, seeded with {@value #SKEW_SEED}, kept per (family, N);
 * the Monte-Carlo error of the γ = 0.01 quantile is about √(0.01·0.99/20000) = 0.0007 in probability).
 *
 * <p><b>The bound.</b> The lower bound is the smallest {@link PivotalBound} lower bound over the set, each at
 * confidence 1 − (α − γ); the upper bound the largest upper bound at that confidence. Whatever θ is, the true θ
 * lies outside the set with probability at most γ, and inside it the bound at the true θ exceeds the true index
 * with probability at most α − γ, so the bound exceeds it with probability at most α (Berger &amp; Boos 1994, JASA
 * 89:1012–1016; the same construction as {@link FoldedNormalBound}), γ = {@value #GAMMA_SHARE}·α fixed in advance.
 *
 * <p><b>The grid.</b> θ = x₍₁₎ − d with d geometric from x₍₁₎ − floor down to 10⁻⁶ of the readings' range, a factor
 * {@value #GRID_RATIO} per step (denser near x₍₁₎, where ln(x₍₁₎ − θ) moves fastest). Where neighbouring points
 * straddle the set's edge, the edge itself is found by bisection in ln d (to {@value #EDGE_STEPS} halvings) and taken
 * into the set. The bound is decided at the upper edge of the set in practice: a lower θ reads the readings as less
 * skewed, with a lighter upper tail and a higher index, so the pivotal bound falls as θ rises; taking every grid
 * point and the refined edge does not rest on that, and {@code FloorBoundTest} checks that the bound at the edge is
 * the smallest.
 */
public final class FloorBound {

    /** γ/α: the share of the error rate spent on the set of thresholds; the pivotal bounds use α − γ. */
    public static final double GAMMA_SHARE = 0.2;
    /** Standard samples of the null distribution of g₁. */
    public static final int SKEW_DRAWS = 20_000;
    /** The seed of the null distribution of g₁; shown with every floor grade. */
    public static final long SKEW_SEED = 0x5eed_2273L;
    /** The factor between neighbouring grid distances x₍₁₎ − θ. */
    static final double GRID_RATIO = 1.25;
    /** The smallest grid distance x₍₁₎ − θ as a share of the readings' range. */
    static final double GRID_DEPTH = 1e-6;
    /**
     * The most readings graded with a floor: the null of g₁ is simulated at the study's N ({@value #SKEW_DRAWS} samples
     * of N), which costs about a second at this N and grows with it.
     */
    public static final int MAX_READINGS = 5_000;
    /** Bisection steps in ln d at an edge of the set. */
    static final int EDGE_STEPS = 20;

    private static final RecentResults<String, double[]> NULLS = new RecentResults<>(16);

    private FloorBound() {
    }

    /**
     * The thresholds a study leaves possible.
     *
     * @param family   lognormal3 or weibull3
     * @param floor    the plan's floor
     * @param readings the readings the set was found from (not copied; not to be changed)
     * @param thetas   the θ kept, in rising order (the grid's and the refined edges), empty when none fits
     * @param skews    g₁ of ln(x − θ) at each kept θ
     * @param critical the γ-quantile of g₁ under the model: a θ whose g₁ is below it is left out
     * @param median   the median of g₁ under the model
     * @param gamma    γ
     * @param tried    how many thresholds were tried (grid and bisection)
     */
    public record ThresholdSet(ShapeFamily family, double floor, double[] readings, double[] thetas, double[] skews, double critical, double median, double gamma,
            int tried) {

        /** True when no threshold at or above the floor fits: the planned shape does not fit the readings. */
        public boolean empty() {
            return thetas.length == 0;
        }

        /** The highest θ kept. */
        public double highest() {
            return thetas[thetas.length - 1];
        }

        /** The kept θ whose g₁ is nearest the null median: where the fit is checked and the index estimated. */
        public double central() {
            int best = 0;
            for (int i = 1; i < thetas.length; i++) {
                if (Math.abs(skews[i] - median) < Math.abs(skews[best] - median)) {
                    best = i;
                }
            }
            return thetas[best];
        }
    }

    /** The sample skewness g₁ = m₃/m₂^{3/2} with divisor N (SciPy's {@code scipy.stats.skew(y)}, bias=True). */
    public static double skewness(double[] y) {
        double mean = 0;
        for (double v : y) {
            mean += v;
        }
        mean /= y.length;
        double m2 = 0;
        double m3 = 0;
        for (double v : y) {
            double d = v - mean;
            m2 += d * d;
            m3 += d * d * d;
        }
        m2 /= y.length;
        m3 /= y.length;
        return m2 > 0 ? m3 / Math.pow(m2, 1.5) : Double.NaN;
    }

    /**
     * The p-quantile of g₁ of N readings under the model (normal for lognormal3, smallest-extreme-value for weibull3).
     *
     * @throws IllegalArgumentException if the family is not a threshold shape, N &lt; 3 or N &gt; {@value #MAX_READINGS},
     *                                  or p is not in (0, 1)
     */
    public static double nullQuantile(ShapeFamily family, int readings, double p) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "probability must be in (0, 1): %s", p));
        }
        return PivotalBound.orderStatistic(nullSkewness(family, readings), p);
    }

    /** The share of the null distribution of g₁ at or below {@code g}: a one-sided p-value. */
    public static double nullShareBelow(ShapeFamily family, int readings, double g) {
        double[] s = nullSkewness(family, readings);
        int i = Arrays.binarySearch(s, g);
        int below = i >= 0 ? i + 1 : -i - 1;
        return below / (double) s.length;
    }

    /** The sorted null draws of g₁ for (family, N). */
    static double[] nullSkewness(ShapeFamily family, int readings) {
        if (!family.hasThreshold()) {
            throw new IllegalArgumentException("a floor is only taken by the shapes lognormal3 and weibull3, not " + family.token());
        }
        if (readings < ShapeFitter.MIN_READINGS || readings > MAX_READINGS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "a floor is graded for 3 to %d readings: %d",
                    MAX_READINGS, readings));
        }
        return NULLS.get(family.base() + "/" + readings,
                key -> simulateNull(family.base() == ShapeFamily.WEIBULL, readings));
    }

    private static double[] simulateNull(boolean extremeValue, int n) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(SKEW_SEED + n);
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(rng);
        ZigguratSampler.Exponential e = ZigguratSampler.Exponential.of(rng);
        double[] y = new double[n];
        double[] g = new double[SKEW_DRAWS];
        for (int j = 0; j < SKEW_DRAWS; j++) {
            for (int i = 0; i < n; i++) {
                y[i] = extremeValue ? Math.log(e.sample()) : z.sample();
            }
            g[j] = skewness(y);
        }
        Arrays.sort(g);
        return g;
    }

    /**
     * The thresholds in [floor, x₍₁₎) that the readings leave possible at 1 − γ.
     *
     * @throws IllegalArgumentException if a reading is at or below the floor or not finite, or γ is not in (0, 0.5)
     */
    public static ThresholdSet thresholds(ShapeFamily family, double floor, double[] x, double gamma) {
        if (!(gamma > 0 && gamma < 0.5)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "gamma must be in (0, 0.5): %s", gamma));
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            if (!Double.isFinite(v) || !(v > floor)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "reading %s is not above the floor %s", v, floor));
            }
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        double critical = nullQuantile(family, x.length, gamma);
        double median = nullQuantile(family, x.length, 0.5);
        double deepest = Math.max(GRID_DEPTH * (max - min), Math.ulp(min) * 4);
        List<Double> ds = new ArrayList<>();
        for (double d = min - floor; d > deepest; d /= GRID_RATIO) {
            ds.add(d);
        }
        if (ds.isEmpty()) {
            ds.add(min - floor);
        }
        List<double[]> kept = new ArrayList<>(); // {θ, g₁}
        int tried = 0;
        double lastD = Double.NaN;
        boolean lastKept = false;
        for (double d : ds) {
            double g = skewAt(x, min - d);
            tried++;
            boolean keep = g >= critical;
            if (tried > 1 && keep != lastKept) {
                double[] edge = edge(x, min, keep ? d : lastD, keep ? lastD : d, critical);
                tried += EDGE_STEPS;
                kept.add(edge);
            }
            if (keep) {
                kept.add(new double[] {min - d, g});
            }
            lastD = d;
            lastKept = keep;
        }
        kept.sort((a, b) -> Double.compare(a[0], b[0]));
        double[] thetas = new double[kept.size()];
        double[] skews = new double[kept.size()];
        for (int i = 0; i < thetas.length; i++) {
            thetas[i] = kept.get(i)[0];
            skews[i] = kept.get(i)[1];
        }
        return new ThresholdSet(family, floor, x, thetas, skews, critical, median, gamma, tried);
    }

    /** {θ, g₁}: the kept end of a bisection in ln d between a kept distance and a left-out one. */
    private static double[] edge(double[] x, double min, double keptD, double outD, double critical) {
        double in = Math.log(keptD);
        double out = Math.log(outD);
        double g = skewAt(x, min - keptD);
        for (int s = 0; s < EDGE_STEPS; s++) {
            double mid = 0.5 * (in + out);
            double gm = skewAt(x, min - Math.exp(mid));
            if (gm >= critical) {
                in = mid;
                g = gm;
            } else {
                out = mid;
            }
        }
        return new double[] {min - Math.exp(in), g};
    }

    /** g₁ of ln(x − θ); the readings must lie above θ. */
    public static double skewAt(double[] x, double theta) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = Math.log(x[i] - theta);
        }
        return skewness(y);
    }

    /**
     * The bounds over a set of thresholds: {lower, upper, θ that gave the lower, θ that gave the upper}; the lower
     * −∞ and the upper +∞ when no θ in the set has a fit (an empty set included).
     *
     * @param confidence 1 − α; each pivotal bound is taken at 1 − (α − γ)
     * @throws IllegalArgumentException if the confidence is not computable or α ≤ γ
     */
    public static double[] bounds(ThresholdSet set, IndexKind kind, SpecLimits limits, double confidence, long seed) {
        ShapeFamily family = set.family();
        double[] x = set.readings();
        Confidence.requireComputable(confidence);
        double inner = 1 - ((1 - confidence) - set.gamma());
        if (!(inner < 1)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "confidence %s leaves nothing beside the threshold set's gamma %s", confidence, set.gamma()));
        }
        double[] r = {Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NaN, Double.NaN};
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        for (double theta : set.thetas()) {
            ShapeFitter.Outcome o = ShapeFitter.fit(family, theta, x);
            if (!o.fitted()) {
                continue;
            }
            double[] b = PivotalBound.bounds(o.fit(), kind, limits, x.length, inner, seed);
            if (b[0] < lowest) {
                lowest = b[0];
                r[2] = theta;
            }
            if (b[1] > highest) {
                highest = b[1];
                r[3] = theta;
            }
        }
        if (!Double.isNaN(r[2])) {
            r[0] = lowest;
            r[1] = highest;
        }
        return r;
    }

    /**
     * The floor bounds of one study as a {@link BoundEngine}: the estimate is the index of the fit at the set's
     * {@link ThresholdSet#central() central} θ; a confidence whose γ = {@value #GAMMA_SHARE}·α differs from the set's
     * (a staged study's look) takes its own set.
     *
     * @param set      the thresholds of the study at the requirement's confidence
     * @param estimate the index at the set's central θ
     */
    public record Estimate(ThresholdSet set, IndexKind kind, SpecLimits limits, long seed, double estimate)
            implements BoundEngine {

        @Override
        public double lower(double confidence) {
            return at(confidence)[0];
        }

        @Override
        public double upper(double confidence) {
            return at(confidence)[1];
        }

        /** The set of thresholds at {@code confidence}: this one, or one found afresh with that confidence's γ. */
        public ThresholdSet setAt(double confidence) {
            double gamma = GAMMA_SHARE * (1 - confidence);
            return Math.abs(gamma - set.gamma()) <= 1e-12 * gamma ? set : thresholds(set.family(), set.floor(), set.readings(), gamma);
        }

        /** {lower, upper, θ of the lower, θ of the upper} at {@code confidence}. */
        public double[] at(double confidence) {
            return bounds(setAt(confidence), kind, limits, confidence, seed);
        }
    }
}
