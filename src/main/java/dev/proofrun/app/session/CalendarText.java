package dev.proofrun.app.session;

import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.CalendarSyntax;
import dev.proofrun.schedule.ProductionRate;
import dev.proofrun.schedule.Shift;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SortedSet;

/**
 * The short text forms in which the Timing step shows and takes the plant calendar, and their conversion
 * to the schedule types (which validate themselves). Shifts, breaks, working days and dates are the one calendar
 * grammar of {@link CalendarSyntax}, shared with the command line; the start and the rate are the wizard's own. Each parser throws {@link IllegalArgumentException}
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

    /** The shifts, in the one calendar grammar ({@link CalendarSyntax#shifts(String)}). */
    public static List<Shift> shifts(String text) {
        return CalendarSyntax.shifts(text);
    }

    public static String shifts(List<Shift> shifts) {
        return CalendarSyntax.shifts(shifts);
    }

    /** The breaks ({@link CalendarSyntax#breaks(String)}). */
    public static List<BreakWindow> breaks(String text) {
        return CalendarSyntax.breaks(text);
    }

    public static String breaks(List<BreakWindow> breaks) {
        return CalendarSyntax.breaks(breaks);
    }

    /** The working days ({@link CalendarSyntax#workingDays(String)}). */
    public static Set<DayOfWeek> workingDays(String text) {
        return CalendarSyntax.workingDays(text);
    }

    public static String workingDays(List<DayOfWeek> days) {
        return CalendarSyntax.workingDays(days);
    }

    /** The dates ({@link CalendarSyntax#dates(String)}). */
    public static SortedSet<LocalDate> dates(String text) {
        return CalendarSyntax.dates(text);
    }

    public static String dates(SortedSet<LocalDate> dates) {
        return CalendarSyntax.dates(dates);
    }

    /** "40 s" seconds per part, or "90/h" parts per hour. */
    public static ProductionRate rate(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT).replace(" ", "");
        try {
            if (t.endsWith("/h")) {
                return ProductionRate.perHour(Double.parseDouble(t.substring(0, t.length() - 2)));
            }
            if (t.endsWith("s")) {
                return ProductionRate.cycleSeconds(Double.parseDouble(t.substring(0, t.length() - 1)));
            }
        } catch (NumberFormatException e) {
            // falls through to the message below
        } catch (RuntimeException e) {
            throw new IllegalArgumentException(e.getMessage());
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
