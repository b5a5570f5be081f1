package dev.proofrun.schedule;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.Locale;

/**
 * What stretch of production the study must cover, from {@code start}.
 * <ul>
 * <li>{@link Kind#SHIFTS}: {@code count} shifts, the shift that contains the start being the first
 * (even when the study starts part-way into it);</li>
 * <li>{@link Kind#DAYS}: the shifts of {@code count} working dates, the start's shift date the first;</li>
 * <li>{@link Kind#LOTS}: {@code count} material lots of {@code lotParts} parts each, that is until the
 * running time for count·lotParts parts at the calendar's rate has passed;</li>
 * <li>{@link Kind#UNTIL}: every shift that starts on or before the date {@code until} (inclusive).</li>
 * </ul>
 *
 * @param start    the study's start, wall-clock time in the calendar's zone, whole minutes; must fall inside
 *                 a shift
 * @param kind     how the span is measured
 * @param count    shifts, days or lots (0 for UNTIL)
 * @param lotParts parts per lot for LOTS (0 otherwise)
 * @param until    the last date for UNTIL (null otherwise)
 */
public record StudySpan(LocalDateTime start, Kind kind, int count, long lotParts, LocalDate until) {

    /** How the span is measured. */
    public enum Kind { SHIFTS, DAYS, LOTS, UNTIL }

    /**
     * @throws IllegalArgumentException if the fields do not fit the kind, or start is not whole minutes
     */
    public StudySpan {
        if (start == null || kind == null) {
            throw new IllegalArgumentException("span start and kind are required");
        }
        if (start.getSecond() != 0 || start.getNano() != 0) {
            throw new IllegalArgumentException("study start must be whole minutes: " + start);
        }
        if (kind == Kind.UNTIL) {
            if (until == null || count != 0 || lotParts != 0) {
                throw new IllegalArgumentException("an 'until' span needs a date and nothing else");
            }
            if (until.isBefore(start.toLocalDate().minusDays(1))) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "the span ends (%s) before the study starts (%s)", until, start));
            }
        } else {
            if (count < 1 || until != null) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "a span of %s needs a count of at least 1: %d", kind.name().toLowerCase(Locale.ROOT), count));
            }
            if ((kind == Kind.LOTS) != (lotParts > 0)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "parts per lot belong to (and are needed by) a span of lots only: %d", lotParts));
            }
        }
    }

    public static StudySpan shifts(LocalDateTime start, int shifts) {
        return new StudySpan(start, Kind.SHIFTS, shifts, 0, null);
    }

    public static StudySpan days(LocalDateTime start, int days) {
        return new StudySpan(start, Kind.DAYS, days, 0, null);
    }

    public static StudySpan lots(LocalDateTime start, int lots, long lotParts) {
        return new StudySpan(start, Kind.LOTS, lots, lotParts, null);
    }

    public static StudySpan until(LocalDateTime start, LocalDate lastDate) {
        return new StudySpan(start, Kind.UNTIL, 0, 0, lastDate);
    }
}
