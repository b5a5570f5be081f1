package dev.proofrun.app.session;

/**
 * The plan-level inputs of the wizard, kept as the user typed them (text), so that a draft can hold
 * input that is not yet valid and nothing typed is ever lost. Each step's view-model parses and
 * validates the fields it owns.
 */
public enum DraftField {
    PLAN_ID(""),
    PART_NUMBER(""),
    PART_NAME(""),
    PREPARED_BY(""),
    /** Token of {@link dev.proofrun.stats.IndexKind}. */
    INDEX("cpk"),
    MINIMUM("1.33"),
    CONFIDENCE("0.95"),
    /** Token of the goal step's expectation source: value, mean-sigma or pilot. */
    EXPECTATION_SOURCE("value"),
    /** The characteristic the goal and sizing steps look at (its id); empty = the first. */
    FOCUS(""),
    EXPECTED_MEAN(""),
    EXPECTED_SIGMA(""),
    PILOT_FILE(""),
    /** The design picked by the user; empty = the recommended one. */
    CHOSEN_SUBGROUP_SIZE(""),
    CHOSEN_SUBGROUPS(""),
    START_DATE(""),
    SPAN_DAYS("5"),
    SHIFTS("06:00-14:00,14:00-22:00"),
    ZONE("Europe/Berlin"),
    SPACING("random"),
    SEED("1"),
    RETURNED_FILE("");

    private final String initial;

    DraftField(String initial) {
        this.initial = initial;
    }

    /** The value a new draft starts with. */
    public String initial() {
        return initial;
    }
}
