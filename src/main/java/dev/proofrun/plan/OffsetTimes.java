package dev.proofrun.plan;

import java.time.DateTimeException;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;

/**
 * Reads the offset date-times a plan file holds ({@code 2027-03-01T06:04+01:00}, as
 * {@link OffsetDateTime#toString} writes them) by their fixed positions. Gives exactly what
 * {@link OffsetDateTime#parse(CharSequence)} gives (an equal value: same local date-time, same offset); any
 * other shape, or a field out of range, goes through {@link OffsetDateTime#parse(CharSequence)} itself, so
 * its refusals are unchanged. On a cold JVM the formatter costs several microseconds a slot.
 */
final class OffsetTimes {

    private OffsetTimes() {
    }

    /**
     * @throws java.time.format.DateTimeParseException as {@link OffsetDateTime#parse(CharSequence)}
     */
    static OffsetDateTime parse(String t) {
        // yyyy-MM-ddTHH:mm±HH:MM (22) or yyyy-MM-ddTHH:mm:ss±HH:MM (25)
        int n = t.length();
        boolean seconds = n == 25;
        if ((n == 22 || seconds) && t.charAt(4) == '-' && t.charAt(7) == '-' && t.charAt(10) == 'T' && t.charAt(13) == ':'
                && (!seconds || t.charAt(16) == ':') && t.charAt(n - 3) == ':') {
            char sign = t.charAt(n - 6);
            int year = digits(t, 0, 4);
            int month = digits(t, 5, 2);
            int day = digits(t, 8, 2);
            int hour = digits(t, 11, 2);
            int minute = digits(t, 14, 2);
            int second = seconds ? digits(t, 17, 2) : 0;
            int oh = digits(t, n - 5, 2);
            int om = digits(t, n - 2, 2);
            if ((sign == '+' || sign == '-') && (year | month | day | hour | minute | second | oh | om) >= 0
                    && hour <= 23 && minute <= 59 && second <= 59 && oh <= 17 && om <= 59) {
                int s = sign == '-' ? -1 : 1;
                try {
                    return OffsetDateTime.of(LocalDateTime.of(year, month, day, hour, minute, second),
                            ZoneOffset.ofHoursMinutes(s * oh, s * om));
                } catch (DateTimeException e) {
                    // a day or month that does not exist: refused below with the formatter's own message
                }
            }
        }
        return OffsetDateTime.parse(t);
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
