package dev.proofrun.schedule;

import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The running time a calendar offers: shift occurrences on working dates, each cut into pieces around the
 * breaks. Package-private helper of {@link Scheduler}.
 */
final class WorkingTime {

    /** One run of a shift on one date, as instants, with the pieces left after breaks. */
    record Occurrence(Shift shift, LocalDate date, Instant start, Instant end, List<Piece> pieces) {
        boolean contains(Instant t) {
            return !t.isBefore(start) && t.isBefore(end);
        }
    }

    /** A stretch of uninterrupted running time. */
    record Piece(Instant start, Instant end, String shift, LocalDate date) {
        double minutes() {
            return (end.getEpochSecond() - start.getEpochSecond()) / 60.0;
        }
    }

    private WorkingTime() {
    }

    /** The shift occurrences whose date lies in [from, to], in time order. */
    static List<Occurrence> occurrences(ProductionCalendar cal, LocalDate from, LocalDate to) {
        List<Occurrence> out = new ArrayList<>();
        for (LocalDate d = from; !d.isAfter(to); d = d.plusDays(1)) {
            if (!cal.isWorkingDate(d)) {
                continue;
            }
            for (Shift s : cal.shifts()) {
                LocalDateTime ws = d.atTime(s.start());
                LocalDateTime we = (s.crossesMidnight() ? d.plusDays(1) : d).atTime(s.end());
                Instant a = WallClock.instantOf(ws, cal.zone());
                Instant b = WallClock.instantOf(we, cal.zone());
                if (!b.isAfter(a)) {
                    continue; // a window wholly inside a daylight-saving gap
                }
                out.add(withPieces(cal, s, d, a, b));
            }
        }
        out.sort(Comparator.comparing(Occurrence::start));
        return out;
    }

    private static Occurrence withPieces(ProductionCalendar cal, Shift s, LocalDate d, Instant a, Instant b) {
        List<Instant[]> free = new ArrayList<>();
        free.add(new Instant[] {a, b});
        for (BreakWindow br : cal.breaks()) {
            for (int off = -1; off <= 1; off++) {
                LocalDate bd = d.plusDays(off);
                Instant bs = WallClock.instantOf(bd.atTime(br.start()), cal.zone());
                Instant be = WallClock.instantOf((br.crossesMidnight() ? bd.plusDays(1) : bd).atTime(br.end()), cal.zone());
                if (be.isAfter(bs)) {
                    free = subtract(free, bs, be);
                }
            }
        }
        List<Piece> pieces = new ArrayList<>();
        for (Instant[] f : free) {
            pieces.add(new Piece(f[0], f[1], s.name(), d));
        }
        return new Occurrence(s, d, a, b, List.copyOf(pieces));
    }

    private static List<Instant[]> subtract(List<Instant[]> free, Instant cutStart, Instant cutEnd) {
        List<Instant[]> out = new ArrayList<>();
        for (Instant[] f : free) {
            if (!cutStart.isBefore(f[1]) || !cutEnd.isAfter(f[0])) {
                out.add(f);
                continue;
            }
            if (cutStart.isAfter(f[0])) {
                out.add(new Instant[] {f[0], cutStart});
            }
            if (cutEnd.isBefore(f[1])) {
                out.add(new Instant[] {cutEnd, f[1]});
            }
        }
        return out;
    }
}
