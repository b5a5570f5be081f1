package dev.proofrun.control;

import java.util.Objects;

/**
 * The two charts of a study and the σ_w estimate behind their limits.
 *
 * @param kind        which pair
 * @param location    the mean or individuals chart
 * @param spread      the range, standard-deviation or moving-range chart
 * @param sigmaWithin σ̂ used for the limits (R̄/d2, S̄/c4 or MR̄/d2(2))
 */
public record ChartPair(ChartKind kind, ControlChart location, ControlChart spread, double sigmaWithin) {

    public ChartPair {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(location, "location");
        Objects.requireNonNull(spread, "spread");
    }
}
