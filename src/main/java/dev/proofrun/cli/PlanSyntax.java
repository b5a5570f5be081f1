package dev.proofrun.cli;

import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.Shift;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalTime;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;

/** The small languages of {@code plan new}'s calendar options: days, shifts, breaks, dates. */
final class PlanSyntax {

    private PlanSyntax() {
    }

    /** "MON-FRI", "MON,WED,FRI", "MON-THU,SAT". */
    static Set<DayOfWeek> days(String text) {
        Set<DayOfWeek> out = EnumSet.noneOf(DayOfWeek.class);
        for (String part : text.split(",")) {
            String p = part.trim();
            int dash = p.indexOf('-');
            if (dash > 0) {
                DayOfWeek a = day(p.substring(0, dash));
                DayOfWeek b = day(p.substring(dash + 1));
                for (DayOfWeek d = a; ; d = d.plus(1)) {
                    out.add(d);
                    if (d == b) {
                        break;
                    }
                }
            } else {
                out.add(day(p));
            }
        }
        return out;
    }

    private static DayOfWeek day(String token) {
        String t = token.trim().toUpperCase(Locale.ROOT);
        for (DayOfWeek d : DayOfWeek.values()) {
            if (t.length() >= 3 && d.name().startsWith(t)) {
                return d;
            }
        }
        throw new IllegalArgumentException("not a day of the week (MON..SUN): '" + token.trim() + "'");
    }

    /** "06:00-14:00,14:00-22:00" or "early=06:00-14:00,night=22:00-06:00"; unnamed shifts are A, B, C... */
    static List<Shift> shifts(String text) {
        List<Shift> out = new ArrayList<>();
        String[] parts = text.split(",");
        for (int i = 0; i < parts.length; i++) {
            String p = parts[i].trim();
            int eq = p.indexOf('=');
            String name = eq > 0 ? p.substring(0, eq).trim() : String.valueOf((char) ('A' + i));
            LocalTime[] w = window(eq > 0 ? p.substring(eq + 1) : p);
            out.add(new Shift(name, w[0], w[1]));
        }
        return out;
    }

    /** "09:30-09:45,12:00-12:30"; null or blank means none. */
    static List<BreakWindow> breaks(String text) {
        List<BreakWindow> out = new ArrayList<>();
        if (text == null || text.isBlank()) {
            return out;
        }
        for (String p : text.split(",")) {
            LocalTime[] w = window(p);
            out.add(new BreakWindow(w[0], w[1]));
        }
        return out;
    }

    /** "2027-04-02,2027-04-05"; null or blank means none. */
    static SortedSet<LocalDate> dates(String text) {
        SortedSet<LocalDate> out = new TreeSet<>();
        if (text == null || text.isBlank()) {
            return out;
        }
        for (String p : text.split(",")) {
            out.add(LocalDate.parse(p.trim()));
        }
        return out;
    }

    private static LocalTime[] window(String text) {
        String[] ends = text.trim().split("-");
        if (ends.length != 2) {
            throw new IllegalArgumentException("a window is HH:MM-HH:MM: '" + text.trim() + "'");
        }
        return new LocalTime[] {LocalTime.parse(ends[0].trim()), LocalTime.parse(ends[1].trim())};
    }

    static String number(double x) {
        return x == Math.rint(x) ? String.format(Locale.ROOT, "%d", (long) x) : String.format(Locale.ROOT, "%s", x);
    }
}
