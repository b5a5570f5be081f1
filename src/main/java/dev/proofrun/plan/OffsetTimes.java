package dev.proofrun.plan;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.Month;
import java.time.OffsetDateTime;
import java.time.Year;
import java.time.ZoneOffset;

/**
 * Reads offset date-times in the form plan files and returned files hold, {@code yyyy-MM-ddTHH:mm±HH:MM} or
 * {@code yyyy-MM-ddTHH:mm:ss±HH:MM} (as {@link OffsetDateTime#toString} writes them), by their fixed
 * positions: each field range-checked (the day against its month's length, the offset within ±18:00). One
 * reader, two answers: {@link #parse} gives exactly what {@link OffsetDateTime#parse(CharSequence)} gives and
 * falls back to it for any other text, so its refusals are unchanged (on a cold JVM the formatter costs several
 * microseconds a slot); {@link #epochSecond} gives the instant as epoch seconds with no fallback, for grading a
 * returned file cell by cell without building time objects.
 */
public final class OffsetTimes {

    /** {@link #epochSecond}'s answer for text not in the fixed form (which may still be a time another reader reads). */
    public static final long NOT_FIXED = Long.MIN_VALUE;

    private OffsetTimes() {
    }

    /**
     * The instant of a text in the fixed form, as seconds since 1970-01-01T00:00Z.
     *
     * @return epoch seconds, or {@link #NOT_FIXED} for any other shape or a field out of range
     */
    public static long epochSecond(String t) {
        long local = localSecond(t);
        return local == NOT_FIXED ? NOT_FIXED : local - offsetSeconds(t);
    }

    /**
     * @throws java.time.format.DateTimeParseException as {@link OffsetDateTime#parse(CharSequence)}
     */
    static OffsetDateTime parse(String t) {
        long local = localSecond(t);
        if (local != NOT_FIXED) {
            return OffsetDateTime.of(LocalDateTime.ofEpochSecond(local, 0, ZoneOffset.UTC),
                    ZoneOffset.ofTotalSeconds(offsetSeconds(t)));
        }
        return OffsetDateTime.parse(t);
    }

    /**
     * The local date-time of a text in the fixed form as seconds since 1970-01-01T00:00 (read as if at offset
     * zero), after checking the shape and every field, the offset's included; {@link #NOT_FIXED} otherwise.
     */
    private static long localSecond(String t) {
        // yyyy-MM-ddTHH:mm±HH:MM (22) or yyyy-MM-ddTHH:mm:ss±HH:MM (25)
        int n = t.length();
        boolean seconds = n == 25;
        if (!((n == 22 || seconds) && t.charAt(4) == '-' && t.charAt(7) == '-' && t.charAt(10) == 'T'
                && t.charAt(13) == ':' && (!seconds || t.charAt(16) == ':') && t.charAt(n - 3) == ':')) {
            return NOT_FIXED;
        }
        char sign = t.charAt(n - 6);
        int year = digits(t, 0, 4);
        int month = digits(t, 5, 2);
        int day = digits(t, 8, 2);
        int hour = digits(t, 11, 2);
        int minute = digits(t, 14, 2);
        int second = seconds ? digits(t, 17, 2) : 0;
        int offH = digits(t, n - 5, 2);
        int offM = digits(t, n - 2, 2);
        if ((sign == '+' || sign == '-') && (year | month | day | hour | minute | second | offH | offM) >= 0
                && month >= 1 && month <= 12 && day >= 1 && day <= Month.of(month).length(Year.isLeap(year))
                && hour <= 23 && minute <= 59 && second <= 59 && offM <= 59 && (offH < 18 || offH == 18 && offM == 0)) {
            return LocalDate.of(year, month, day).toEpochDay() * 86_400L + hour * 3600L + minute * 60L + second;
        }
        return NOT_FIXED;
    }

    /** The offset of a text {@link #localSecond} accepted, in seconds east of UTC. */
    private static int offsetSeconds(String t) {
        int n = t.length();
        int s = digits(t, n - 5, 2) * 3600 + digits(t, n - 2, 2) * 60;
        return t.charAt(n - 6) == '-' ? -s : s;
    }

    /** The value of {@code len} ASCII digits at {@code from}, or -1. */
    private static int digits(String t, int from, int len) {
        int v = 0;
        for (int i = from; i < from + len; i++) {
            char c = t.charAt(i);
            if (c < '0' || c > '9') {
                return -1;
            }
            v = v * 10 + (c - '0');
        }
        return v;
    }
}
