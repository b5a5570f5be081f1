package dev.proofrun.stats;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Specification limits of one characteristic: two-sided, upper only or lower only.
 *
 * <p>Indices that need the missing limit do not exist for a one-sided specification (Cp, Pp and Cpm need
 * both; Cpl needs the lower limit, Cpu the upper) and are reported as absent, never as zero or NaN.
 *
 * @param lower the lower specification limit LSL, or empty
 * @param upper the upper specification limit USL, or empty
 */
public record SpecLimits(OptionalDouble lower, OptionalDouble upper) {

    /**
     * @throws IllegalArgumentException if both limits are absent
     * @throws IllegalArgumentException if a limit is not finite
     * @throws IllegalArgumentException if LSL ≥ USL
     */
    public SpecLimits {
        if (lower.isEmpty() && upper.isEmpty()) {
            throw new IllegalArgumentException("at least one specification limit is required");
        }
        if (lower.isPresent() && !Double.isFinite(lower.getAsDouble())) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "LSL is not finite: %s", lower.getAsDouble()));
        }
        if (upper.isPresent() && !Double.isFinite(upper.getAsDouble())) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "USL is not finite: %s", upper.getAsDouble()));
        }
        if (lower.isPresent() && upper.isPresent() && lower.getAsDouble() >= upper.getAsDouble()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "LSL must be below USL: LSL %s, USL %s", lower.getAsDouble(), upper.getAsDouble()));
        }
    }

    public static SpecLimits twoSided(double lsl, double usl) {
        return new SpecLimits(OptionalDouble.of(lsl), OptionalDouble.of(usl));
    }

    public static SpecLimits upperOnly(double usl) {
        return new SpecLimits(OptionalDouble.empty(), OptionalDouble.of(usl));
    }

    public static SpecLimits lowerOnly(double lsl) {
        return new SpecLimits(OptionalDouble.of(lsl), OptionalDouble.empty());
    }

    /** Either limit may be {@code null}. */
    public static SpecLimits of(Double lsl, Double usl) {
        return new SpecLimits(lsl == null ? OptionalDouble.empty() : OptionalDouble.of(lsl),
                usl == null ? OptionalDouble.empty() : OptionalDouble.of(usl));
    }

    public boolean isTwoSided() {
        return lower.isPresent() && upper.isPresent();
    }

    public Sides sides() {
        if (isTwoSided()) {
            return Sides.TWO_SIDED;
        }
        return upper.isPresent() ? Sides.UPPER_ONLY : Sides.LOWER_ONLY;
    }

    /** USL − LSL, or empty for a one-sided specification. */
    public OptionalDouble width() {
        return isTwoSided() ? OptionalDouble.of(upper.getAsDouble() - lower.getAsDouble()) : OptionalDouble.empty();
    }

    /** (USL + LSL)/2, or empty for a one-sided specification. */
    public OptionalDouble midpoint() {
        return isTwoSided() ? OptionalDouble.of((upper.getAsDouble() + lower.getAsDouble()) / 2) : OptionalDouble.empty();
    }

    /** The limits under x → a·x + b (a &gt; 0), for unit changes. */
    public SpecLimits transformed(double a, double b) {
        if (!(a > 0)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "scale must be positive: %s", a));
        }
        return new SpecLimits(
                lower.isPresent() ? OptionalDouble.of(a * lower.getAsDouble() + b) : OptionalDouble.empty(),
                upper.isPresent() ? OptionalDouble.of(a * upper.getAsDouble() + b) : OptionalDouble.empty());
    }

    /** Which limits a specification has. */
    public enum Sides {
        /** Both LSL and USL. */
        TWO_SIDED,
        /** Only USL (smaller is better, e.g. a runout). */
        UPPER_ONLY,
        /** Only LSL (larger is better, e.g. a pull-off force). */
        LOWER_ONLY
    }
}
