package dev.proofrun.stats;

import java.util.Locale;
import java.util.concurrent.atomic.AtomicReferenceArray;
import org.hipparchus.special.Erf;
import org.hipparchus.special.Gamma;
import org.hipparchus.util.FastMath;

/**
 * Control-chart constants for subgroups of n readings from a normal process, computed from their
 * definitions (no typed table):
 *
 * <ul>
 * <li>d2(n) = E[R]/σ, the mean range of n standard normal readings,
 *     d2 = ∫ (1 − Φ(x)ⁿ − (1 − Φ(x))ⁿ) dx over the real line (Tippett 1925, Biometrika 17:364–387);</li>
 * <li>d3(n) = sd(R)/σ, from E[R²] = 2 ∬_{s&lt;t} (1 − (1−Φ(s))ⁿ − Φ(t)ⁿ + (Φ(t) − Φ(s))ⁿ) ds dt, which
 *     is P(min &lt; s and max &gt; t) integrated over s &lt; t, and d3² = E[R²] − d2²;</li>
 * <li>c4(n) = E[s]/σ = sqrt(2/(n−1))·Γ(n/2)/Γ((n−1)/2);</li>
 * <li>chart factors (Montgomery, Introduction to Statistical Quality Control, Appendix VI; ASTM E2587):
 *     A2 = 3/(d2·√n), A3 = 3/(c4·√n), B3 = max(0, 1 − 3·sqrt(1−c4²)/c4), B4 = 1 + 3·sqrt(1−c4²)/c4,
 *     D3 = max(0, 1 − 3·d3/d2), D4 = 1 + 3·d3/d2 (here {@link #d3Chart} and {@link #d4Chart}, so that
 *     the factor D3 is not confused with the constant d3).</li>
 * </ul>
 *
 * <p>The integrals use composite 8-point Gauss–Legendre rules on panels of width 1/2 over [−9, 9]
 * (the integrands are below n·Φ(−9) ≈ 1e−17 outside), which gives about 1e−12 absolute accuracy;
 * tests check against mpmath and a published table. d2 and d3 are computed once per n on first use
 * and cached (thread-safe; a race computes the same value twice, harmlessly). c4 is closed-form and
 * defined for every n ≥ 2; d2, d3 and the factors that need them for 2 ≤ n ≤ {@value #MAX_SIZE}.
 */
public final class ChartConstants {

    /** Largest subgroup size with range-based constants. */
    public static final int MAX_SIZE = 50;

    private static final double LIMIT = 9.0;
    private static final double PANEL = 0.5;
    private static final double[] NODES;
    private static final double[] WEIGHTS;
    private static final AtomicReferenceArray<double[]> RANGE_MOMENTS = new AtomicReferenceArray<>(MAX_SIZE + 1);

    static {
        // 8-point Gauss–Legendre nodes and weights on [-1, 1] (Abramowitz & Stegun 1964, Table 25.4).
        double[] half = {0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363};
        double[] w = {0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763};
        NODES = new double[8];
        WEIGHTS = new double[8];
        for (int i = 0; i < 4; i++) {
            NODES[2 * i] = -half[i];
            NODES[2 * i + 1] = half[i];
            WEIGHTS[2 * i] = w[i];
            WEIGHTS[2 * i + 1] = w[i];
        }
    }

    private ChartConstants() {
    }

    /** d2(n), the expected range of n standard normal readings. d2(2) = 2/√π. */
    public static double d2(int n) {
        return rangeMoments(n)[0];
    }

    /** d3(n), the standard deviation of the range of n standard normal readings. */
    public static double d3(int n) {
        return rangeMoments(n)[1];
    }

    /**
     * c4(n) = sqrt(2/(n−1))·Γ(n/2)/Γ((n−1)/2), the mean of the sample standard deviation of n normal
     * readings over σ; any n ≥ 2 (used with n = ν+1 for the pooled estimator).
     *
     * @throws IllegalArgumentException if n &lt; 2
     */
    public static double c4(int n) {
        if (n < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "c4 needs n >= 2: %d", n));
        }
        return FastMath.exp(logC4(n));
    }

    /**
     * c4 at a real argument m &gt; 1, the same gamma-function form: the mean of a chi variable with
     * m − 1 (possibly non-integer) degrees of freedom over its root mean square. Used to match an
     * estimator to a scaled chi variable with an effective degrees of freedom.
     *
     * @throws IllegalArgumentException if m is not above 1 or not finite
     */
    public static double c4Continuous(double m) {
        if (!(m > 1) || !Double.isFinite(m)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "c4 needs a finite argument above 1: %s", m));
        }
        return FastMath.exp(logC4(m));
    }

    /**
     * (1 − c4(m)²)/c4(m)², the squared coefficient of variation of a chi variable with m − 1 degrees of
     * freedom, computed without cancellation for large m (it tends to 1/(2(m−1))).
     *
     * @throws IllegalArgumentException if m is not above 1 or not finite
     */
    public static double chiCv2(double m) {
        if (!(m > 1) || !Double.isFinite(m)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "chi CV needs a finite argument above 1: %s", m));
        }
        return FastMath.expm1(-2 * logC4(m));
    }

    /** A2 = 3/(d2·√n), the factor for mean-chart limits from R̄. */
    public static double a2(int n) {
        return 3 / (d2(n) * Math.sqrt(n));
    }

    /** A3 = 3/(c4·√n), the factor for mean-chart limits from S̄. */
    public static double a3(int n) {
        checkRangeSize(n);
        return 3 / (c4(n) * Math.sqrt(n));
    }

    /** B3 = max(0, 1 − 3·sqrt(1−c4²)/c4), the lower s-chart factor. */
    public static double b3(int n) {
        return Math.max(0, 1 - sChartSpread(n));
    }

    /** B4 = 1 + 3·sqrt(1−c4²)/c4, the upper s-chart factor. */
    public static double b4(int n) {
        return 1 + sChartSpread(n);
    }

    /** The chart factor D3 = max(0, 1 − 3·d3/d2), lower range-chart limit over R̄. */
    public static double d3Chart(int n) {
        return Math.max(0, 1 - 3 * d3(n) / d2(n));
    }

    /** The chart factor D4 = 1 + 3·d3/d2, upper range-chart limit over R̄. */
    public static double d4Chart(int n) {
        return 1 + 3 * d3(n) / d2(n);
    }

    private static double sChartSpread(int n) {
        checkRangeSize(n);
        return 3 * Math.sqrt(chiCv2(n));
    }

    private static void checkRangeSize(int n) {
        if (n < 2 || n > MAX_SIZE) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "chart constants need a subgroup size from 2 to %d: %d", MAX_SIZE, n));
        }
    }

    /**
     * ln c4(m) = ln Γ(m/2) − ln Γ((m−1)/2) + ½ ln(2/(m−1)). For a = (m−1)/2 ≥ 20 it is evaluated as
     * a·(log1p(x) − x) + S(a+½) − S(a) with x = 1/(2a) and S the Stirling series of ln Γ, which keeps
     * full relative accuracy of the small result as m grows.
     */
    static double logC4(double m) {
        double a = (m - 1) / 2;
        if (a < 20) {
            return Gamma.logGamma(a + 0.5) - Gamma.logGamma(a) - 0.5 * Math.log(a);
        }
        double x = 1 / (2 * a);
        return a * log1pMinusX(x) + stirling(a + 0.5) - stirling(a);
    }

    /** log1p(x) − x for 0 &lt; x ≤ 1/40 by its alternating series. */
    private static double log1pMinusX(double x) {
        double sum = 0;
        double power = x * x;
        for (int k = 2; k < 40; k++) {
            double term = power / k;
            sum += (k % 2 == 0) ? -term : term;
            if (term < 1e-18 * Math.abs(sum)) {
                break;
            }
            power *= x;
        }
        return sum;
    }

    /** Stirling correction S(z) = ln Γ(z) − (z−½)ln z + z − ½ln 2π, five terms, z ≥ 20. */
    private static double stirling(double z) {
        double z2 = 1 / (z * z);
        return (1.0 / 12 + z2 * (-1.0 / 360 + z2 * (1.0 / 1260 + z2 * (-1.0 / 1680 + z2 / 1188)))) / z;
    }

    private static double[] rangeMoments(int n) {
        checkRangeSize(n);
        double[] m = RANGE_MOMENTS.get(n);
        if (m == null) {
            double d2 = meanRange(n);
            double d3 = Math.sqrt(meanSquaredRange(n) - d2 * d2);
            m = new double[] {d2, d3};
            RANGE_MOMENTS.compareAndSet(n, null, m);
        }
        return m;
    }

    /** d2 = 2 ∫₀^∞ (1 − Φ(x)ⁿ − Q(x)ⁿ) dx, the integrand being even; Q = 1 − Φ. */
    private static double meanRange(int n) {
        double sum = 0;
        int panels = (int) Math.round(LIMIT / PANEL);
        for (int p = 0; p < panels; p++) {
            double lo = p * PANEL;
            for (int i = 0; i < 8; i++) {
                double x = lo + PANEL * (NODES[i] + 1) / 2;
                double q = upperTail(x);
                double belowAll = -FastMath.expm1(n * FastMath.log1p(-q)); // 1 − Φ(x)ⁿ
                sum += WEIGHTS[i] * (belowAll - Math.pow(q, n));
            }
        }
        return 2 * sum * PANEL / 2;
    }

    /**
     * E[R²] = 2 ∫_{−L}^{L} dt ∫_{−L}^{t} P(min &lt; s, max &gt; t) ds, with
     * P(min &lt; s, max &gt; t) = 1 − Q(s)ⁿ − Φ(t)ⁿ + (Φ(t) − Φ(s))ⁿ. The outer nodes t lie on the panel grid;
     * the inner integral is the sum over the whole panels below t's panel (grid nodes, tails computed
     * once) plus the part of t's own panel up to t.
     */
    private static double meanSquaredRange(int n) {
        int panels = (int) Math.round(2 * LIMIT / PANEL);
        int count = panels * 8;
        double[] x = new double[count];
        double[] q = new double[count];
        double[] p = new double[count];
        for (int j = 0; j < panels; j++) {
            for (int i = 0; i < 8; i++) {
                int idx = 8 * j + i;
                x[idx] = -LIMIT + j * PANEL + PANEL * (NODES[i] + 1) / 2;
                q[idx] = upperTail(x[idx]);
                p[idx] = lowerTail(x[idx]);
            }
        }
        double outer = 0;
        for (int j = 0; j < panels; j++) {
            for (int i = 0; i < 8; i++) {
                int it = 8 * j + i;
                double t = x[it];
                double maxBelowT = t > 0 ? -FastMath.expm1(n * FastMath.log1p(-q[it])) : 1 - Math.pow(p[it], n);
                double inner = 0;
                for (int is = 0; is < 8 * j; is++) {
                    inner += WEIGHTS[is % 8] * joint(n, x[is], q[is], p[is], t, q[it], p[it], maxBelowT);
                }
                inner *= PANEL / 2;
                double lo = -LIMIT + j * PANEL;
                double width = t - lo;
                double part = 0;
                for (int m = 0; m < 8; m++) {
                    double s = lo + width * (NODES[m] + 1) / 2;
                    part += WEIGHTS[m] * joint(n, s, upperTail(s), lowerTail(s), t, q[it], p[it], maxBelowT);
                }
                outer += WEIGHTS[i] * (inner + part * width / 2);
            }
        }
        return 2 * outer * PANEL / 2;
    }

    /** P(min &lt; s, max &gt; t) for s &lt; t, with Φ(t) − Φ(s) taken from the tails that keep it accurate. */
    private static double joint(int n, double s, double qs, double ps, double t, double qt, double pt, double maxBelowT) {
        double between;
        if (s > 0) {
            between = qs - qt;
        } else if (t <= 0) {
            between = pt - ps;
        } else {
            between = 1 - qt - ps;
        }
        return maxBelowT - Math.pow(qs, n) + Math.pow(Math.max(between, 0), n);
    }

    /** Q(x) = 1 − Φ(x) = erfc(x/√2)/2. */
    private static double upperTail(double x) {
        return 0.5 * Erf.erfc(x / Math.sqrt(2));
    }

    /** Φ(x) = erfc(−x/√2)/2. */
    private static double lowerTail(double x) {
        return 0.5 * Erf.erfc(-x / Math.sqrt(2));
    }
}
