package dev.proofrun.app.session;

import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.ProductionRate;
import dev.proofrun.schedule.Shift;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;
import java.util.stream.Collectors;

/**
 * The short text forms in which the Timing step shows and takes the plant calendar, and their conversion
 * to the schedule types (which validate themselves). Each parser throws {@link IllegalArgumentException}
 * with a one-line message the step shows beside the field.
 */
public final class CalendarText {

    static final DateTimeFormatter START = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT);
    private static final List<String> DAYS = List.of("mon", "tue", "wed", "thu", "fri", "sat", "sun");

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

    /** "early 06:00-14:00, late 14:00-22:00". */
    public static List<Shift> shifts(String text) {
        List<Shift> out = new ArrayList<>();
        for (String part : items(text)) {
            String[] nameWindow = part.trim().split("\\s+");
            if (nameWindow.length != 2 || !nameWindow[1].contains("-")) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "'%s' is not a shift such as early 06:00-14:00", part.trim()));
            }
            String[] w = nameWindow[1].split("-", 2);
            out.add(wrap(() -> Shift.of(nameWindow[0], w[0], w[1]), part));
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("give at least one shift, such as early 06:00-14:00");
        }
        return out;
    }

    public static String shifts(List<Shift> shifts) {
        return shifts.stream().map(s -> s.name() + " " + s.start() + "-" + s.end()).collect(Collectors.joining(", "));
    }

    /** "09:30-09:45, 12:00-12:30"; blank for none. */
    public static List<BreakWindow> breaks(String text) {
        List<BreakWindow> out = new ArrayList<>();
        for (String part : items(text)) {
            String[] w = part.trim().split("-", 2);
            if (w.length != 2) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "'%s' is not a break such as 09:30-09:45", part.trim()));
            }
            out.add(wrap(() -> BreakWindow.of(w[0].trim(), w[1].trim()), part));
        }
        return out;
    }

    public static String breaks(List<BreakWindow> breaks) {
        return breaks.stream().map(b -> b.start() + "-" + b.end()).collect(Collectors.joining(", "));
    }

    /** "Mon-Fri", "Mon, Wed, Fri" or "Mon-Thu, Sat". */
    public static Set<DayOfWeek> workingDays(String text) {
        Set<DayOfWeek> out = EnumSet.noneOf(DayOfWeek.class);
        for (String part : items(text)) {
            String[] range = part.trim().toLowerCase(Locale.ROOT).split("-", 2);
            int a = day(range[0], part);
            int b = range.length == 2 ? day(range[1], part) : a;
            if (b < a) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "'%s': a range runs from Monday to Sunday", part.trim()));
            }
            for (int i = a; i <= b; i++) {
                out.add(DayOfWeek.of(i + 1));
            }
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("give the working days, such as Mon-Fri");
        }
        return out;
    }

    public static String workingDays(List<DayOfWeek> days) {
        return days.stream().map(d -> {
            String s = DAYS.get(d.getValue() - 1);
            return Character.toUpperCase(s.charAt(0)) + s.substring(1);
        }).collect(Collectors.joining(", "));
    }

    /** "2027-03-26, 2027-03-29"; blank for none. */
    public static SortedSet<LocalDate> dates(String text) {
        SortedSet<LocalDate> out = new TreeSet<>();
        for (String part : items(text)) {
            try {
                out.add(LocalDate.parse(part.trim()));
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "'%s' is not a date such as 2027-03-26", part.trim()));
            }
        }
        return out;
    }

    public static String dates(SortedSet<LocalDate> dates) {
        return dates.stream().map(LocalDate::toString).collect(Collectors.joining(", "));
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

    private static int day(String token, String part) {
        int i = DAYS.indexOf(token.trim().length() >= 3 ? token.trim().substring(0, 3) : token.trim());
        if (i < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "'%s' is not a day such as Mon or Mon-Fri", part.trim()));
        }
        return i;
    }

    private static List<String> items(String text) {
        List<String> out = new ArrayList<>();
        if (text == null) {
            return out;
        }
        for (String s : text.split("[,;]")) {
            if (!s.isBlank()) {
                out.add(s);
            }
        }
        return out;
    }

    private static <T> T wrap(java.util.function.Supplier<T> make, String part) {
        try {
            return make.get();
        } catch (RuntimeException e) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "'%s': %s", part.trim(), e.getMessage()));
        }
    }
}
