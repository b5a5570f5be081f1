package dev.proofrun.stats;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.hipparchus.special.Erf;

/**
 * Nonconforming parts: expected parts per million under a normal model, and the count of readings
 * observed outside the tolerance.
 *
 * <p>Expected: ppm = 10⁶·[Φ((LSL − μ)/σ) + 1 − Φ((USL − μ)/σ)], a missing limit contributing nothing;
 * with σ = σ_w for the within figure and σ = s for the overall figure (the usual normal-model estimate;
 * it ignores the sampling error of μ and σ). Tails are taken from erfc, so small figures keep their
 * relative accuracy. Observed: readings strictly below LSL or strictly above USL; a reading on a limit
 * conforms.
 */
public final class Nonconforming {

    private Nonconforming() {
    }

    /**
     * Expected ppm outside the limits for a normal process with mean mu and standard deviation sigma.
     *
     * @throws IllegalArgumentException if mu is not finite or sigma is not positive and finite
     */
    public static double expectedPpm(SpecLimits limits, double mu, double sigma) {
        Objects.requireNonNull(limits, "limits");
        if (!Double.isFinite(mu)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "mean is not finite: %s", mu));
        }
        if (!(sigma > 0) || !Double.isFinite(sigma)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "sigma must be positive and finite: %s", sigma));
        }
        double below = limits.lower().isPresent() ? normalTail((mu - limits.lower().getAsDouble()) / sigma) : 0;
        double above = limits.upper().isPresent() ? normalTail((limits.upper().getAsDouble() - mu) / sigma) : 0;
        return 1e6 * (below + above);
    }

    /** Readings strictly outside the limits. */
    public static long observedOutside(SpecLimits limits, List<double[]> subgroups) {
        Objects.requireNonNull(limits, "limits");
        double lo = limits.lower().orElse(Double.NEGATIVE_INFINITY);
        double hi = limits.upper().orElse(Double.POSITIVE_INFINITY);
        long count = 0;
        for (double[] g : subgroups) {
            for (double x : g) {
                if (x < lo || x > hi) {
                    count++;
                }
            }
        }
        return count;
    }

    /** 1 − Φ(z) = erfc(z/√2)/2. */
    static double normalTail(double z) {
        return 0.5 * Erf.erfc(z / Math.sqrt(2));
    }
}
