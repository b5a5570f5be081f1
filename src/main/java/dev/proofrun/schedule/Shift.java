package dev.proofrun.schedule;

import java.time.Duration;
import java.time.LocalTime;
import java.util.Locale;

/**
 * A named shift window in the plant's wall-clock time, for example "early" 06:00–14:00 or "night"
 * 22:00–06:00. When {@code end} is not after {@code start} the shift runs past midnight and ends on the
 * next calendar day; a shift belongs to the day on which it starts (a night shift that starts on Friday
 * is Friday's shift, even though it ends on Saturday).
 *
 * @param name  a short name people recognise ("early", "late", "night"); no commas
 * @param start wall-clock start, whole minutes
 * @param end   wall-clock end, whole minutes; equal to start means a 24-hour shift
 */
public record Shift(String name, LocalTime start, LocalTime end) {

    /**
     * @throws IllegalArgumentException if the name is blank or contains a comma
     * @throws IllegalArgumentException if start or end are not whole minutes
     */
    public Shift {
        if (name == null || name.isBlank() || name.contains(",")) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "shift name must be non-blank without commas: '%s'", name));
        }
        requireWholeMinutes(start, "shift start");
        requireWholeMinutes(end, "shift end");
    }

    public static Shift of(String name, String start, String end) {
        return new Shift(name, LocalTime.parse(start), LocalTime.parse(end));
    }

    /** True when the shift ends on the next calendar day. */
    public boolean crossesMidnight() {
        return !end.isAfter(start);
    }

    /** Nominal wall-clock length (a daylight-saving change can make the real length an hour more or less). */
    public Duration nominalLength() {
        Duration d = Duration.between(start, end);
        return crossesMidnight() ? d.plusDays(1) : d;
    }

    /** "06:00-14:00". */
    public String window() {
        return start + "-" + end;
    }

    static void requireWholeMinutes(LocalTime t, String what) {
        if (t == null) {
            throw new IllegalArgumentException(what + " is required");
        }
        if (t.getSecond() != 0 || t.getNano() != 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "%s must be whole minutes: %s", what, t));
        }
    }
}
