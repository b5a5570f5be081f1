package dev.proofrun.app.timing;

import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.Shift;
import java.time.LocalDate;
import java.time.LocalTime;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The minutes of one calendar date that are inside a shift and outside a break, as wall-clock intervals
 * of the day ({@code 0 ≤ from < to ≤ 1440}), sorted and apart. A shift that starts on a working date and runs
 * past midnight lends its tail to the next date. The timeline clips every collection window to these, so a
 * window is never drawn where nobody works.
 */
final class WorkingHours {

    static final int DAY = 24 * 60;

    /** A half-open interval of minutes of the day. */
    record Span(int from, int to) {
    }

    private WorkingHours() {
    }

    static List<Span> of(ProductionCalendar calendar, LocalDate date) {
        List<Span> on = new ArrayList<>();
        for (Shift s : calendar.shifts()) {
            int start = minute(s.start());
            int end = minute(s.end());
            boolean allDay = s.start().equals(s.end());
            if (calendar.isWorkingDate(date)) {
                on.add(new Span(start, s.crossesMidnight() || allDay ? DAY : end));
            }
            if ((s.crossesMidnight() || allDay) && calendar.isWorkingDate(date.minusDays(1)) && end > 0) {
                on.add(new Span(0, end));
            }
        }
        List<Span> off = new ArrayList<>();
        for (BreakWindow b : calendar.breaks()) {
            int start = minute(b.start());
            int end = minute(b.end());
            if (b.crossesMidnight()) {
                off.add(new Span(start, DAY));
                off.add(new Span(0, end));
            } else {
                off.add(new Span(start, end));
            }
        }
        return minus(merge(on), off);
    }

    /** The parts of {@code [from, to)} (minutes, may reach outside the day) that are working minutes. */
    static List<Span> clip(List<Span> working, double from, double to) {
        List<Span> out = new ArrayList<>();
        for (Span w : working) {
            double a = Math.max(from, w.from());
            double b = Math.min(to, w.to());
            if (a < b) {
                out.add(new Span((int) Math.floor(a), (int) Math.ceil(b)));
            }
        }
        return out;
    }

    private static List<Span> merge(List<Span> spans) {
        List<Span> sorted = new ArrayList<>(spans);
        sorted.sort(Comparator.comparingInt(Span::from));
        List<Span> out = new ArrayList<>();
        for (Span s : sorted) {
            if (!out.isEmpty() && s.from() <= out.get(out.size() - 1).to()) {
                Span last = out.remove(out.size() - 1);
                out.add(new Span(last.from(), Math.max(last.to(), s.to())));
            } else {
                out.add(s);
            }
        }
        return out;
    }

    private static List<Span> minus(List<Span> on, List<Span> off) {
        List<Span> out = on;
        for (Span cut : off) {
            List<Span> next = new ArrayList<>();
            for (Span s : out) {
                if (cut.to() <= s.from() || cut.from() >= s.to()) {
                    next.add(s);
                    continue;
                }
                if (s.from() < cut.from()) {
                    next.add(new Span(s.from(), cut.from()));
                }
                if (cut.to() < s.to()) {
                    next.add(new Span(cut.to(), s.to()));
                }
            }
            out = next;
        }
        return out;
    }

    private static int minute(LocalTime t) {
        return t.getHour() * 60 + t.getMinute();
    }
}
