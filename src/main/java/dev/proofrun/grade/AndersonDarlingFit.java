package dev.proofrun.grade;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * The Anderson–Darling statistic of readings against a fitted distribution (D'Agostino &amp; Stephens 1986,
 * <em>Goodness-of-Fit Techniques</em>, ch. 4): A² = −N − (1/N)·Σᵢ (2i−1)·[ln F(x₍ᵢ₎) + ln(1 − F(x₍N+1−i₎))]
 * over the sorted readings. {@link ShapeJudge} applies the adjustment and critical value of the model.
 */
final class AndersonDarlingFit {

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
}
