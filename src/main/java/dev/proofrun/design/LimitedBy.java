package dev.proofrun.design;

import dev.proofrun.text.Token;

/**
 * What fixed the number of subgroups of a design: the wanted power, or one of the practice floors
 * ({@link PracticeFloors}). When the power-driven k already meets the floors the design is limited by power.
 * Its {@link #token() token} is the word in JSON and on screen: "power", "min-subgroups", "min-readings".
 */
public enum LimitedBy implements Token {
    /** The smallest k whose power reaches the wanted power already meets both floors. */
    POWER,
    /** The floor on the number of subgroups (default 25, common practice) raised k. */
    MIN_SUBGROUPS,
    /** The floor on the number of readings (default 100, common practice) raised k. */
    MIN_READINGS
}
