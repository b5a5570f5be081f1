package dev.proofrun.stats;

import java.util.Locale;
import org.apache.commons.statistics.distribution.ChiSquaredDistribution;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * The sampling distribution of an estimated capability index, given the true process.
 *
 * <p>Model (normal readings): the mean x̄ of N readings is N(μ, σ²/N), independent of the estimated
 * standard deviation σ̂ = σ·W with W = sqrt(χ²_ν/ν). ν is N − 1 for the sample standard deviation,
 * Σ(nᵢ − 1) for the pooled one, or an effective (non-integer) value for R̄/d2 and S̄/c4
 * ({@link SigmaMethod}). In units of σ the half-tolerance is d = 3·Cp and the offset of the mean from
 * the midpoint is b = 3·(Cp − Cpk) ≥ 0.
 *
 * <ul>
 * <li>Ĉp = Cp/W, so P(Ĉp ≥ c) = P(χ²_ν ≤ ν·(Cp/c)²), exact (chi-square).</li>
 * <li>3·sqrt(N)·Ĉpu follows the noncentral t with ν degrees of freedom and noncentrality 3·sqrt(N)·Cpu
 * (Chou, Owen &amp; Borrego 1990, JQT 22:223–229), so P(Ĉpu ≥ c) = P(T' ≥ 3·sqrt(N)·c).</li>
 * <li>Ĉpk = (d − |x̄ − m|)/(3σ̂) ≥ c exactly when |D| ≤ 3·(Cp − c·W) with D = (x̄ − m)/σ ~ N(b, 1/N);
 * conditioning on W gives the one-dimensional integral
 * <pre>  P(Ĉpk ≥ c) = ∫ [Φ(√N·(r(w) − b)) − Φ(−√N·(r(w) + b))] f_W(w) dw,   r(w) = 3·(Cp − c·w),</pre>
 * over the w with r(w) ≥ 0, i.e. w ≤ Cp/c when c &gt; 0 (Pearn, Kotz &amp; Johnson 1992, JQT 24:216–231,
 * give the distribution of Ĉpk in this form). The true Cp enters as the centring nuisance parameter.</li>
 * </ul>
 *
 * <p>The integrals use adaptive Gauss–Legendre ({@link Quadrature}, nodes computed once) to 1e-12
 * absolute, and are fast enough for power calculations with root finding.
 */
public final class IndexDistribution {

    private static final double TOLERANCE = 1e-12;
    /** Where Φ(x) is within 1e-15 of 0 or 1, |x| ≥ this. */
    private static final double TRANSITION = 8.3;
    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);

    private IndexDistribution() {
    }

    /**
     * P(Ĉp ≥ c) = P(χ²_ν ≤ ν·(Cp/c)²); 1 for c ≤ 0.
     *
     * @throws IllegalArgumentException if c is NaN, if trueCp is not finite and positive, if ν is not
     *         finite and positive
     */
    public static double cpAtLeast(double c, double trueCp, double nu) {
        checkFinite("c", c);
        if (!(trueCp > 0) || !Double.isFinite(trueCp)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "true Cp must be positive and finite: %s", trueCp));
        }
        checkNu(nu);
        if (c <= 0) {
            return 1;
        }
        double ratio = trueCp / c;
        return ChiSquaredDistribution.of(nu).cumulativeProbability(nu * ratio * ratio);
    }

    /**
     * P(Ĉpu ≥ c) (equally Ĉpl, Ppu, Ppl) = NoncentralT.sf(3·sqrt(N)·c, ν, 3·sqrt(N)·Cpu).
     *
     * @throws IllegalArgumentException if c or trueCpu is not finite, if n &lt; 2, if ν is not finite
     *         and positive
     */
    public static double oneSidedAtLeast(double c, double trueCpu, int n, double nu) {
        checkFinite("c", c);
        checkFinite("true index", trueCpu);
        checkN(n);
        checkNu(nu);
        double scale = 3 * Math.sqrt(n);
        return NoncentralT.sf(scale * c, nu, scale * trueCpu);
    }

    /**
     * P(Ĉpk ≥ c) for a two-sided specification, by the integral in the class description.
     *
     * @param c the value the estimate must reach (any finite number)
     * @param trueCpk the process Cpk (may be negative: mean outside the tolerance)
     * @param trueCp the process Cp; trueCp − trueCpk sets the centring (equal: centred)
     * @param n number of readings N behind the mean
     * @param nu degrees of freedom of σ̂
     * @throws IllegalArgumentException if c or trueCpk is not finite, if trueCp is not finite and
     *         positive, if trueCpk &gt; trueCp (beyond rounding), if n &lt; 2, if ν is not finite and positive
     */
    public static double cpkAtLeast(double c, double trueCpk, double trueCp, int n, double nu) {
        checkFinite("c", c);
        checkFinite("true Cpk", trueCpk);
        if (!(trueCp > 0) || !Double.isFinite(trueCp)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "true Cp must be positive and finite: %s", trueCp));
        }
        if (trueCpk > trueCp * (1 + 1e-12)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "true Cpk cannot exceed true Cp: Cpk %s, Cp %s", trueCpk, trueCp));
        }
        checkN(n);
        checkNu(nu);
        return cpkAtLeast(c, trueCpk, trueCp, n, ChiDensity.of(nu));
    }

    /**
     * Unchecked form for callers that reuse one chi density (root finding over the true index).
     * For c &gt; 0 the normal factor is 1 to within 1e-16 below w₁ = Cpk/c − T/(3c·√N) and 0 above
     * w₂ = Cpk/c + T/(3c·√N) (T = TRANSITION), and the integrand ends at Cp/c; so the result is
     * P(W ≤ w₁) plus the integral over [w₁, min(w₂, Cp/c)].
     */
    static double cpkAtLeast(double c, double trueCpk, double trueCp, int n, ChiDensity chi) {
        double offset = Math.max(0, 3 * (trueCp - trueCpk));
        double rootN = Math.sqrt(n);
        double lo = chi.lower();
        double hi = chi.upper();
        double inside = 0;
        double a = lo;
        double b = hi;
        if (c > 0) {
            double centre = (trueCp - offset / 3) / c;
            double width = TRANSITION / (3 * c * rootN);
            a = Math.min(Math.max(centre - width, lo), hi);
            b = Math.max(Math.min(Math.min(centre + width, trueCp / c), hi), lo);
            inside = chi.cdf(a);
        }
        if (!(b > a)) {
            return inside;
        }
        double scale = c != 0 ? Math.min(1 / (3 * Math.abs(c) * rootN), chi.scale()) : chi.scale();
        double threeCp = 3 * trueCp;
        double threeC = 3 * c;
        return inside + Quadrature.integrate(w -> {
            double r = threeCp - threeC * w;
            double near = STANDARD_NORMAL.cumulativeProbability(rootN * (r - offset));
            if (near == 0) {
                return 0;
            }
            double far = STANDARD_NORMAL.cumulativeProbability(-rootN * (r + offset));
            return (near - far) * chi.density(w);
        }, a, b, scale, TOLERANCE);
    }

    static void checkFinite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s must be finite: %s", name, value));
        }
    }

    static void checkN(int n) {
        if (n < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "number of readings must be at least 2: %d", n));
        }
    }

    static void checkNu(double nu) {
        if (!(nu > 0) || !Double.isFinite(nu)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "degrees of freedom must be positive and finite: %s", nu));
        }
    }
}
