package dev.proofrun.stats;

import java.util.Arrays;
import java.util.Locale;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * Anderson–Darling test of normality with mean and standard deviation estimated from the readings
 * (Stephens' "case 3"; D'Agostino &amp; Stephens 1986, Goodness-of-Fit Techniques, §4.8 and Table 4.9).
 *
 * <p>With x₍₁₎ ≤ … ≤ x₍N₎, zᵢ = Φ((x₍ᵢ₎ − x̄)/s) and s the sample standard deviation (divisor N − 1):
 * A² = −N − (1/N)·Σᵢ (2i − 1)·[ln zᵢ + ln(1 − z₍N+1−i₎)]. The small-sample adjustment is
 * A* = A²·(1 + 0.75/N + 2.25/N²), and the p-value comes from the piecewise formulas of Table 4.9:
 * <ul>
 * <li>A* ≥ 0.6: p = exp(1.2937 − 5.709·A* + 0.0186·A*²)</li>
 * <li>0.34 ≤ A* &lt; 0.6: p = exp(0.9177 − 4.279·A* − 1.38·A*²)</li>
 * <li>0.2 ≤ A* &lt; 0.34: p = 1 − exp(−8.318 + 42.796·A* − 59.938·A*²)</li>
 * <li>A* &lt; 0.2: p = 1 − exp(−13.436 + 101.14·A* − 223.73·A*²)</li>
 * </ul>
 * The coefficients are as commonly quoted from that table (from memory); the tests check that they
 * reproduce the table's upper percentage points (0.631, 0.752, 0.873, 1.035 at 10, 5, 2.5, 1 %) and
 * compare A² with SciPy. The p-value is clamped to [0, 1]; it is an approximation, good to about
 * ±0.005 near the usual levels. Needs N ≥ 8 (the table's lower limit of use) and some spread.
 */
public final class AndersonDarling {

    /** Smallest sample for which the p-value formulas are used. */
    public static final int MIN_READINGS = 8;

    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);

    private AndersonDarling() {
    }

    /**
     * The outcome.
     *
     * @param statistic A²
     * @param adjusted  A* = A²(1 + 0.75/N + 2.25/N²)
     * @param pValue    the approximate p-value of A* under normality
     */
    public record Result(double statistic, double adjusted, double pValue) {
    }

    /**
     * Tests the readings (in any order; they are copied and sorted) for normality.
     *
     * @throws IllegalArgumentException if fewer than {@value #MIN_READINGS} readings
     * @throws IllegalArgumentException if a reading is not finite
     * @throws IllegalArgumentException if all readings are equal
     */
    public static Result test(double[] readings) {
        int n = readings.length;
        if (n < MIN_READINGS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the Anderson-Darling test needs at least %d readings: %d", MIN_READINGS, n));
        }
        double[] x = readings.clone();
        Arrays.sort(x);
        double sum = 0;
        for (double v : x) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "a reading is not finite: %s", v));
            }
            sum += v;
        }
        double mean = sum / n;
        double ss = 0;
        for (double v : x) {
            ss += (v - mean) * (v - mean);
        }
        double s = Math.sqrt(ss / (n - 1));
        if (!(s > 0)) {
            throw new IllegalArgumentException("the Anderson-Darling test needs readings that are not all equal");
        }
        // ln Φ and ln(1 − Φ) of each standardized reading, from one tail evaluation each: the smaller
        // tail directly (keeps its relative accuracy), the larger one as log1p of minus the smaller.
        double[] logBelow = new double[n];
        double[] logAbove = new double[n];
        for (int i = 0; i < n; i++) {
            double z = (x[i] - mean) / s;
            if (z <= 0) {
                double p = STANDARD_NORMAL.cumulativeProbability(z);
                logBelow[i] = Math.log(p);
                logAbove[i] = Math.log1p(-p);
            } else {
                double q = STANDARD_NORMAL.survivalProbability(z);
                logBelow[i] = Math.log1p(-q);
                logAbove[i] = Math.log(q);
            }
        }
        double acc = 0;
        for (int i = 0; i < n; i++) {
            acc += (2.0 * i + 1) * (logBelow[i] + logAbove[n - 1 - i]);
        }
        double a2 = -n - acc / n;
        double adjusted = a2 * (1 + 0.75 / n + 2.25 / ((double) n * n));
        return new Result(a2, adjusted, pValue(adjusted));
    }

    /** The Table 4.9 p-value of an adjusted statistic A*, clamped to [0, 1]. */
    public static double pValue(double adjusted) {
        double a = adjusted;
        double p;
        if (a >= 0.6) {
            p = Math.exp(1.2937 - 5.709 * a + 0.0186 * a * a);
        } else if (a >= 0.34) {
            p = Math.exp(0.9177 - 4.279 * a - 1.38 * a * a);
        } else if (a >= 0.2) {
            p = 1 - Math.exp(-8.318 + 42.796 * a - 59.938 * a * a);
        } else {
            p = 1 - Math.exp(-13.436 + 101.14 * a - 223.73 * a * a);
        }
        return Math.min(1, Math.max(0, p));
    }
}
