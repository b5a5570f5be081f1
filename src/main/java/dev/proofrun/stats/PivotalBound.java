package dev.proofrun.stats;

import java.util.Arrays;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.IntStream;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.AhrensDieterMarsagliaTsangGammaSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Confidence bounds of the percentile index ({@link PercentileIndex}) under a fitted location–scale model
 * by generalized pivotal quantities (Weerahandi 1993, JASA 88:899–905; for location–scale families
 * Krishnamoorthy &amp; Mathew 2009, <em>Statistical Tolerance Regions</em>, ch. 1 and 7).
 *
 * <p>On the family's scale y the maximum-likelihood estimates (û, b̂) of a location–scale model satisfy:
 * (û − u)/b̂ and b̂/b have distributions free of (u, b) — those of (Û₀/B̂₀, B̂₀), the estimates from a
 * standard sample of the same size N. Each of M pivot draws (Û₀, B̂₀) gives a generalized pivotal value
 * u* = û − (Û₀/B̂₀)·b̂, b* = b̂/B̂₀, and the index C* of the model (u*, b*). The lower 1 − α bound is the
 * α-quantile of the M values of C*, the upper one the (1 − α)-quantile. The estimate is refitted on every
 * simulated standard sample, so the bound accounts for both estimated parameters.
 *
 * <ul>
 * <li>Normal and lognormal: Û₀ = Z/√N and N·B̂₀² ~ χ²_{N−1}, drawn directly (independent).</li>
 * <li>Weibull (smallest extreme value on ln x): Û₀, B̂₀ by refitting {@link ShapeFitter} to N standard
 *     exponential readings (Weibull k = 1, c = 1) per draw.</li>
 * </ul>
 * The draws depend only on (family, N, seed), so they are kept (a small cache) and a grade with the same
 * seed is reproducible bit for bit. The Monte-Carlo error of the α-quantile with M = {@value #DRAWS} draws
 * is about √(α(1 − α)/M) ≈ 0.0034 in probability at α = 0.05.
 */
public final class PivotalBound {

    /** Pivot draws per bound. */
    public static final int DRAWS = 4000;
    /** The seed used unless another is given; shown with every bound. */
    public static final long DEFAULT_SEED = 0x5eed_2271L;

    private static final int CACHE_LIMIT = 64;
    /** Weibull samples drawn before they are refitted together. */
    private static final int BLOCK = 256;
    private static final Map<String, double[][]> CACHE = new ConcurrentHashMap<>();

    private PivotalBound() {
    }

    /**
     * The lower and upper bounds at {@code confidence}.
     *
     * @param kind the index (its side only: Cp-like, upper, lower or nearest)
     * @param readings N, the number of readings the fit came from
     * @return {lower, upper}
     * @throws IllegalArgumentException if the confidence is not in (0.5, 1), N &lt; 3, or the family is not
     *                                  location–scale (the folded normal: {@link FoldedNormalBound})
     */
    public static double[] bounds(ShapeFit fit, IndexKind kind, SpecLimits limits, int readings, double confidence, long seed) {
        if (!fit.family().isLocationScale()) {
            throw new IllegalArgumentException("no pivotal bound for the " + fit.family().token() + " shape");
        }
        Confidence.requireComputable(confidence);
        if (readings < ShapeFitter.MIN_READINGS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "at least 3 readings are needed: %d", readings));
        }
        ShapeFamily family = fit.family();
        double[][] piv = pivots(family, readings, seed);
        double zLow = ShapeFit.standardQuantile(family, PercentileIndex.LOW);
        double zMed = ShapeFit.standardQuantile(family, 0.5);
        double zHigh = ShapeFit.standardQuantile(family, PercentileIndex.HIGH);
        double u = fit.location();
        double b = fit.scale();
        double theta = fit.threshold(); // a declared threshold shifts the quantiles; the pivots are those of x − θ
        int m = piv[0].length;
        double[] c = new double[m];
        for (int j = 0; j < m; j++) {
            double bStar = b / piv[1][j];
            double uStar = u - piv[0][j] / piv[1][j] * b;
            c[j] = PercentileIndex.of(kind, limits, theta + ShapeFit.fromScale(family, uStar + bStar * zLow),
                    theta + ShapeFit.fromScale(family, uStar + bStar * zMed), theta + ShapeFit.fromScale(family, uStar + bStar * zHigh));
        }
        Arrays.sort(c);
        double alpha = 1 - confidence;
        return new double[] {orderStatistic(c, alpha), orderStatistic(c, 1 - alpha)};
    }

    /** The p-quantile of sorted values by linear interpolation between order statistics (Hyndman–Fan type 7). */
    static double orderStatistic(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int i = (int) Math.floor(h);
        if (i + 1 >= sorted.length) {
            return sorted[sorted.length - 1];
        }
        return sorted[i] + (h - i) * (sorted[i + 1] - sorted[i]);
    }

    /** {Û₀[], B̂₀[]}: the {@value #DRAWS} pivot draws for (family, N, seed). */
    static double[][] pivots(ShapeFamily family, int readings, long seed) {
        return pivots(family, readings, seed, DRAWS);
    }

    /** {Û₀[], B̂₀[]}: {@code count} draws of the standard estimates for (family, N, seed), kept in a small cache. */
    static double[][] pivots(ShapeFamily family, int readings, long seed, int count) {
        ShapeFamily key = family == ShapeFamily.WEIBULL ? family : ShapeFamily.NORMAL; // normal and lognormal share
        String id = key + "/" + readings + "/" + seed + "/" + count;
        double[][] p = CACHE.get(id);
        if (p == null) {
            p = key == ShapeFamily.WEIBULL ? extremeValuePivots(readings, seed, count) : normalPivots(readings, seed, count);
            if (CACHE.size() >= CACHE_LIMIT) {
                CACHE.clear();
            }
            CACHE.put(id, p);
        }
        return p;
    }

    private static double[][] normalPivots(int n, long seed, int draws) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(rng);
        // chi-square with N − 1 df = gamma(shape (N − 1)/2, scale 2)
        var chi2 = AhrensDieterMarsagliaTsangGammaSampler.of(rng, (n - 1) / 2.0, 2.0);
        double[] u0 = new double[draws];
        double[] b0 = new double[draws];
        for (int j = 0; j < draws; j++) {
            u0[j] = z.sample() / Math.sqrt(n);
            b0[j] = Math.sqrt(chi2.sample() / n);
        }
        return new double[][] {u0, b0};
    }

    /**
     * The Weibull pivots: standard exponential samples drawn in order from one stream, {@value #BLOCK} samples at a
     * time, refitted on all cores, then taken in order — the same draws, bit for bit, as refitting each sample as it
     * is drawn (a sample with no fit, a tie of all N and vanishingly rare, is skipped as the next one is drawn).
     */
    private static double[][] extremeValuePivots(int n, long seed, int draws) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.Exponential e = ZigguratSampler.Exponential.of(rng);
        double[] u0 = new double[draws];
        double[] b0 = new double[draws];
        double[][] block = new double[BLOCK][n];
        ShapeFitter.Outcome[] fits = new ShapeFitter.Outcome[BLOCK];
        int j = 0;
        while (j < draws) {
            int size = Math.min(BLOCK, draws - j);
            for (int s = 0; s < size; s++) {
                for (int i = 0; i < n; i++) {
                    block[s][i] = e.sample();
                }
            }
            IntStream.range(0, size).parallel().forEach(s -> fits[s] = ShapeFitter.fitUnbounded(ShapeFamily.WEIBULL, block[s]));
            for (int s = 0; s < size; s++) {
                if (fits[s].fitted()) {
                    u0[j] = fits[s].fit().location();
                    b0[j] = fits[s].fit().scale();
                    j++;
                }
            }
        }
        return new double[][] {u0, b0};
    }
}
