package dev.proofrun.schedule;

import java.time.LocalTime;

/**
 * A break in wall-clock time that repeats every working day (for example 09:30–09:45). It removes that
 * time from whichever shift covers it; a break may run past midnight (23:50–00:10) and then applies to
 * the night shift that covers it. No slot is ever planned inside a break.
 *
 * @param start wall-clock start, whole minutes
 * @param end   wall-clock end, whole minutes, different from start
 */
public record BreakWindow(LocalTime start, LocalTime end) {

    /**
     * @throws IllegalArgumentException if start or end are not whole minutes, or they are equal
     */
    public BreakWindow {
        Shift.requireWholeMinutes(start, "break start");
        Shift.requireWholeMinutes(end, "break end");
        if (start.equals(end)) {
            throw new IllegalArgumentException("a break must have a length: " + start + "-" + end);
        }
    }

    public static BreakWindow of(String start, String end) {
        return new BreakWindow(LocalTime.parse(start), LocalTime.parse(end));
    }

    /** True when the break ends on the next calendar day. */
    public boolean crossesMidnight() {
        return end.isBefore(start);
    }

    /** "09:30-09:45". */
    public String window() {
        return start + "-" + end;
    }
}
