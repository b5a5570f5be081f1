package dev.proofrun.grade;

import dev.proofrun.plan.OffsetTimes;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.time.format.DateTimeParseException;

/** Reading the cells of returned files: numbers in either decimal convention, and taken times. */
final class Cells {

    /** Digits that always fit a double exactly: 10^15 &lt; 2^53. */
    static final int FAST_DIGITS = 15;
    private static final double[] POWERS_OF_TEN = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12,
        1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    private Cells() {
    }

    /**
     * A decimal number as people type it: optional sign, digits with {@code .} or {@code ,} as the decimal
     * mark (a single comma and no point is a decimal comma), optional exponent. Anything else — "NaN",
     * "1.0f", "10,0,2", "ca. 10" — is not a number.
     *
     * <p>Fast path (exact, not an approximation): with at most {@value #FAST_DIGITS} digits and no exponent
     * the digits form an integer m &lt; 2<sup>53</sup> and the value is m / 10<sup>f</sup> for f ≤ 22 digits
     * after the mark; both are exact doubles and IEEE division rounds correctly, so the result is the same
     * double as {@link Double#parseDouble} gives (Clinger 1990, "How to read floating point numbers
     * accurately", PLDI '90, the "fast path"). Anything else goes through {@link Double#parseDouble}.
     *
     * @return the value, or NaN when the text is not a number
     */
    static double number(String text) {
        int len = text.length();
        if (len == 0 || len > 40) {
            return Double.NaN;
        }
        int i = 0;
        char c = text.charAt(0);
        if (c == '+' || c == '-') {
            i++;
        }
        int digits = 0;
        int marks = 0;
        int commaAt = -1;
        boolean exponent = false;
        long mantissa = 0;
        int fraction = 0;
        for (; i < len; i++) {
            c = text.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
                if (!exponent) {
                    mantissa = mantissa * 10 + (c - '0'); // overflow only past 18 digits; then not used
                    if (marks > 0) {
                        fraction++;
                    }
                }
            } else if ((c == '.' || c == ',') && !exponent) {
                marks++;
                if (c == ',') {
                    commaAt = i;
                }
            } else if ((c == 'e' || c == 'E') && !exponent && digits > 0) {
                exponent = true;
                if (i + 1 < len && (text.charAt(i + 1) == '+' || text.charAt(i + 1) == '-')) {
                    i++;
                }
                if (i + 1 >= len) {
                    return Double.NaN;
                }
            } else {
                return Double.NaN;
            }
        }
        if (digits == 0 || marks > 1) {
            return Double.NaN;
        }
        if (!exponent && digits <= FAST_DIGITS && fraction < POWERS_OF_TEN.length) {
            double v = mantissa / POWERS_OF_TEN[fraction];
            return text.charAt(0) == '-' ? -v : v;
        }
        String s = commaAt >= 0 ? text.replace(',', '.') : text;
        return Double.parseDouble(s);
    }

    /**
     * Whether the text names a value that is not finite ({@code NaN}, {@code Infinity}, {@code inf}, {@code ∞},
     * any letter case, with or without a sign): {@link #number} takes none of them, and the reader says
     * "not a finite number" for them as for a number that overflows ({@code 1e309}): one rule for all.
     */
    static boolean namesNonFinite(String text) {
        String t = text.startsWith("+") || text.startsWith("-") ? text.substring(1) : text;
        return t.equalsIgnoreCase("nan") || t.equalsIgnoreCase("inf") || t.equalsIgnoreCase("infinity") || t.equals("\u221E");
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
