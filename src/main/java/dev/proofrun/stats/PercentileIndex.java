package dev.proofrun.stats;

/**
 * The percentile (quantile) capability index of ISO 22514-2 (Clements 1989, <em>Quality Progress</em>
 * 22(9):95–100) from a fitted model's quantiles X₀.₁₃₅ %, X₅₀ %, X₉₉.₈₆₅ %:
 * Cpu = (USL − X₅₀)/(X₉₉.₈₆₅ − X₅₀), Cpl = (X₅₀ − LSL)/(X₅₀ − X₀.₁₃₅), Cp = (USL − LSL)/(X₉₉.₈₆₅ − X₀.₁₃₅),
 * Cpk the smaller one-sided index (the one that exists for a one-sided specification). For the normal
 * model X₉₉.₈₆₅ − X₅₀ = 3σ, so it is the usual index.
 */
public final class PercentileIndex {

    /** The lower tail probability 0.135 % (Φ(−3)). */
    public static final double LOW = 0.00134989803163;
    /** The upper tail probability 99.865 % (Φ(3)). */
    public static final double HIGH = 1 - LOW;

    private PercentileIndex() {
    }

    /**
     * The index of kind {@code kind} from the three quantiles; NaN when it does not exist for the limits.
     * Only the {@link IndexKind#side()} of the kind matters here (the within/overall distinction is the
     * caller's).
     */
    public static double of(IndexKind kind, SpecLimits limits, double low, double median, double high) {
        double upper = limits.upper().isPresent() ? (limits.upper().getAsDouble() - median) / (high - median) : Double.NaN;
        double lower = limits.lower().isPresent() ? (median - limits.lower().getAsDouble()) / (median - low) : Double.NaN;
        switch (kind.side()) {
            case BOTH:
                return limits.isTwoSided() ? limits.width().getAsDouble() / (high - low) : Double.NaN;
            case UPPER:
                return upper;
            case LOWER:
                return lower;
            default:
                return limits.isTwoSided() ? Math.min(upper, lower) : (Double.isNaN(upper) ? lower : upper);
        }
    }

    /** The index under a fitted model. */
    public static double of(IndexKind kind, SpecLimits limits, ShapeFit fit) {
        return of(kind, limits, fit.quantile(LOW), fit.quantile(0.5), fit.quantile(HIGH));
    }

    /** Expected parts per million outside the limits under the fitted model. */
    public static double expectedPpm(SpecLimits limits, ShapeFit fit) {
        double below = limits.lower().isPresent() ? fit.cdf(limits.lower().getAsDouble()) : 0;
        double above = limits.upper().isPresent() ? fit.survival(limits.upper().getAsDouble()) : 0;
        return 1e6 * (below + above);
    }
}
