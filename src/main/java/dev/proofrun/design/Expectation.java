package dev.proofrun.design;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * What the engineer believes of the process: the true value c₁ of the required index, and for a
 * two-sided Cpk/Ppk requirement the centring, given as the true Cp (or Pp). Cp = Cpk means centred.
 *
 * @param index     c₁, the true value of the required index
 * @param potential the true Cp (Pp) for two-sided Cpk/Ppk requirements; empty means centred (Cp = c₁)
 */
public record Expectation(double index, OptionalDouble potential) {

    /**
     * @throws IllegalArgumentException if index is not positive and finite
     * @throws IllegalArgumentException if the potential is below the index (Cp ≥ Cpk always)
     */
    public Expectation {
        if (!(index > 0) || !Double.isFinite(index)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "expected index must be positive: %s", index));
        }
        if (potential.isPresent() && !(potential.getAsDouble() >= index)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "expected Cp (%s) cannot be below the expected Cpk (%s)", potential.getAsDouble(), index));
        }
    }

    public static Expectation centred(double index) {
        return new Expectation(index, OptionalDouble.empty());
    }

    public static Expectation offCentre(double index, double potential) {
        return new Expectation(index, OptionalDouble.of(potential));
    }

    /** The true Cp (Pp): the potential when given, else the index itself (centred). */
    public double potentialOrIndex() {
        return potential.orElse(index);
    }
}
