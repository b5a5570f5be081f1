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

    /**
     * An upper confidence bound on the fraction of a normal process outside the tolerance, in ppm, from the
     * lower confidence bound L of an index (Cpk with σ_w, Ppk with s, or the one-sided index of a one-sided
     * specification).
     *
     * <p>For a normal process the fraction beyond the upper limit is Φ(−3·Cpu) and below the lower limit
     * Φ(−3·Cpl). With Cpk = min(Cpu, Cpl) = c both are at most Φ(−3c), so p ≤ 2·Φ(−3c) (equality for a centred
     * process) and p ≤ Φ(−3c) with one limit; both decrease in c. Hence the event "c ≥ L", which the lower
     * bound gives with confidence 1 − α, implies p ≤ 2·Φ(−3L) (two limits) or Φ(−3L) (one limit): an upper
     * bound at the same confidence, conservative by up to a factor 2 for an off-centre two-sided process. It
     * inherits the coverage of L and the normal model; it says nothing under another shape, and Cp or Pp alone
     * (which ignore centring) bound nothing. The related published tool is the tolerance interval (ISO 16269-6).
     *
     * @param kind  the index L bounds; Cp and Pp give no bound
     * @param lower its lower confidence bound
     * @return the upper bound in ppm, or empty when the index gives none or L is not finite
     */
    public static java.util.OptionalDouble upperPpm(IndexKind kind, SpecLimits limits, double lower) {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(limits, "limits");
        if (!Double.isFinite(lower)) {
            return java.util.OptionalDouble.empty();
        }
        boolean twoLimits = limits.lower().isPresent() && limits.upper().isPresent();
        double tail = normalTail(3 * lower);
        switch (kind.side()) {
            case NEAREST:
                return java.util.OptionalDouble.of(1e6 * (twoLimits ? 2 * tail : tail));
            case UPPER:
            case LOWER:
                // the side's own fraction only; with two limits the other side is not bounded by it
                return twoLimits ? java.util.OptionalDouble.empty() : java.util.OptionalDouble.of(1e6 * tail);
            default:
                return java.util.OptionalDouble.empty();
        }
    }

    /** 1 − Φ(z) = erfc(z/√2)/2. */
    static double normalTail(double z) {
        return 0.5 * Erf.erfc(z / Math.sqrt(2));
    }
}
