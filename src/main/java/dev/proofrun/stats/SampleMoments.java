package dev.proofrun.stats;

import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * Count, mean and overall sample standard deviation s (divisor N − 1) of all readings, ignoring the
 * subgrouping. s is the σ of the overall (Pp) indices; its degrees of freedom are N − 1.
 * Two passes over the data (mean first), which avoids the cancellation of the one-pass sum of squares.
 *
 * @param count             N ≥ 2
 * @param mean              x̄
 * @param standardDeviation s = sqrt(Σ(x − x̄)²/(N − 1))
 */
public record SampleMoments(long count, double mean, double standardDeviation) {

    /**
     * @throws IllegalArgumentException if fewer than 2 readings
     * @throws IllegalArgumentException if a reading is not finite
     */
    public static SampleMoments of(List<double[]> subgroups) {
        Objects.requireNonNull(subgroups, "subgroups");
        long n = 0;
        double sum = 0;
        for (double[] g : subgroups) {
            for (double x : g) {
                if (!Double.isFinite(x)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT, "a reading is not finite: %s", x));
                }
                sum += x;
                n++;
            }
        }
        if (n < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "need at least 2 readings: %d", n));
        }
        double mean = sum / n;
        double ss = 0;
        double drift = 0;
        for (double[] g : subgroups) {
            for (double x : g) {
                ss += (x - mean) * (x - mean);
                drift += x - mean;
            }
        }
        // corrected two-pass (Chan, Golub & LeVeque 1983, The American Statistician 37:242–247)
        ss -= drift * drift / n;
        return new SampleMoments(n, mean, Math.sqrt(Math.max(ss, 0) / (n - 1)));
    }

    /** The mean of one array of readings (NaN for none). */
    public static double meanOf(double[] x) {
        double sum = 0;
        for (double v : x) {
            sum += v;
        }
        return sum / x.length;
    }

    /** The sample standard deviation of one array (divisor n − 1, two passes); NaN for fewer than 2 readings. */
    public static double standardDeviationOf(double[] x) {
        if (x.length < 2) {
            return Double.NaN;
        }
        double m = meanOf(x);
        double ss = 0;
        for (double v : x) {
            ss += (v - m) * (v - m);
        }
        return Math.sqrt(ss / (x.length - 1));
    }

    /** Degrees of freedom of s: N − 1. */
    public double degreesOfFreedom() {
        return count - 1.0;
    }
}
