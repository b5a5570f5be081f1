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
 */
public record Characteristic(String id, String name, String unit, OptionalDouble nominal, SpecLimits limits,
        Optional<Gauge> gauge, Requirement requirement, Expectation expectation, ShapeFamily shape) {

    /** A characteristic planned with the normal model. */
    public Characteristic(String id, String name, String unit, OptionalDouble nominal, SpecLimits limits,
            Optional<Gauge> gauge, Requirement requirement, Expectation expectation) {
        this(id, name, unit, nominal, limits, gauge, requirement, expectation, ShapeFamily.NORMAL);
    }

    /** The same characteristic planned with another shape. */
    public Characteristic withShape(ShapeFamily newShape) {
        return new Characteristic(id, name, unit, nominal, limits, gauge, requirement, expectation, newShape);
    }

    /**
     * @throws IllegalArgumentException if id or name are missing or the id has other characters
     * @throws IllegalArgumentException if the required index needs a limit the specification lacks
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
        requireLimitsFor(requirement.index(), limits);
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
