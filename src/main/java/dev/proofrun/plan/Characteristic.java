package dev.proofrun.plan;

import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One characteristic to study, as it appears on the drawing or inspection list.
 *
 * @param id          the identifier on the drawing ("D1", "17", "T-3"): letters, digits, '.', '-', '_'
 * @param name        what it is ("bore diameter")
 * @param unit        the unit of the readings ("mm", "N·m"); may be empty
 * @param nominal     the nominal (target) value, if there is one
 * @param limits      LSL and/or USL
 * @param gauge       the measuring instrument, if named
 * @param requirement what the study must show for it
 * @param expectation what the engineer believes of the process
 * @param shape       the distribution model the readings are planned to follow ({@link ShapeFamily#NORMAL}
 *                    unless declared); the grader fits only this model
 * @param threshold   the declared threshold θ of a threshold shape ({@code lognormal3}, {@code weibull3}): the
 *                    physical stop or datum the readings cannot go below, a plan value never estimated from the
 *                    readings; empty for every other shape, and empty when the plan gives a floor instead
 * @param floor       the declared floor of a threshold shape: the stop the readings cannot go below when the real
 *                    start of the readings (the threshold) is not known exactly; the grader lets the readings say
 *                    where above the floor the threshold may lie ({@code stats.FloorBound}). Exactly one of threshold
 *                    and floor for a threshold shape; empty for every other shape
 */
public record Characteristic(String id, String name, String unit, OptionalDouble nominal, SpecLimits limits,
        Optional<Gauge> gauge, Requirement requirement, Expectation expectation, ShapeFamily shape,
        OptionalDouble threshold, OptionalDouble floor) {

    /** A characteristic planned with a declared threshold (or a shape that takes none), no floor. */
    public Characteristic(String id, String name, String unit, OptionalDouble nominal, SpecLimits limits,
            Optional<Gauge> gauge, Requirement requirement, Expectation expectation, ShapeFamily shape,
            OptionalDouble threshold) {
        this(id, name, unit, nominal, limits, gauge, requirement, expectation, shape, threshold, OptionalDouble.empty());
    }

    /** A characteristic planned with a shape that takes no threshold. */
    public Characteristic(String id, String name, String unit, OptionalDouble nominal, SpecLimits limits,
            Optional<Gauge> gauge, Requirement requirement, Expectation expectation, ShapeFamily shape) {
        this(id, name, unit, nominal, limits, gauge, requirement, expectation, shape, OptionalDouble.empty());
    }

    /** A characteristic planned with the normal model. */
    public Characteristic(String id, String name, String unit, OptionalDouble nominal, SpecLimits limits,
            Optional<Gauge> gauge, Requirement requirement, Expectation expectation) {
        this(id, name, unit, nominal, limits, gauge, requirement, expectation, ShapeFamily.NORMAL);
    }

    /**
     * The shape as plans and sheets show it: "lognormal", "lognormal3, threshold 9.95" for a declared threshold or
     * "lognormal3, floor 9.95" for a floor.
     */
    public String shapeWords() {
        return threshold.isPresent() ? String.format(Locale.ROOT, "%s, threshold %s", shape.token(), threshold.getAsDouble())
                : floor.isPresent() ? String.format(Locale.ROOT, "%s, floor %s", shape.token(), floor.getAsDouble())
                : shape.token();
    }

    /** The same characteristic planned with another shape that takes no threshold. */
    public Characteristic withShape(ShapeFamily newShape) {
        return new Characteristic(id, name, unit, nominal, limits, gauge, requirement, expectation, newShape);
    }

    /** The same characteristic planned with another shape and threshold (empty unless the shape takes one). */
    public Characteristic withShape(ShapeFamily newShape, OptionalDouble newThreshold) {
        return new Characteristic(id, name, unit, nominal, limits, gauge, requirement, expectation, newShape, newThreshold);
    }

    /** The same characteristic planned with a threshold shape and a floor (or neither for another shape). */
    public Characteristic withShape(ShapeFamily newShape, OptionalDouble newThreshold, OptionalDouble newFloor) {
        return new Characteristic(id, name, unit, nominal, limits, gauge, requirement, expectation, newShape, newThreshold,
                newFloor);
    }

    /**
     * @throws IllegalArgumentException if id or name are missing or the id has other characters
     * @throws IllegalArgumentException if the required index needs a limit the specification lacks
     * @throws IllegalArgumentException if a threshold shape has neither a threshold nor a floor or has both, another
     *                                  shape has either, or they are not a finite number below the upper limit
     */
    public Characteristic {
        if (id == null || !id.matches("[A-Za-z0-9._-]{1,24}")) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "characteristic id must be 1-24 letters, digits, '.', '-' or '_': '%s'", id));
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("characteristic name is required");
        }
        if (limits == null || requirement == null || expectation == null) {
            throw new IllegalArgumentException("limits, requirement and expectation are required");
        }
        unit = unit == null ? "" : unit;
        nominal = nominal == null ? OptionalDouble.empty() : nominal;
        gauge = gauge == null ? Optional.empty() : gauge;
        shape = shape == null ? ShapeFamily.NORMAL : shape;
        threshold = threshold == null ? OptionalDouble.empty() : threshold;
        floor = floor == null ? OptionalDouble.empty() : floor;
        requireLimitsFor(requirement.index(), limits);
        requireThreshold(id, shape, threshold, floor, limits);
    }

    /**
     * The threshold and floor rules alone, for a reader that names the cell or option: a threshold shape takes
     * exactly one of them, other shapes neither; each must be a finite number below the upper limit.
     *
     * @throws IllegalArgumentException as the constructor does for the threshold and the floor
     */
    public static void requireThreshold(String id, ShapeFamily shape, OptionalDouble threshold, OptionalDouble floor,
            SpecLimits limits) {
        if (floor.isPresent() && threshold.isPresent()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s: give a threshold or a floor, not both (a threshold when the real start of the readings is known"
                            + " exactly, a floor when only the stop below it is)", id));
        }
        if (floor.isEmpty()) {
            requireThreshold(id, shape, threshold, limits);
            return;
        }
        if (!shape.hasThreshold()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s: a floor is only taken by the shapes lognormal3 and weibull3, not %s", id, shape.token()));
        }
        if (!Double.isFinite(floor.getAsDouble())) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: the floor must be a number: %s",
                    id, floor.getAsDouble()));
        }
        if (limits.upper().isPresent() && floor.getAsDouble() >= limits.upper().getAsDouble()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s: the floor %s must lie below the upper limit %s", id, floor.getAsDouble(), limits.upper().getAsDouble()));
        }
    }

    /**
     * The threshold rules alone, for a reader that names the threshold's cell or option.
     *
     * @throws IllegalArgumentException as the constructor does for the threshold
     */
    public static void requireThreshold(String id, ShapeFamily shape, OptionalDouble threshold, SpecLimits limits) {
        if (shape.hasThreshold() && threshold.isEmpty()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s: the %s shape needs a threshold (the stop or datum the readings cannot go below) or a floor"
                            + " (when only a stop below the real start is known)", id, shape.token()));
        }
        if (!shape.hasThreshold() && threshold.isPresent()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s: a threshold is only taken by the shapes lognormal3 and weibull3, not %s", id, shape.token()));
        }
        if (threshold.isPresent() && !Double.isFinite(threshold.getAsDouble())) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: the threshold must be a number: %s",
                    id, threshold.getAsDouble()));
        }
        if (threshold.isPresent() && limits.upper().isPresent() && threshold.getAsDouble() >= limits.upper().getAsDouble()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s: the threshold %s must lie below the upper limit %s", id, threshold.getAsDouble(),
                    limits.upper().getAsDouble()));
        }
    }

    private static void requireLimitsFor(IndexKind index, SpecLimits limits) {
        boolean ok;
        switch (index.side()) {
            case BOTH:
                ok = limits.isTwoSided();
                break;
            case UPPER:
                ok = limits.upper().isPresent();
                break;
            case LOWER:
                ok = limits.lower().isPresent();
                break;
            default:
                ok = true;
        }
        if (!ok) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s needs the limit(s) this specification lacks (%s)", index.symbol(), limits.sides()));
        }
    }
}
