package dev.proofrun.design;

import dev.proofrun.text.MessageKey;

/**
 * The names of a design table's columns, one word each for the command line's {@code size} table and the
 * wizard's Sample-size step, so that both call the same figure the same thing.
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
    CRITICAL("c*"),
    /** Degrees of freedom of the within-sigma estimate ({@link DesignRow#degreesOfFreedom()}). */
    DF("df"),
    /** What fixed k ({@link LimitedBy}). */
    LIMITED_BY("limited by"),
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
