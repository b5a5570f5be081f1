package dev.proofrun.app.session;

import dev.proofrun.design.Spending;
import dev.proofrun.schedule.CalendarDefaults;

/**
 * The plan-level inputs of the wizard, kept as the user typed them (text), so that a draft can hold
 * input that is not yet valid and nothing typed is ever lost. Each step's view-model parses and
 * validates the fields it owns.
 */
public enum DraftField {
    PLAN_ID(""),
    PART_NUMBER(""),
    PART_NAME(""),
    PART_REVISION(""),
    PREPARED_BY(""),
    COLLECTOR(""),
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
    /** The wanted power of the study, 1 − β. */
    POWER("0.90"),
    /** The subgroup size picked by the user; empty = the recommended design. */
    CHOSEN_SUBGROUP_SIZE(""),
    /** The number of subgroups kept from a plan file; empty = the table's k for the chosen size. */
    CHOSEN_SUBGROUPS(""),
    /** Planned looks at the data, 1 (a single stage, graded once at the end) to 4, as {@code plan new --stages}. */
    STAGES("1"),
    /** Token of {@link dev.proofrun.design.Spending}: how a staged plan spends its false-pass risk. */
    SPENDING(Spending.DEFAULT_TOKEN),
    /** The study's first minute, "yyyy-MM-dd HH:mm" in the plant's zone. */
    START(""),
    /** "days" or "shifts". */
    SPAN_KIND("days"),
    /** The command line's default ({@link CalendarDefaults#SPAN_DAYS} working days). */
    SPAN_COUNT(Integer.toString(CalendarDefaults.SPAN_DAYS)),
    /** The command line's default: this computer's zone ({@link CalendarDefaults#zone()}). */
    ZONE(CalendarDefaults.zone().getId()),
    /** "Mon-Fri" or a list "Mon, Tue, Thu". */
    WORKING_DAYS("Mon-Fri"),
    /** "early 06:00-14:00, late 14:00-22:00". */
    SHIFTS("early 06:00-14:00, late 14:00-22:00"),
    /** "09:30-09:45, 12:00-12:30". */
    BREAKS(""),
    /** "2027-03-26, 2027-03-29". */
    NON_WORKING(""),
    /** "40 s" (seconds per part) or "90/h" (parts per hour). */
    RATE("60/h"),
    /** The command line's default ({@link CalendarDefaults#SPACING_TOKEN}). */
    SPACING(CalendarDefaults.SPACING_TOKEN),
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
