package dev.proofrun.grade;

import dev.proofrun.stats.AndersonDarling;
import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * The Anderson–Darling statistic of readings against a fitted distribution, and the 5 % decisions for the
 * fitted models (D'Agostino &amp; Stephens 1986, <em>Goodness-of-Fit Techniques</em>, ch. 4).
 *
 * <p>A² = −N − (1/N)·Σᵢ (2i−1)·[ln F(x₍ᵢ₎) + ln(1 − F(x₍N+1−i₎))] over the sorted readings.
 * <ul>
 * <li>Normal with estimated mean and s (used for Box–Cox- and log-transformed readings): A*² =
 *     A²·(1 + 0.75/N + 2.25/N²) and Stephens' p-value formulas (Table 4.9, from memory; checked against
 *     SciPy's critical values in the tests). The transform's λ is itself estimated, which makes the test
 *     somewhat too lenient; said in the Javadoc of {@link DistributionFits}.</li>
 * <li>Weibull with both parameters estimated: A*² = A²·(1 + 0.2/√N), rejected at 5 % above 0.757
 *     (Table 4.17, from memory).</li>
 * </ul>
 */
final class AndersonDarlingFit {

    static final double WEIBULL_CRITICAL_5 = 0.757;

    private AndersonDarlingFit() {
    }

    /** A² of the readings against the distribution function {@code cdf}. */
    static double statistic(double[] readings, DoubleUnaryOperator cdf) {
        double[] x = readings.clone();
        Arrays.sort(x);
        int n = x.length;
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = clamp(cdf.applyAsDouble(x[i]));
        }
        double s = 0;
        for (int i = 0; i < n; i++) {
            s += (2 * i + 1) * (Math.log(f[i]) + Math.log1p(-f[n - 1 - i]));
        }
        return -n - s / n;
    }

    private static double clamp(double p) {
        return Math.min(Math.max(p, 1e-300), 1 - 1e-16);
    }

    /** p-value of A² for the normal with estimated parameters: the shared Table 4.9 formula. */
    static double normalPValue(double a2, int n) {
        return AndersonDarling.pValue(a2 * (1 + 0.75 / n + 2.25 / ((double) n * n)));
    }

    /** True when a Weibull fit with both parameters estimated is not rejected at 5 %. */
    static boolean weibullFits(double a2, int n) {
        return a2 * (1 + 0.2 / Math.sqrt(n)) <= WEIBULL_CRITICAL_5;
    }
}
