package dev.proofrun.app.session;

import dev.proofrun.schedule.CalendarSyntax;
import dev.proofrun.schedule.ProductionRate;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The short text forms in which the Timing step shows and takes the plant calendar, and their conversion
 * to the schedule types (which validate themselves): the start and the rate, which are the wizard's own. Shifts,
 * breaks, working days and dates are read and shown by {@link CalendarSyntax}, the grammar the command line reads. Each parser throws {@link IllegalArgumentException}
 * with a one-line message the step shows beside the field.
 */
public final class CalendarText {

    static final DateTimeFormatter START = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT);

    private CalendarText() {
    }

    public static LocalDateTime start(String text) {
        try {
            return LocalDateTime.parse(text.trim(), START);
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "'%s' is not a start such as 2027-03-24 06:00", text.trim()));
        }
    }

    public static String start(LocalDateTime t) {
        return t.format(START);
    }

    /** "40 s" seconds per part, or "90/h" parts per hour; the number by the fields' one rule ({@link FieldNumbers}). */
    public static ProductionRate rate(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT).replace(" ", "");
        boolean perHour = t.endsWith("/h");
        if (perHour || t.endsWith("s")) {
            OptionalDouble v = FieldNumbers.parse(t.substring(0, t.length() - (perHour ? 2 : 1)));
            if (v.isPresent()) {
                try {
                    return perHour ? ProductionRate.perHour(v.getAsDouble()) : ProductionRate.cycleSeconds(v.getAsDouble());
                } catch (RuntimeException e) {
                    throw new IllegalArgumentException(e.getMessage());
                }
            }
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT,
                "'%s' is not a rate such as 40 s (per part) or 90/h (parts per hour)", text.trim()));
    }

    public static String rate(ProductionRate r) {
        return r.unit() == ProductionRate.Unit.PARTS_PER_HOUR ? fmt(r.value()) + "/h" : fmt(r.value()) + " s";
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
