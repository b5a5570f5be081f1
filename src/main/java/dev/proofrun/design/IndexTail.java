package dev.proofrun.design;

import dev.proofrun.stats.GaussLegendreRule;
import org.apache.commons.numbers.gamma.Erfc;

/**
 * Upper tail probabilities of an estimated index for one design (N readings, σ̂ with ν degrees of freedom),
 * in the model of {@code stats.IndexDistribution}: x̄ ~ N(μ, σ²/N) independent of σ̂ = σ·W,
 * W = sqrt(χ²_ν/ν). In units of σ the half-tolerance is 3·Cp and the mean sits 3·(Cp − Cpk) off the
 * midpoint, so
 * <pre>
 *   P(Ĉpk ≥ c) = ∫ f_W(w)·[Φ(√N(3L − 3cw)) − Φ(√N(3cw + 3L − 6Cp))] dw   over w ≤ Cp/c,
 * </pre>
 * (Pearn, Kotz &amp; Johnson 1992, JQT 24:216–231) with L the true Cpk; the one-sided index (Cpu) is the
 * first term alone, which is the noncentral t tail of Chou, Owen &amp; Borrego (1990, JQT 22:223–229).
 *
 * <p>This is a fast fixed-node version for the designer, which evaluates the tail thousands of times per
 * table: where Φ is within 1e-13 of 1 the integral is the chi distribution function, and only the
 * transition of width ±7.5/(3c√N) around each edge is integrated with 28-node Gauss–Legendre. Its results
 * are checked against {@code stats.IndexDistribution} (adaptive quadrature) in {@code IndexTailTest}.
 * Requires c &gt; 0.
 */
final class IndexTail {

    private static final GaussLegendreRule GL = GaussLegendreRule.of(28);
    private static final double EDGE = 7.5;
    private static final double SQRT_HALF = Math.sqrt(0.5);

    private final ChiScale chi;
    private final double rootN;

    IndexTail(int readings, double nu) {
        this.chi = ChiScale.of(nu);
        this.rootN = Math.sqrt(readings);
    }

    ChiScale chi() {
        return chi;
    }

    double rootN() {
        return rootN;
    }

    static double phi(double x) {
        return 0.5 * Erfc.value(-x * SQRT_HALF);
    }

    /** P(Ĉp ≥ c) = P(W ≤ Cp/c). */
    double spreadAtLeast(double c, double trueCp) {
        return chi.cdf(trueCp / c);
    }

    /** P(Ĉpu ≥ c) for a true one-sided index L. */
    double oneSidedAtLeast(double c, double trueIndex) {
        return minAtLeast(c, trueIndex, Double.POSITIVE_INFINITY);
    }

    /** P(Ĉpk ≥ c) for a true Cpk L and Cp (Cp = +∞: one-sided). */
    double minAtLeast(double c, double trueCpk, double trueCp) {
        return evaluate(c, trueCpk, trueCp, null);
    }

    /**
     * P(Ĉpk ≥ c) and, in {@code slope[0]}, its derivative in c:
     * −3√N·∫ f_W(w)·w·[φ(√N(3L − 3cw)) + φ(√N(3cw + 3L − 6Cp))] dw (the integrand vanishes at the moving
     * end w = Cp/c, so no boundary term).
     */
    double minAtLeast(double c, double trueCpk, double trueCp, double[] slope) {
        return evaluate(c, trueCpk, trueCp, slope);
    }

    private double evaluate(double c, double trueCpk, double trueCp, double[] slope) {
        double s = 3 * c * rootN;
        double lower = chi.lower();
        double cap = Math.min(chi.upper(), trueCp / c);
        double d = 0;
        if (!(cap > lower)) {
            if (slope != null) {
                slope[0] = 0;
            }
            return 0;
        }
        double m1 = trueCpk / c;
        double a = m1 - EDGE / s;
        double t1 = a > lower ? chi.cdf(Math.min(a, cap)) : 0;
        double lo = Math.max(lower, a);
        double hi = Math.min(cap, m1 + EDGE / s);
        for (int i = 0, n = GL.order(); hi > lo && i < n; i++) {
            double w = GL.node(i, lo, hi);
            double fw = GL.weight(i, lo, hi) * chi.density(w);
            double x = s * (m1 - w);
            t1 += fw * phi(x);
            if (slope != null) {
                d += fw * w * Math.exp(-0.5 * x * x);
            }
        }
        double t2 = 0;
        if (trueCp != Double.POSITIVE_INFINITY) {
            double m2 = (2 * trueCp - trueCpk) / c;
            double lo2 = Math.max(lower, m2 - EDGE / s);
            for (int i = 0, n = GL.order(); cap > lo2 && i < n; i++) {
                double w = GL.node(i, lo2, cap);
                double fw = GL.weight(i, lo2, cap) * chi.density(w);
                double x = s * (w - m2);
                t2 += fw * phi(x);
                if (slope != null) {
                    d += fw * w * Math.exp(-0.5 * x * x);
                }
            }
        }
        if (slope != null) {
            slope[0] = -3 * rootN * d / Math.sqrt(2 * Math.PI);
        }
        return Math.max(0, Math.min(1, t1 - t2));
    }
}
