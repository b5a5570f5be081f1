package dev.proofrun.design;

import org.apache.commons.numbers.gamma.LogGamma;
import org.apache.commons.numbers.gamma.RegularizedGamma;

/**
 * W = σ̂/σ = sqrt(χ²_ν/ν) for an estimate with ν (possibly effective, non-integer) degrees of freedom:
 * density f(w) = 2·(ν/2)^{ν/2}/Γ(ν/2)·w^{ν−1}·exp(−νw²/2), distribution F(w) = P(ν/2, νw²/2) (the
 * regularized lower incomplete gamma function). The effective support [lower, upper] comes from the
 * Wilson–Hilferty cube-root approximation at ±8.5 standard deviations (Wilson &amp; Hilferty 1931, PNAS
 * 17:684–688), which overstates both tails and so leaves out less than 1e-15.
 */
final class ChiScale {

    private static final double SUPPORT_Z = 8.5;

    private final double nu;
    private final double logNormaliser;
    private final double lower;
    private final double upper;

    private ChiScale(double nu) {
        this.nu = nu;
        double half = 0.5 * nu;
        this.logNormaliser = Math.log(2) + half * Math.log(half) - LogGamma.value(half);
        double v = 2 / (9 * nu);
        double lo = 1 - v - SUPPORT_Z * Math.sqrt(v);
        double hi = 1 - v + SUPPORT_Z * Math.sqrt(v);
        this.lower = lo <= 0 ? 0 : Math.sqrt(lo * lo * lo);
        this.upper = Math.sqrt(hi * hi * hi);
    }

    static ChiScale of(double nu) {
        return new ChiScale(nu);
    }

    double nu() {
        return nu;
    }

    double lower() {
        return lower;
    }

    double upper() {
        return upper;
    }

    double density(double w) {
        if (w <= 0) {
            return 0;
        }
        return Math.exp(logNormaliser + (nu - 1) * Math.log(w) - 0.5 * nu * w * w);
    }

    /** P(W ≤ w). */
    double cdf(double w) {
        if (w <= 0) {
            return 0;
        }
        if (w >= upper) {
            return 1;
        }
        return RegularizedGamma.P.value(0.5 * nu, 0.5 * nu * w * w);
    }
}
