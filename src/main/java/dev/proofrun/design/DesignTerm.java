package dev.proofrun.design;

import dev.proofrun.text.MessageKey;

/**
 * The names of a design table's columns and their one-line explanations, one word each for the command line's
 * {@code size} table and the wizard's Sample-size step, so that both call the same figure the same thing.
 * Symbols are the ones the domain uses: ĉ* (the critical estimate), ν (the degrees of freedom of the
 * within-sigma estimate); what fixed k is "limited by", as the JSON's {@code limitedBy}.
 */
public enum DesignTerm implements MessageKey {
    /** Subgroup size. */
    SUBGROUP_SIZE("n"),
    /** Number of subgroups. */
    SUBGROUPS("k"),
    /** Readings, n·k. */
    READINGS("N"),
    /** The whole procedure's power ({@link DesignRow#power()}). */
    POWER("power"),
    /** The bound's power alone ({@link DesignRow#boundPower()}). */
    BOUND("bound"),
    /** The smallest estimate whose bound reaches c₀ ({@link DesignRow#criticalEstimate()}). */
    CRITICAL("ĉ*"),
    CRITICAL_TIP("ĉ*: the smallest estimated index whose lower bound reaches the required minimum, at the "
            + "expected centring"),
    /** Degrees of freedom of the within-sigma estimate ({@link DesignRow#degreesOfFreedom()}). */
    DF("ν"),
    DF_TIP("ν: degrees of freedom of the within-sigma estimate (effective, after Patnaik 1950, for "
            + "R̄/d2, S̄/c4 and moving range)"),
    /** What fixed k ({@link LimitedBy}). */
    LIMITED_BY("limited by"),
    LIMITED_BY_TIP("limited by: what fixed the number of subgroups k, the wanted power or a practice floor "
            + "(min-subgroups, min-readings)"),
    /** The grader's stability step calls the process unstable ({@link DesignRow#falseAlarm()}, {@link DesignRow#detection()}). */
    CALLED_UNSTABLE("called unstable"),
    /** Some chart rule fires at least once ({@link DesignRow#anySignalFalseAlarm()}, {@link DesignRow#anySignalDetection()}). */
    SOME_RULE_FIRES("some rule fires"),
    /** On a stable process. */
    STABLE("stable"),
    /** After the mean moves by δ·σ_w. */
    SHIFT("shift");

    private final String english;

    DesignTerm(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
