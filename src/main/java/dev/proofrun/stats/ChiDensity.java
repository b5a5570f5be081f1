package dev.proofrun.stats;

import java.util.Locale;
import org.apache.commons.statistics.distribution.ChiSquaredDistribution;
import org.hipparchus.special.Gamma;

/**
 * The density of W = sqrt(χ²_ν/ν), the ratio σ̂/σ of an estimated to the true standard deviation when
 * ν·σ̂²/σ² follows a chi-square distribution with ν (possibly non-integer) degrees of freedom:
 *
 * <pre>  f(w) = 2·(ν/2)^{ν/2} / Γ(ν/2) · w^{ν−1} · exp(−ν·w²/2),   w &gt; 0,</pre>
 *
 * evaluated in log space as
 * log f(w) = log 2 + ½·log(ν/2) − ½·log(2π) − R(ν/2) + (ν−1)·log w + (ν/2)·(1 − w²), with R the
 * remainder of Stirling's formula ({@link #stirlingRemainder}), so that large ν neither overflows nor
 * loses digits to cancellation.
 * The mode is sqrt((ν−1)/ν) for ν &gt; 1 and 0 otherwise.
 *
 * <p>{@link #lower()} and {@link #upper()} bound the effective support: outside them the density is
 * below e^{−{@value #LOG_DROP}} times its value at the mode, which leaves out a probability below 1e-15
 * (for ν ≤ 1 the lower end is 0).
 */
final class ChiDensity {

    /** How far (in natural log) the density falls from its mode at the ends of the support. */
    static final double LOG_DROP = 40;

    /** The most recent density: root finding and power tables ask for the same ν many times in a row. */
    private static volatile ChiDensity lastUsed;

    private final double nu;
    private final double logNormaliser;
    private final double mode;
    private final double lower;
    private final double upper;
    private final ChiSquaredDistribution chiSquare;

    private ChiDensity(double nu) {
        this.nu = nu;
        double halfNu = 0.5 * nu;
        this.logNormaliser = Math.log(2) + 0.5 * Math.log(halfNu) - 0.5 * Math.log(2 * Math.PI) - stirlingRemainder(halfNu);
        this.mode = nu > 1 ? Math.sqrt((nu - 1) / nu) : 0;
        this.lower = nu > 1 ? endOfSupport(-1) : 0;
        this.upper = endOfSupport(+1);
        this.chiSquare = ChiSquaredDistribution.of(nu);
    }

    /**
     * @throws IllegalArgumentException if ν is not a finite positive number
     */
    static ChiDensity of(double nu) {
        if (!(nu > 0) || !Double.isFinite(nu)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "degrees of freedom must be positive and finite: %s", nu));
        }
        ChiDensity last = lastUsed;
        if (last != null && last.nu == nu) {
            return last;
        }
        ChiDensity made = new ChiDensity(nu);
        lastUsed = made;
        return made;
    }

    double degreesOfFreedom() {
        return nu;
    }

    double mode() {
        return mode;
    }

    double lower() {
        return lower;
    }

    double upper() {
        return upper;
    }

    /** The length over which f changes appreciably: about its standard deviation, 1/sqrt(2ν). */
    double scale() {
        return 1 / Math.sqrt(2 * nu);
    }

    /** P(W ≤ w) = P(χ²_ν ≤ ν·w²) (Commons Statistics chi-square); 0 for w ≤ 0. */
    double cdf(double w) {
        return w > 0 ? chiSquare.cumulativeProbability(nu * w * w) : 0;
    }

    /** P(W &gt; w), computed directly for accuracy in the upper tail; 1 for w ≤ 0. */
    double sf(double w) {
        return w > 0 ? chiSquare.survivalProbability(nu * w * w) : 1;
    }

    /** f(w); 0 for w ≤ 0. */
    double density(double w) {
        if (!(w > 0)) {
            return 0;
        }
        return Math.exp(logNormaliser + (nu - 1) * Math.log(w) + 0.5 * nu * (1 - w * w));
    }

    /**
     * log Γ(k) − [(k − ½)·log k − k + ½·log(2π)], the remainder of Stirling's formula. For k ≥ 10 from
     * its asymptotic series (Abramowitz &amp; Stegun 6.1.41; truncation error below 2e-14), which avoids
     * the cancellation of terms of size k·log k in f for large ν; below 10 from Hipparchus logGamma.
     */
    static double stirlingRemainder(double k) {
        if (k < 10) {
            return Gamma.logGamma(k) - ((k - 0.5) * Math.log(k) - k + 0.5 * Math.log(2 * Math.PI));
        }
        double r = 1 / k;
        double r2 = r * r;
        return r * (1.0 / 12 - r2 * (1.0 / 360 - r2 * (1.0 / 1260 - r2 * (1.0 / 1680 - r2 * (1.0 / 1188 - r2 * 691.0 / 360360)))));
    }

    /** log f(w) − log f(mode) for ν &gt; 1; log f(w) − the same at w = 1 otherwise. */
    private double relativeLogDensity(double w) {
        double reference = mode > 0 ? mode : 1;
        return (nu - 1) * Math.log(w / reference) - 0.5 * nu * (w * w - reference * reference);
    }

    /** Newton's method on relativeLogDensity(w) = −LOG_DROP, on the side given by direction. */
    private double endOfSupport(int direction) {
        double reference = mode > 0 ? mode : 1;
        // Start from the normal approximation W ≈ N(mode, 1/(2ν)), then follow the exact log density.
        double sd = 1 / Math.sqrt(2 * nu);
        double w = reference + direction * Math.sqrt(2 * LOG_DROP) * sd;
        if (w <= 0) {
            w = reference * 0.5;
        }
        for (int i = 0; i < 200; i++) {
            double g = relativeLogDensity(w) + LOG_DROP;
            double slope = (nu - 1) / w - nu * w;
            double next = w - g / slope;
            if (direction < 0 && next <= 0) {
                next = 0.5 * w;
            }
            if (direction > 0 && next <= reference) {
                next = 0.5 * (w + reference) + reference;
            }
            if (Math.abs(next - w) <= 1e-12 * w) {
                return next;
            }
            w = next;
        }
        return w;
    }
}
