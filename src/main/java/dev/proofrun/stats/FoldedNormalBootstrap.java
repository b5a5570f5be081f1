package dev.proofrun.stats;

import java.util.Arrays;
import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The fit check of a declared folded normal ({@link FoldedNormal}) by a seeded parametric bootstrap: no table of
 * Anderson–Darling critical values exists for this model with both parameters estimated, and the null
 * distribution depends on μ/σ. (The index's bounds are {@link FoldedNormalBound}'s.)
 *
 * <ul>
 * <li><b>Fit check</b>: the Anderson–Darling A² of the readings against the fitted model, with the p-value
 *     (1 + #{A²* ≥ A²})/(1 + M) over {@value #CHECK_DRAWS} bootstrap samples, each refitted and tested against
 *     its own fit (Stute, González Manteiga &amp; Presedo Quindimil 1993, <em>Metrika</em> 40:243–256).</li>
 * </ul>
 * A bootstrap sample with no fit (its maximum at the search limit) is drawn again. Same fit, N and seed:
 * same figures, bit for bit.
 */
public final class FoldedNormalBootstrap {

    /** Bootstrap samples per fit check. */
    public static final int CHECK_DRAWS = 400;

    private FoldedNormalBootstrap() {
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
