package dev.proofrun.stats;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.statistics.distribution.ChiSquaredDistribution;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * Confidence bounds for capability indices. A lower (upper) bound at confidence 1 − α is exceeded by
 * the true index with probability 1 − α (α); a two-sided interval at confidence 1 − α puts α/2 on each
 * side ({@link #cpInterval}, {@link #oneSidedInterval}, {@link #cpkInterval}).
 *
 * <ul>
 * <li>Cp, Pp (exact): Ĉ·sqrt(χ²_{α,ν}/ν) below, Ĉ·sqrt(χ²_{1−α,ν}/ν) above, χ²_{p,ν} the p-quantile.</li>
 * <li>Cpu, Cpl, Ppu, Ppl (exact): 3·sqrt(N)·Ĉ follows the noncentral t with ν degrees of freedom and
 * noncentrality 3·sqrt(N)·C; the lower bound is δ_L/(3·sqrt(N)) with P(T' ≥ 3·sqrt(N)·Ĉ | δ_L) = α
 * (Chou, Owen &amp; Borrego 1990, JQT 22:223–229).</li>
 * <li>Cpk, Ppk with {@link BoundMethod#EXACT}: see {@link #lowerCpk}.</li>
 * <li>Cpk, Ppk with {@link BoundMethod#BISSELL}: Ĉ ∓ z_{1−α}·sqrt(1/(9N) + Ĉ²/(2ν)) (Bissell 1990,
 * Applied Statistics 39:331–340; his formula has ν = N − 1).</li>
 * </ul>
 *
 * <p>Inputs are validated here: confidence {@link Confidence#isComputable computable}, in (0.5, 1), ν &gt; 0
 * and finite, N ≥ 2, estimates finite; an {@link IllegalArgumentException} names the bad value. Callers go
 * through {@link BoundEngine} ({@link NormalTheoryBound}), which chooses the formula.
 */
public final class CapabilityBounds {

    /** Lowest confidence a person may state (exclusive); {@link Confidence#MIN}. */
    public static final double MIN_CONFIDENCE = Confidence.MIN;
    /** Highest confidence a person may state (exclusive); {@link Confidence#MAX_STATED}. */
    public static final double MAX_CONFIDENCE = Confidence.MAX_STATED;
    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);
    private static final double ROOT_TOLERANCE = 1e-10;

    private CapabilityBounds() {
    }

    /** A two-sided confidence interval [lower, upper] at the given confidence. */
    public record Interval(double lower, double upper, double confidence) {
    }

    /**
     * Exact lower bound of Cp (or Pp): Ĉp·sqrt(χ²_{α,ν}/ν).
     *
     * @throws IllegalArgumentException if Ĉp is not finite and positive, if ν is not finite and
     *         positive, if the confidence is outside (0.5, 1)
     */
    public static double lowerCp(double cpHat, double nu, double confidence) {
        checkCp(cpHat);
        IndexDistribution.checkNu(nu);
        checkConfidence(confidence);
        return cpHat * Math.sqrt(ChiSquaredDistribution.of(nu).inverseCumulativeProbability(1 - confidence) / nu);
    }

    /**
     * Exact upper bound of Cp (or Pp): Ĉp·sqrt(χ²_{1−α,ν}/ν).
     *
     * @throws IllegalArgumentException as {@link #lowerCp}
     */
    public static double upperCp(double cpHat, double nu, double confidence) {
        checkCp(cpHat);
        IndexDistribution.checkNu(nu);
        checkConfidence(confidence);
        return cpHat * Math.sqrt(ChiSquaredDistribution.of(nu).inverseCumulativeProbability(confidence) / nu);
    }

    /** Two-sided exact interval for Cp at confidence 1 − α: the bounds at 1 − α/2. */
    public static Interval cpInterval(double cpHat, double nu, double confidence) {
        checkConfidence(confidence);
        double side = oneSideOf(confidence);
        return new Interval(lowerCp(cpHat, nu, side), upperCp(cpHat, nu, side), confidence);
    }

    /**
     * Exact lower bound of a one-sided index (Cpu, Cpl, Ppu, Ppl) from the noncentral t:
     * NoncentralT.ncpFor(3·sqrt(N)·Ĉ, ν, 1 − α)/(3·sqrt(N)). Ĉ may be zero or negative (mean at or
     * beyond the limit); the bound is then negative.
     *
     * @throws IllegalArgumentException if Ĉ is not finite, if N &lt; 2, if ν is not finite and positive,
     *         if the confidence is outside (0.5, 1)
     */
    public static double lowerOneSided(double cHat, int n, double nu, double confidence) {
        checkOneSided(cHat, n, nu, confidence);
        double scale = 3 * Math.sqrt(n);
        return NoncentralT.ncpFor(scale * cHat, nu, confidence) / scale;
    }

    /**
     * Exact upper bound of a one-sided index: NoncentralT.ncpFor(3·sqrt(N)·Ĉ, ν, α)/(3·sqrt(N)).
     *
     * @throws IllegalArgumentException as {@link #lowerOneSided}
     */
    public static double upperOneSided(double cHat, int n, double nu, double confidence) {
        checkOneSided(cHat, n, nu, confidence);
        double scale = 3 * Math.sqrt(n);
        return NoncentralT.ncpFor(scale * cHat, nu, 1 - confidence) / scale;
    }

    /** Two-sided exact interval for a one-sided index at confidence 1 − α. */
    public static Interval oneSidedInterval(double cHat, int n, double nu, double confidence) {
        checkConfidence(confidence);
        double side = oneSideOf(confidence);
        return new Interval(lowerOneSided(cHat, n, nu, side), upperOneSided(cHat, n, nu, side), confidence);
    }

    /**
     * Lower confidence bound of Cpk (or Ppk).
     *
     * <p>{@link BoundMethod#BISSELL}: Ĉpk − z_{1−α}·sqrt(1/(9N) + Ĉpk²/(2ν)) (Bissell 1990); Ĉp is not used.
     *
     * <p>{@link BoundMethod#EXACT}, centring taken from the data: the relative offset of the mean
     * k̂ = |x̄ − m|/d = 1 − Ĉpk/Ĉp is held fixed, and the bound is the Cpk = L with
     * P(Ĉpk ≥ ĉpk | Cpk = L, Cp = L/(1 − k̂)) = α, computed with {@link IndexDistribution#cpkAtLeast}
     * and Brent's method. P is increasing in L for fixed k̂ (the acceptance interval for x̄ widens), so
     * the root is unique. Holding the centring at its estimate is not a pivot: the coverage depends on
     * the true centring, and for a centred process it is conservative (the estimated |x̄ − m| is never
     * below the true 0); {@code CapabilityBoundsCoverageTest} measures it: 95 % lower bounds covered
     * 94.8–95.1 % off-centre (Cp = Cpk + 0.5) and 96.0–96.6 % centred, for N = 30–300.
     *
     * <p>Edge cases of EXACT:
     * <ul>
     * <li>Ĉp NaN (one-sided specification) — Ĉpk is then the one index that exists and the bound is the
     * exact noncentral-t bound {@link #lowerOneSided}.</li>
     * <li>Ĉpk ≤ 0 (mean at or beyond a limit, k̂ ≥ 1): the centring cannot be held fixed; the
     * noncentral-t bound of the nearer side is returned. It is at most the two-sided solution, since
     * P(Ĉpk ≥ c) ≤ P(Ĉpu ≥ c), so it errs on the safe side.</li>
     * <li>k̂ = 0 (estimate exactly centred): Cp = Cpk in the model, no special handling needed; k̂ is
     * clamped at 0 when rounding makes Ĉpk exceed Ĉp by a hair.</li>
     * </ul>
     *
     * @throws IllegalArgumentException if Ĉpk is not finite, if Ĉp is neither NaN nor a finite positive
     *         number, if Ĉpk &gt; Ĉp beyond rounding, if N &lt; 2, if ν is not finite and positive, if the
     *         confidence is outside (0.5, 0.9999), if the method is null
     */
    public static double lowerCpk(double cpkHat, double cpHat, int n, double nu, double confidence, BoundMethod m) {
        checkCpk(cpkHat, cpHat, n, nu, confidence, m);
        if (m == BoundMethod.BISSELL) {
            return cpkHat - bissellHalfWidth(cpkHat, n, nu, confidence);
        }
        if (Double.isNaN(cpHat) || cpkHat <= 0) {
            return lowerOneSided(cpkHat, n, nu, confidence);
        }
        return exactCpk(cpkHat, cpHat, n, nu, 1 - confidence);
    }

    /**
     * Upper confidence bound of Cpk (or Ppk); the mirror of {@link #lowerCpk}: BISSELL adds the half
     * width, EXACT solves P(Ĉpk ≥ ĉpk | Cpk = U, k̂ fixed) = 1 − α, with the same edge cases. For the
     * upper bound the noncentral-t fallback (Ĉp NaN, Ĉpk ≤ 0) is at most the two-sided solution, so it
     * is not on the safe side; with the mean at or beyond a limit the far limit adds almost nothing and
     * the two agree closely.
     *
     * @throws IllegalArgumentException as {@link #lowerCpk}
     */
    public static double upperCpk(double cpkHat, double cpHat, int n, double nu, double confidence, BoundMethod m) {
        checkCpk(cpkHat, cpHat, n, nu, confidence, m);
        if (m == BoundMethod.BISSELL) {
            return cpkHat + bissellHalfWidth(cpkHat, n, nu, confidence);
        }
        if (Double.isNaN(cpHat) || cpkHat <= 0) {
            return upperOneSided(cpkHat, n, nu, confidence);
        }
        return exactCpk(cpkHat, cpHat, n, nu, confidence);
    }

    /** Two-sided interval for Cpk at confidence 1 − α: the bounds at 1 − α/2. */
    public static Interval cpkInterval(double cpkHat, double cpHat, int n, double nu, double confidence, BoundMethod m) {
        checkConfidence(confidence);
        double side = oneSideOf(confidence);
        return new Interval(lowerCpk(cpkHat, cpHat, n, nu, side, m), upperCpk(cpkHat, cpHat, n, nu, side, m), confidence);
    }

    /** The Cpk = C with P(Ĉpk ≥ ĉpk | C, k̂) = target, for 0 &lt; ĉpk ≤ Ĉp. */
    private static double exactCpk(double cpkHat, double cpHat, int n, double nu, double target) {
        double keep = Math.min(1, cpkHat / cpHat); // 1 − k̂, in (0, 1]
        ChiDensity chi = ChiDensity.of(nu);
        DoubleUnaryOperator g = cpk -> IndexDistribution.cpkAtLeast(cpkHat, cpk, cpk / keep, n, chi) - target;
        double se = Math.sqrt(1.0 / (9 * n) + cpkHat * cpkHat / (2 * nu));
        // Bracket from Bissell's approximation, widened until the sign changes; g increases with C.
        double z = STANDARD_NORMAL.inverseCumulativeProbability(1 - target);
        double guess = cpkHat - z * se;
        double step = 0.5 * se;
        double lo = guess - step;
        double hi = guess + step;
        if (lo <= 0) {
            lo = 0.5 * Math.max(guess, 0) + 1e-3 * cpkHat;
        }
        double gLo = g.applyAsDouble(lo);
        double gHi = g.applyAsDouble(hi);
        for (int i = 0; gLo > 0 && i < 100; i++) {
            hi = lo;
            gHi = gLo;
            lo *= 0.5;
            gLo = g.applyAsDouble(lo);
        }
        for (int i = 0; gHi < 0 && i < 100; i++) {
            lo = hi;
            gLo = gHi;
            step *= 2;
            hi += step;
            gHi = g.applyAsDouble(hi);
        }
        if (gLo > 0 || gHi < 0) {
            throw new ArithmeticException(String.format(Locale.ROOT,
                    "no Cpk bound found for Cpk^=%s, Cp^=%s, N=%d, nu=%s", cpkHat, cpHat, n, nu));
        }
        return Roots.brent(g, lo, hi, gLo, gHi, ROOT_TOLERANCE);
    }

    private static double bissellHalfWidth(double cHat, int n, double nu, double confidence) {
        double z = STANDARD_NORMAL.inverseCumulativeProbability(confidence);
        return z * Math.sqrt(1.0 / (9.0 * n) + cHat * cHat / (2 * nu));
    }

    /** The one-sided confidence of each end of a two-sided interval: 1 − α/2. */
    private static double oneSideOf(double confidence) {
        return 1 - 0.5 * (1 - confidence);
    }

    private static void checkConfidence(double confidence) {
        Confidence.requireComputable(confidence);
    }

    private static void checkCp(double cpHat) {
        if (!(cpHat > 0) || !Double.isFinite(cpHat)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "estimated Cp must be positive and finite: %s", cpHat));
        }
    }

    private static void checkOneSided(double cHat, int n, double nu, double confidence) {
        IndexDistribution.checkFinite("estimated index", cHat);
        IndexDistribution.checkN(n);
        IndexDistribution.checkNu(nu);
        checkConfidence(confidence);
    }

    private static void checkCpk(double cpkHat, double cpHat, int n, double nu, double confidence, BoundMethod m) {
        if (m == null) {
            throw new IllegalArgumentException("bound method must be given");
        }
        IndexDistribution.checkFinite("estimated Cpk", cpkHat);
        if (!Double.isNaN(cpHat)) {
            checkCp(cpHat);
            if (cpkHat > cpHat * (1 + 1e-9)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "estimated Cpk cannot exceed estimated Cp: Cpk %s, Cp %s", cpkHat, cpHat));
            }
        }
        IndexDistribution.checkN(n);
        IndexDistribution.checkNu(nu);
        checkConfidence(confidence);
    }
}
