package dev.proofrun.design;

/**
 * What fixed the number of subgroups of a design: the wanted power, or one of the practice floors
 * ({@link PracticeFloors}). When the power-driven k already meets the floors the design is limited by power.
 */
public enum LimitedBy {
    /** The smallest k whose power reaches the wanted power already meets both floors. */
    POWER("power"),
    /** The floor on the number of subgroups (default 25, common practice) raised k. */
    MIN_SUBGROUPS("min-subgroups"),
    /** The floor on the number of readings (default 100, common practice) raised k. */
    MIN_READINGS("min-readings");

    private final String token;

    LimitedBy(String token) {
        this.token = token;
    }

    /** The word written in JSON and on screen: "power", "min-subgroups", "min-readings". */
    public String token() {
        return token;
    }
}
