package dev.proofrun.schedule;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;
import java.util.function.Supplier;
import java.util.stream.Collectors;

/**
 * The one grammar of the plant calendar in text, read by the command line ({@code plan new --shifts …}) and the
 * wizard's Timing step alike, and the form in which the wizard shows it.
 *
 * <ul>
 * <li>Items are separated by {@code ,} or {@code ;}; blanks around them and empty items are ignored.</li>
 * <li>Shifts: {@code early 06:00-14:00} or {@code early=06:00-14:00}; a window alone ({@code 06:00-14:00}) is
 *     named by its place, A, B, C…; a shift may cross midnight ({@code night 22:00-06:00}). At least one.</li>
 * <li>Breaks: {@code 09:30-09:45}; none when blank.</li>
 * <li>Working days: a day ({@code Mon}, {@code MON}, {@code Monday}: the first three letters or more of its
 *     English name) or a range {@code Mon-Fri}; a range may run over the weekend ({@code Fri-Mon}). At least one.</li>
 * <li>Dates: ISO {@code 2027-03-26}; none when blank.</li>
 * </ul>
 * A refusal is an {@link IllegalArgumentException} whose one-line message ({@link ScheduleMessage}) names the
 * item; the command line puts the option before it, the wizard shows it beside the field.
 */
public final class CalendarSyntax {

    private CalendarSyntax() {
    }

    /** The shifts of {@code text}; see the class comment. */
    public static List<Shift> shifts(String text) {
        List<Shift> out = new ArrayList<>();
        List<String> items = items(text);
        for (int i = 0; i < items.size(); i++) {
            String part = items.get(i);
            String[] nameWindow = part.split("\\s*=\\s*|\\s+");
            String name = nameWindow.length == 2 ? nameWindow[0] : String.valueOf((char) ('A' + i));
            String[] w = nameWindow[nameWindow.length - 1].split("-", 2);
            if (nameWindow.length > 2 || w.length != 2 || part.startsWith("=")) {
                throw new IllegalArgumentException(ScheduleMessage.NOT_A_SHIFT.format(part));
            }
            out.add(wrap(() -> Shift.of(name, w[0], w[1]), part));
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException(ScheduleMessage.NO_SHIFT.format());
        }
        return out;
    }

    /** {@code early 06:00-14:00, late 14:00-22:00}: the form the wizard shows. */
    public static String shifts(List<Shift> shifts) {
        return shifts.stream().map(s -> s.name() + " " + s.start() + "-" + s.end()).collect(Collectors.joining(", "));
    }

    /** The breaks of {@code text}, none when blank. */
    public static List<BreakWindow> breaks(String text) {
        List<BreakWindow> out = new ArrayList<>();
        for (String part : items(text)) {
            String[] w = part.split("-", 2);
            if (w.length != 2) {
                throw new IllegalArgumentException(ScheduleMessage.NOT_A_BREAK.format(part));
            }
            out.add(wrap(() -> BreakWindow.of(w[0].trim(), w[1].trim()), part));
        }
        return out;
    }

    /** {@code 09:30-09:45, 12:00-12:30}. */
    public static String breaks(List<BreakWindow> breaks) {
        return breaks.stream().map(b -> b.start() + "-" + b.end()).collect(Collectors.joining(", "));
    }

    /** The working days of {@code text}; see the class comment. */
    public static Set<DayOfWeek> workingDays(String text) {
        Set<DayOfWeek> out = EnumSet.noneOf(DayOfWeek.class);
        for (String part : items(text)) {
            String[] range = part.split("-", 2);
            DayOfWeek a = day(range[0], part);
            DayOfWeek b = range.length == 2 ? day(range[1], part) : a;
            for (DayOfWeek d = a; ; d = d.plus(1)) {
                out.add(d);
                if (d == b) {
                    break;
                }
            }
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException(ScheduleMessage.NO_WORKING_DAYS.format());
        }
        return out;
    }

    /** {@code Mon, Tue, Wed}. */
    public static String workingDays(Collection<DayOfWeek> days) {
        return days.stream().map(d -> d.name().charAt(0) + d.name().substring(1, 3).toLowerCase(Locale.ROOT))
                .collect(Collectors.joining(", "));
    }

    /** The dates of {@code text}, none when blank. */
    public static SortedSet<LocalDate> dates(String text) {
        SortedSet<LocalDate> out = new TreeSet<>();
        for (String part : items(text)) {
            try {
                out.add(LocalDate.parse(part));
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException(ScheduleMessage.NOT_A_DATE.format(part));
            }
        }
        return out;
    }

    /** {@code 2027-03-26, 2027-03-29}. */
    public static String dates(Collection<LocalDate> dates) {
        return dates.stream().map(LocalDate::toString).collect(Collectors.joining(", "));
    }

    private static DayOfWeek day(String token, String part) {
        String t = token.trim().toUpperCase(Locale.ROOT);
        for (DayOfWeek d : DayOfWeek.values()) {
            if (t.length() >= 3 && d.name().startsWith(t)) {
                return d;
            }
        }
        throw new IllegalArgumentException(ScheduleMessage.NOT_A_DAY.format(part));
    }

    /** The non-blank items of {@code text} between {@code ,} and {@code ;}, trimmed; none for null. */
    private static List<String> items(String text) {
        List<String> out = new ArrayList<>();
        if (text == null) {
            return out;
        }
        for (String s : text.split("[,;]")) {
            if (!s.isBlank()) {
                out.add(s.trim());
            }
        }
        return out;
    }

    private static <T> T wrap(Supplier<T> make, String part) {
        try {
            return make.get();
        } catch (RuntimeException e) {
            throw new IllegalArgumentException(ScheduleMessage.ITEM_REFUSED.format(part, e.getMessage()));
        }
    }
}
