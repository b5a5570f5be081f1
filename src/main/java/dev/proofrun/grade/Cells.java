package dev.proofrun.grade;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.time.format.DateTimeParseException;

/** Reading the cells of returned files: numbers in either decimal convention, and taken times. */
final class Cells {

    private Cells() {
    }

    /**
     * A decimal number as people type it: optional sign, digits with {@code .} or {@code ,} as the decimal
     * mark (a single comma and no point is a decimal comma), optional exponent. Anything else — "NaN",
     * "1.0f", "10,0,2", "ca. 10" — is not a number.
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
        for (; i < len; i++) {
            c = text.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
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
        String s = commaAt >= 0 ? text.replace(',', '.') : text;
        return Double.parseDouble(s);
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

    /** Formats a value for messages without trailing noise (shortest round-trip form). */
    static String show(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
