package dev.proofrun.grade;

import dev.proofrun.plan.OffsetTimes;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.time.format.DateTimeParseException;

/** Reading the taken times of returned files (numbers are read by the one rule, {@code text.CsvDialect#number}). */
final class CellValues {

    private CellValues() {
    }

    /**
     * A taken time: ISO-8601 with offset ("2027-03-01T06:40+01:00"), a local date-time in the plan's zone
     * ("2027-03-01T06:40", "2027-03-01 06:40", with or without seconds), or a time of day on the planned day
     * ("06:52").
     *
     * @return the instant, or {@code null} when the text is not a time
     */
    static ZonedDateTime taken(String text, ZoneId zone, LocalDate plannedDay) {
        try {
            if (text.length() <= 8 && text.indexOf(':') > 0 && text.indexOf('-') < 0) {
                return ZonedDateTime.of(plannedDay, LocalTime.parse(text.length() == 4 ? "0" + text : text), zone);
            }
            String t = text.replace(' ', 'T');
            int tee = t.indexOf('T');
            if (tee > 0 && (t.indexOf('+', tee) > 0 || t.indexOf('-', tee) > 0 || t.endsWith("Z"))) {
                return OffsetDateTime.parse(t).atZoneSameInstant(zone);
            }
            return ZonedDateTime.of(LocalDateTime.parse(t), zone);
        } catch (DateTimeParseException e) {
            return null;
        }
    }

    /** {@link #takenEpochSecond}'s answer for text that is not a time. */
    static final long NOT_A_TIME = Long.MIN_VALUE;

    /**
     * {@link #taken} as epoch seconds, with a fast path for the form proofrun's files and most gauges write,
     * {@code yyyy-MM-ddTHH:mm[:ss]±hh:mm} ({@link OffsetTimes#epochSecond}: fixed positions, fields
     * range-checked, no time objects); every other form, and any text the fast path does not accept, goes
     * through {@link #taken}. Both give the same instant (tested).
     *
     * @return epoch seconds, or {@link #NOT_A_TIME}
     */
    static long takenEpochSecond(String text, ZoneId zone, LocalDate plannedDay) {
        long fast = OffsetTimes.epochSecond(text);
        if (fast != OffsetTimes.NOT_FIXED) {
            return fast;
        }
        ZonedDateTime t = taken(text, zone, plannedDay);
        return t == null ? NOT_A_TIME : t.toEpochSecond();
    }

    /** A value for messages to six significant digits: 48.013, -4.013, 1E+100. */
    static String brief(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toString();
    }

    /** Formats a value for messages without trailing noise (shortest round-trip form). */
    static String show(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
