package dev.proofrun.schedule;

import dev.proofrun.text.MessageKey;

/** Messages of the schedule package: refusals and the words of the frequency summary. */
public enum ScheduleMessage implements MessageKey {
    START_OUTSIDE_SHIFTS("the study start %s is outside every shift of the calendar (shifts %s on %s)"),
    SPAN_BEYOND_CALENDAR("the calendar does not provide %s within %d days of the start %s"),
    UNTIL_TOO_EARLY("the study cannot span until %s: the shift containing the start %s begins on %s"),
    NO_WORKING_TIME("the span from %s has no working time left after breaks"),
    SLOTS_TOO_CLOSE("%d subgroups of %d parts do not fit: at %s parts per hour they need %.0f minutes of running time"
            + " (slots at least %.1f minutes apart) but the span has %.0f minutes; lengthen the span or take fewer subgroups"),
    SUMMARY_SUBGROUPS("one subgroup of %d consecutive parts about every %s over %s on %s"),
    SUMMARY_SINGLE_PARTS("one part about every %s over %s on %s"),
    EVERY_MINUTES("%d minutes"),
    EVERY_HOUR("hour"),
    EVERY_HOURS("%s hours"),
    COUNT_SHIFT("1 shift"),
    COUNT_SHIFTS("%d shifts"),
    COUNT_DAY("1 day"),
    COUNT_DAYS("%d days"),
    NOT_A_SHIFT("'%s' is not a shift such as early 06:00-14:00"),
    NO_SHIFT("give at least one shift, such as early 06:00-14:00"),
    NOT_A_BREAK("'%s' is not a break such as 09:30-09:45"),
    NOT_A_DAY("'%s' is not a day such as Mon or Mon-Fri"),
    NO_WORKING_DAYS("give the working days, such as Mon-Fri"),
    NOT_A_DATE("'%s' is not a date such as 2027-03-26"),
    ITEM_REFUSED("'%s': %s");

    private final String english;

    ScheduleMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
