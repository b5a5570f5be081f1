package dev.proofrun.grade;

import dev.proofrun.stats.SpecLimits;

/**
 * The readings of a characteristic that grading can compute with: those within {@value #WIDTHS} tolerance
 * widths of its limits and within ±{@value #MAGNITUDE}. A reading outside this reach — 1e300 typed for 22.001,
 * or a value pasted from another column — never reaches a sum, a square or a distribution fit: it is set
 * aside like a reading that is not a number, with an error naming file, row and column, and the
 * characteristic is not valid until it is corrected ({@link CharacteristicGrader}). Setting it aside can
 * therefore never let a study pass that such a reading, were it a real part, would fail.
 *
 * <p>The scale of "a tolerance width" is the width USL − LSL for two-sided limits; for one limit, the distance
 * from the limit to the nominal when there is one, else the limit's own size |limit|; with none of those
 * (a single limit at 0 and no nominal) only the magnitude bound applies. On the side without a limit the
 * reach is measured from the limit there is.
 *
 * <p>Why these numbers (a choice, stated in docs/decisions/hostile-input.md): no gauge that resolves a
 * tolerance reads a thousand widths beyond it, while a genuinely bad part (a gross leak, a missing feature)
 * seldom lies more than a few hundred widths out and is then still graded — and fails. The magnitude bound
 * keeps squares below 1e200, so sums of squares of any number of readings a file can hold stay finite
 * (the largest double is about 1.8e308).
 *
 * @param low  the lowest reading computed with
 * @param high the highest reading computed with
 */
record Reach(double low, double high) {

    /** Tolerance widths beyond a limit that a reading may lie and still be computed with. */
    static final double WIDTHS = 1000;
    /** No reading beyond ± this is computed with, whatever the limits. */
    static final double MAGNITUDE = 1e100;

    static Reach of(SpecLimits limits, Double nominal) {
        double lower = limits.lower().isPresent() ? limits.lower().getAsDouble() : limits.upper().getAsDouble();
        double upper = limits.upper().isPresent() ? limits.upper().getAsDouble() : limits.lower().getAsDouble();
        double scale;
        if (limits.isTwoSided()) {
            scale = upper - lower;
        } else if (nominal != null && nominal != lower) {
            scale = Math.abs(lower - nominal);
        } else {
            scale = Math.abs(lower);
        }
        if (!(scale > 0) || !Double.isFinite(scale * WIDTHS)) {
            return new Reach(-MAGNITUDE, MAGNITUDE);
        }
        return new Reach(Math.max(-MAGNITUDE, lower - WIDTHS * scale), Math.min(MAGNITUDE, upper + WIDTHS * scale));
    }

    /** Whether grading computes with this (finite) reading. */
    boolean contains(double v) {
        return v >= low && v <= high;
    }
}
