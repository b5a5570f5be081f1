package dev.proofrun.cli;

import dev.proofrun.text.MessageKey;

/** Messages of {@code proofrun estimate} that people read. */
public enum EstimateMessage implements MessageKey {
    CAUTION("Caution: these figures are statistical statements under assumptions (a stable process, independent "
            + "readings, a normal distribution, a capable gauge). They do not replace the customer's requirements, "
            + "applicable standards or local codes, licensed practice, or the extra controls that safety-critical "
            + "characteristics need."),
    ROUNDING_LIKELY("The readings lie on a grid of %s (%d distinct values); spread evenly over that step they look normal"
            + " (Anderson-Darling p = %.3f): rounding by the gauge is the likely cause of the rejected normality test,"
            + " not the process's shape."),
    NOT_NORMAL("The readings do not look normal (Anderson-Darling p = %.3f): the normal-model indices, bounds and "
            + "ppm may mislead; consider a transformation or a fitted distribution."),
    NORMALITY_NOT_TESTED("Normality not tested: fewer than 8 readings."),
    WITHIN_ABOVE_OVERALL("Cpk (%.3f) is well above Ppk (%.3f): the subgroup means move more than the spread inside "
            + "the subgroups explains. Check stability before relying on Cpk."),
    NO_STABILITY_CHECK("estimate does not check stability; a capability claim needs a stable process first.");

    private final String english;

    EstimateMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
