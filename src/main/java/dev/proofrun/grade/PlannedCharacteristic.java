package dev.proofrun.grade;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.util.Locale;
import java.util.Objects;

/**
 * A characteristic as the plan states it, for grading.
 *
 * @param id          as on the drawing or inspection list, e.g. "D1"
 * @param name        e.g. "bore diameter"
 * @param unit        e.g. "mm"
 * @param limits      the specification limits
 * @param nominal     the target for Cpm, or {@code null} (then the midpoint of two-sided limits)
 * @param resolution  the gauge's resolution (smallest step it shows), or 0 when not stated
 * @param requirement what must be shown
 * @param shape       the distribution model the plan declares for the readings
 * @param threshold   the declared threshold θ of a {@link ShapeFamily#hasThreshold() threshold shape}; NaN otherwise
 *                    (and NaN when the plan gives a floor instead)
 * @param floor       the declared floor of a threshold shape: θ is unknown, only known to lie at or above it
 *                    ({@link dev.proofrun.stats.FloorBound}); NaN otherwise
 */
public record PlannedCharacteristic(String id, String name, String unit, SpecLimits limits, Double nominal,
        double resolution, Requirement requirement, ShapeFamily shape, double threshold, double floor) {

    /** A characteristic planned with a declared threshold (or none), no floor. */
    public PlannedCharacteristic(String id, String name, String unit, SpecLimits limits, Double nominal,
            double resolution, Requirement requirement, ShapeFamily shape, double threshold) {
        this(id, name, unit, limits, nominal, resolution, requirement, shape, threshold, Double.NaN);
    }

    /** A characteristic planned with a shape that has no threshold. */
    public PlannedCharacteristic(String id, String name, String unit, SpecLimits limits, Double nominal,
            double resolution, Requirement requirement, ShapeFamily shape) {
        this(id, name, unit, limits, nominal, resolution, requirement, shape, Double.NaN);
    }

    /** A characteristic planned with the normal model. */
    public PlannedCharacteristic(String id, String name, String unit, SpecLimits limits, Double nominal,
            double resolution, Requirement requirement) {
        this(id, name, unit, limits, nominal, resolution, requirement, ShapeFamily.NORMAL);
    }

    /**
     * @throws IllegalArgumentException if the resolution is negative or not finite
     * @throws IllegalArgumentException if a threshold shape has not exactly one of a finite threshold and a finite
     *                                  floor, or another shape has either
     */
    public PlannedCharacteristic {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(limits, "limits");
        Objects.requireNonNull(requirement, "requirement");
        shape = shape == null ? ShapeFamily.NORMAL : shape;
        if (!(resolution >= 0) || !Double.isFinite(resolution)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "resolution must be zero or positive: %s", resolution));
        }
        boolean declared = Double.isFinite(threshold) != Double.isFinite(floor);
        if (shape.hasThreshold() != declared || (!shape.hasThreshold() && Double.isFinite(threshold))) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "the %s shape %s a threshold or a floor: %s, %s",
                    shape.token(), shape.hasThreshold() ? "needs exactly one of" : "takes neither", threshold, floor));
        }
    }

    /** True when the plan gives a floor for the threshold, not the threshold itself. */
    public boolean hasFloor() {
        return Double.isFinite(floor);
    }
}
