package dev.proofrun.schedule;

import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;

/**
 * A test oracle written independently of the scheduler: is the plant running at this instant, judged by the
 * wall clock alone (the local date and time a person reads), minute by minute. It does not know the
 * scheduler's daylight-saving rules, so tests using it keep breaks and shift ends out of the hours in which
 * clocks change.
 */
final class WorkingClock {

    private final ProductionCalendar cal;

    WorkingClock(ProductionCalendar cal) {
        this.cal = cal;
    }

    /** The name of the shift running at t (breaks excluded), or null. */
    String shiftAt(Instant t) {
        LocalDateTime local = t.atZone(cal.zone()).toLocalDateTime();
        for (LocalDateTime[] b : windows(local.toLocalDate(), true)) {
            if (!local.isBefore(b[0]) && local.isBefore(b[1])) {
                return null;
            }
        }
        for (LocalDate d : new LocalDate[] {local.toLocalDate(), local.toLocalDate().minusDays(1)}) {
            if (!cal.isWorkingDate(d)) {
                continue;
            }
            for (Shift s : cal.shifts()) {
                LocalDateTime a = d.atTime(s.start());
                LocalDateTime b = (s.crossesMidnight() ? d.plusDays(1) : d).atTime(s.end());
                if (!local.isBefore(a) && local.isBefore(b)) {
                    return s.name();
                }
            }
        }
        return null;
    }

    String shiftAt(OffsetDateTime t) {
        return shiftAt(t.toInstant());
    }

    /** Running minutes in [a, b), counted minute by minute. */
    long runningMinutes(Instant a, Instant b) {
        long n = 0;
        for (Instant t = a; t.isBefore(b); t = t.plusSeconds(60)) {
            if (shiftAt(t) != null) {
                n++;
            }
        }
        return n;
    }

    private java.util.List<LocalDateTime[]> windows(LocalDate date, boolean breaks) {
        java.util.List<LocalDateTime[]> out = new java.util.ArrayList<>();
        for (LocalDate d : new LocalDate[] {date.minusDays(1), date}) {
            for (BreakWindow w : cal.breaks()) {
                out.add(new LocalDateTime[] {d.atTime(w.start()), (w.crossesMidnight() ? d.plusDays(1) : d).atTime(w.end())});
            }
        }
        return out;
    }
}
