package dev.proofrun.design;

import dev.proofrun.text.MessageKey;

/** What the study designer tells people: refusals and warnings (English inline, formatted Locale.ROOT). */
public enum DesignMessage implements MessageKey {
    NOT_BETTER_THAN_REQUIRED("expected %s %.3f is not above the required %.3f: no study size can show this; "
            + "the process must improve first"),
    UNREACHABLE("a power of %.3f is out of reach within %d readings for every subgroup size tried "
            + "(best: %.3f with n = %d); raise the expected index or lower the power"),
    UNREACHABLE_FOR_SIZE("subgroups of %d cannot reach a power of %.3f within %d readings; left out of the table"),
    POWER_OUT_OF_RANGE("power must be above 0.05 and below 0.9999: %s"),
    INDEX_NEEDS_BOTH_LIMITS("%s needs both specification limits; use %s for a one-sided specification"),
    INDEX_NEEDS_LIMIT("%s needs the %s specification limit"),
    NO_SUBGROUP_SIZES("give at least one subgroup size between 1 and %d"),
    BAD_SUBGROUP_SIZE("subgroup size must be between 1 and %d: %d"),
    SIGMA_DOES_NOT_SUIT("sigma method %s does not suit subgroups of %d"),
    BAD_SHIFT("shift to detect must be positive (in within standard deviations): %s"),
    BAD_LOSS_RATE("the chance of losing a subgroup must be at least 0 and below 1: %s"),
    BAD_EXPECTATION("%s"),
    BAD_FLOOR("%s"),
    POTENTIAL_IGNORED("the expected Cp is used only for two-sided Cpk/Ppk requirements; ignored for %s"),
    PILOT_UNCERTAINTY("the expectation comes from a pilot of %d readings (%s = %.3f, %.0f %% lower bound %.3f); "
            + "the pilot's own uncertainty is not in the power"),
    GAUGE_RESOLUTION("gauge resolution %s is coarser than a tenth of the tolerance (%s); common practice "
            + "asks for at most a tenth"),
    GAUGE_SPREAD("planned for the observed index: with a gauge standard deviation of %s the observed sigma is "
            + "%s (process %s), so the expected %s drops from %.3f to %.3f"),
    GAUGE_TOO_COARSE_FOR_INDEX("the gauge standard deviation %s leaves an observed %s of %.3f, not above the "
            + "required %.3f: no study size can show this; improve the gauge or the process first"),
    MEAN_OUTSIDE_LIMITS("the expected mean %s lies outside the specification limits"),
    SPREAD_NOT_POSITIVE("the expected standard deviation must be positive: %s"),
    CAUTION("A demonstrated index is a statistical statement under assumptions (stability, independence, "
            + "normal readings, a capable gauge). It does not replace the customer's requirements, applicable "
            + "standards or local codes, licensed practice, or the extra controls that safety-critical "
            + "characteristics need.");

    private final String english;

    DesignMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
