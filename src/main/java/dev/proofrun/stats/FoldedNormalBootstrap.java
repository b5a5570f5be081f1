package dev.proofrun.stats;

import java.util.Arrays;
import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Seeded parametric bootstraps under a fitted folded normal ({@link FoldedNormal}), which is not a
 * location–scale family, so the pivots of {@link PivotalBound} do not apply.
 *
 * <ul>
 * <li><b>Bounds</b> of the percentile index: {@value #BOUND_DRAWS} samples of N readings |μ̂ + σ̂Z| are drawn,
 *     the folded normal is refitted to each and its index C*ⱼ computed. The bias-corrected percentile bound
 *     (Efron 1981, <em>Canadian Journal of Statistics</em> 9:139–158; Efron &amp; Tibshirani 1993,
 *     <em>An Introduction to the Bootstrap</em>, §14.3): z₀ = Φ⁻¹(share of C*ⱼ below Ĉ), and the lower
 *     1 − α bound is the Φ(2z₀ − z₁₋α)-quantile of the C*ⱼ, the upper one the Φ(2z₀ + z₁₋α)-quantile.
 *     The plain percentile bound (the α-quantile) was measured to undercover at mean/σ = 1 (7.75 % of 400
 *     studies of 125 readings passed at the boundary, against at most 7.2 %); the bias-corrected one passed 6.0 %
 *     of the same studies. Coverage through the grader: {@code docs/decisions/declared-shape-grading.md}.</li>
 * <li><b>Fit check</b>: the Anderson–Darling A² of the readings against the fitted model, with the p-value
 *     (1 + #{A²* ≥ A²})/(1 + M) over {@value #CHECK_DRAWS} bootstrap samples, each refitted and tested against
 *     its own fit (Stute, González Manteiga &amp; Presedo Quindimil 1993, <em>Metrika</em> 40:243–256).</li>
 * </ul>
 * A bootstrap sample with no fit (its maximum at the search limit) is drawn again. Same fit, N and seed:
 * same figures, bit for bit.
 */
public final class FoldedNormalBootstrap {

    /** Bootstrap samples per bound. */
    public static final int BOUND_DRAWS = 1000;
    /** Bootstrap samples per fit check. */
    public static final int CHECK_DRAWS = 400;

    private static final org.apache.commons.statistics.distribution.NormalDistribution STANDARD =
            org.apache.commons.statistics.distribution.NormalDistribution.of(0, 1);

    private FoldedNormalBootstrap() {
    }

    /**
     * {lower, upper} bounds of the percentile index at {@code confidence}.
     *
     * @throws IllegalArgumentException if the confidence is not in (0.5, 1), N &lt; 3 or the fit is not a folded normal
     */
    public static double[] bounds(ShapeFit fit, IndexKind kind, SpecLimits limits, int readings, double confidence, long seed) {
        check(fit, readings);
        if (!(confidence > 0.5 && confidence < 1)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "confidence must be in (0.5, 1): %s", confidence));
        }
        Sampler s = new Sampler(fit, readings, seed);
        double[] c = new double[BOUND_DRAWS];
        for (int j = 0; j < BOUND_DRAWS; j++) {
            c[j] = PercentileIndex.of(kind, limits, s.next().fit());
        }
        Arrays.sort(c);
        double estimate = PercentileIndex.of(kind, limits, fit);
        int below = 0;
        for (double v : c) {
            if (v < estimate) {
                below++;
            }
        }
        // bias correction z₀ = Φ⁻¹(share of refitted indices below the estimate), kept finite
        double z0 = STANDARD.inverseCumulativeProbability(Math.min(Math.max((below + 0.5) / (BOUND_DRAWS + 1.0), 1e-6), 1 - 1e-6));
        double za = STANDARD.inverseCumulativeProbability(confidence);
        return new double[] {PivotalBound.orderStatistic(c, STANDARD.cumulativeProbability(2 * z0 - za)),
            PivotalBound.orderStatistic(c, STANDARD.cumulativeProbability(2 * z0 + za))};
    }

    /**
     * {A², p}: the readings' Anderson–Darling statistic against {@code fit} and its bootstrap p-value.
     *
     * @throws IllegalArgumentException if N &lt; 3 or the fit is not a folded normal
     */
    public static double[] fitCheck(ShapeFit fit, double[] x, long seed) {
        check(fit, x.length);
        double a2 = andersonDarling(x, fit);
        Sampler s = new Sampler(fit, x.length, seed);
        int above = 0;
        for (int j = 0; j < CHECK_DRAWS; j++) {
            Sampler.Draw d = s.next();
            if (andersonDarling(d.sample(), d.fit()) >= a2) {
                above++;
            }
        }
        return new double[] {a2, (1.0 + above) / (1.0 + CHECK_DRAWS)};
    }

    private static void check(ShapeFit fit, int readings) {
        if (fit.family() != ShapeFamily.FOLDED_NORMAL) {
            throw new IllegalArgumentException("not a folded-normal fit: " + fit.family().token());
        }
        if (readings < ShapeFitter.MIN_READINGS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "at least 3 readings are needed: %d", readings));
        }
    }

    /** A² = −N − (1/N)·Σ (2i − 1)[ln F(x₍ᵢ₎) + ln(1 − F(x₍N+1−i₎))] (D'Agostino &amp; Stephens 1986, ch. 4). */
    static double andersonDarling(double[] readings, ShapeFit fit) {
        double[] x = readings.clone();
        Arrays.sort(x);
        int n = x.length;
        double s = 0;
        for (int i = 0; i < n; i++) {
            double lower = Math.max(fit.cdf(x[i]), 1e-300);
            double upper = Math.max(fit.survival(x[n - 1 - i]), 1e-300);
            s += (2 * i + 1) * (Math.log(lower) + Math.log(upper));
        }
        return -n - s / n;
    }

    /** Draws samples of N readings from the fitted model, each with its own refit. */
    private static final class Sampler {
        private final ShapeFit fit;
        private final double[] x;
        private final ZigguratSampler.NormalizedGaussian z;

        record Draw(double[] sample, ShapeFit fit) {
        }

        Sampler(ShapeFit fit, int readings, long seed) {
            this.fit = fit;
            this.x = new double[readings];
            UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
            this.z = ZigguratSampler.NormalizedGaussian.of(rng);
        }

        Draw next() {
            while (true) {
                for (int i = 0; i < x.length; i++) {
                    x[i] = Math.abs(fit.location() + fit.scale() * z.sample());
                }
                double[] f = FoldedNormal.fit(x);
                if (f != null) {
                    return new Draw(x, new ShapeFit(ShapeFamily.FOLDED_NORMAL, f[0], f[1]));
                }
            }
        }
    }
}
