package dev.proofrun.schedule;

import dev.proofrun.text.UserException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Turns "k subgroups of n" into k dated slots on a production calendar.
 *
 * <ol>
 * <li>The running time of the span is collected as pieces: shift occurrences on working dates, minus the
 * breaks, from the study start to the end of the span ({@link StudySpan}). Wall-clock times become instants
 * by the rules of {@link WallClock} (daylight-saving days included). Its total is W minutes.</li>
 * <li>With Δ = W/k and d = n·60/rate the minutes n consecutive parts take, the study is refused when
 * Δ &lt; max(d, 1 minute): slots would be closer than n parts apart.</li>
 * <li>Slot i is placed at running minute t_i by the {@link Spacing}, mapped back to an instant through the
 * pieces (so it can never fall in a break, between shifts or on a non-working date) and rounded down to the
 * minute. Neighbours are at least max(d, 1 minute) apart in running time, so their minutes differ and the
 * slots are in strict time order. Parts since start ≈ t_i·rate/60.</li>
 * <li>The window is ± min(⌊Δ/2⌋, {@value #WINDOW_CAP_MINUTES}) minutes, at least 1: half the spacing, capped
 * at half an hour so that a subgroup stays tied to the part of the shift it is meant to represent (our
 * choice; common practice asks only that a subgroup be taken close to its planned time).</li>
 * </ol>
 * Calendars are searched up to {@value #HORIZON_DAYS} days ahead of the start.
 */
public final class Scheduler {

    /** The largest window either side of a slot, minutes. */
    public static final int WINDOW_CAP_MINUTES = 30;
    /** How far ahead of the start the calendar is searched for the span, days. */
    public static final int HORIZON_DAYS = 400;

    private Scheduler() {
    }

    /**
     * @param calendar     the plant calendar
     * @param span         start and extent of the study
     * @param subgroups    k ≥ 2
     * @param subgroupSize n ≥ 1
     * @param spacing      even or stratified random
     * @param seed         the seed for {@link Spacing#RANDOM} (ignored for EVEN)
     * @return the schedule with exactly k slots
     * @throws IllegalArgumentException if k &lt; 2 or n &lt; 1 or an argument is missing
     * @throws UserException if the start is outside every shift, the span cannot be fitted, or the slots
     *                       would be closer than n parts apart
     */
    public static Schedule schedule(ProductionCalendar calendar, StudySpan span, int subgroups, int subgroupSize,
            Spacing spacing, long seed) {
        if (calendar == null || span == null || spacing == null) {
            throw new IllegalArgumentException("calendar, span and spacing are required");
        }
        if (subgroups < 2 || subgroupSize < 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "need k >= 2 and n >= 1: k=%d, n=%d", subgroups, subgroupSize));
        }
        List<WorkingTime.Piece> pieces = spanPieces(calendar, span);
        double working = pieces.stream().mapToDouble(WorkingTime.Piece::minutes).sum();
        if (!(working > 0)) {
            throw new UserException(ScheduleMessage.NO_WORKING_TIME, span.start());
        }
        double spacingMinutes = working / subgroups;
        double partMinutes = calendar.rate().minutesFor(subgroupSize);
        double needed = Math.max(partMinutes, 1.0);
        if (spacingMinutes < needed) {
            throw new UserException(ScheduleMessage.SLOTS_TOO_CLOSE, subgroups, subgroupSize,
                    number(calendar.rate().partsPerHour()), needed * subgroups, needed, working);
        }
        int window = (int) Math.max(1, Math.min(WINDOW_CAP_MINUTES, Math.floor(spacingMinutes / 2)));
        Random random = new Random(seed);
        List<Slot> slots = new ArrayList<>(subgroups);
        for (int i = 0; i < subgroups; i++) {
            double slack = spacingMinutes - partMinutes;
            // random: the subgroup ends inside its interval and starts at least a minute after the one before,
            // so no two slots share a minute once rounded down (a subgroup of fast parts takes seconds)
            double offset = spacing == Spacing.EVEN ? slack / 2
                    : random.nextDouble() * Math.max(0, spacingMinutes - needed);
            double t = i * spacingMinutes + offset;
            WorkingTime.Piece piece = pieceAt(pieces, t);
            double into = t - before(pieces, piece);
            Instant at = piece.start().plusSeconds((long) Math.floor(into * 60)).truncatedTo(ChronoUnit.MINUTES);
            if (at.isBefore(piece.start())) {
                at = piece.start();
            }
            long parts = Math.round(t * calendar.rate().partsPerHour() / 60.0);
            slots.add(new Slot(Slot.idFor(i + 1, subgroups), at.atZone(calendar.zone()).toOffsetDateTime(),
                    window, piece.shift(), parts));
        }
        Set<String> runs = new HashSet<>();
        Set<LocalDate> dates = new HashSet<>();
        for (WorkingTime.Piece p : pieces) {
            runs.add(p.date() + "/" + p.shift());
            dates.add(p.date());
        }
        Instant end = pieces.get(pieces.size() - 1).end();
        return new Schedule(slots, subgroupSize, working, spacingMinutes, end.atZone(calendar.zone()).toOffsetDateTime(),
                runs.size(), dates.size());
    }

    /** The running-time pieces from the start to the end of the span, in time order. */
    static List<WorkingTime.Piece> spanPieces(ProductionCalendar cal, StudySpan span) {
        LocalDate first = span.start().toLocalDate().minusDays(1);
        List<WorkingTime.Occurrence> occ = WorkingTime.occurrences(cal, first, first.plusDays(HORIZON_DAYS));
        Instant start = WallClock.instantOf(span.start(), cal.zone());
        int at = -1;
        for (int i = 0; i < occ.size(); i++) {
            if (occ.get(i).contains(start)) {
                at = i;
                break;
            }
        }
        if (at < 0) {
            String shifts = cal.shifts().stream().map(s -> s.name() + " " + s.window()).collect(Collectors.joining(", "));
            String days = cal.workingDaysInOrder().stream().map(d -> d.name().substring(0, 3)).collect(Collectors.joining(","));
            throw new UserException(ScheduleMessage.START_OUTSIDE_SHIFTS, span.start(), shifts, days);
        }
        List<WorkingTime.Occurrence> chosen = choose(cal, span, occ.subList(at, occ.size()));
        List<WorkingTime.Piece> pieces = new ArrayList<>();
        for (WorkingTime.Occurrence o : chosen) {
            for (WorkingTime.Piece p : o.pieces()) {
                if (!p.end().isAfter(start)) {
                    continue;
                }
                pieces.add(p.start().isBefore(start) ? new WorkingTime.Piece(start, p.end(), p.shift(), p.date()) : p);
            }
        }
        if (span.kind() == StudySpan.Kind.LOTS) {
            pieces = cutAfter(pieces, cal.rate().minutesFor(span.count() * span.lotParts()), cal, span);
        }
        return pieces;
    }

    private static List<WorkingTime.Occurrence> choose(ProductionCalendar cal, StudySpan span,
            List<WorkingTime.Occurrence> from) {
        switch (span.kind()) {
            case SHIFTS:
                if (from.size() < span.count()) {
                    throw beyond(span, String.format(Locale.ROOT, "%d shifts", span.count()));
                }
                return from.subList(0, span.count());
            case DAYS: {
                List<WorkingTime.Occurrence> out = new ArrayList<>();
                Set<LocalDate> dates = new HashSet<>();
                for (WorkingTime.Occurrence o : from) {
                    if (!dates.contains(o.date()) && dates.size() == span.count()) {
                        return out;
                    }
                    dates.add(o.date());
                    out.add(o);
                }
                throw beyond(span, String.format(Locale.ROOT, "%d working days", span.count()));
            }
            case UNTIL: {
                if (from.get(0).date().isAfter(span.until())) {
                    throw new UserException(ScheduleMessage.UNTIL_TOO_EARLY, span.until(), span.start(), from.get(0).date());
                }
                List<WorkingTime.Occurrence> out = new ArrayList<>();
                for (WorkingTime.Occurrence o : from) {
                    if (o.date().isAfter(span.until())) {
                        return out;
                    }
                    out.add(o);
                }
                throw beyond(span, "shifts until " + span.until());
            }
            case LOTS:
            default:
                return from;
        }
    }

    private static List<WorkingTime.Piece> cutAfter(List<WorkingTime.Piece> pieces, double minutes,
            ProductionCalendar cal, StudySpan span) {
        List<WorkingTime.Piece> out = new ArrayList<>();
        double left = minutes;
        for (WorkingTime.Piece p : pieces) {
            if (p.minutes() >= left) {
                out.add(new WorkingTime.Piece(p.start(), p.start().plusSeconds(Math.round(left * 60)), p.shift(), p.date()));
                return out;
            }
            out.add(p);
            left -= p.minutes();
        }
        throw beyond(span, String.format(Locale.ROOT, "%d lots of %d parts at %s parts per hour",
                span.count(), span.lotParts(), number(cal.rate().partsPerHour())));
    }

    private static UserException beyond(StudySpan span, String what) {
        return new UserException(ScheduleMessage.SPAN_BEYOND_CALENDAR, what, HORIZON_DAYS, span.start());
    }

    private static WorkingTime.Piece pieceAt(List<WorkingTime.Piece> pieces, double t) {
        double sum = 0;
        for (WorkingTime.Piece p : pieces) {
            if (t < sum + p.minutes()) {
                return p;
            }
            sum += p.minutes();
        }
        return pieces.get(pieces.size() - 1);
    }

    private static double before(List<WorkingTime.Piece> pieces, WorkingTime.Piece piece) {
        double sum = 0;
        for (WorkingTime.Piece p : pieces) {
            if (p == piece) {
                return sum;
            }
            sum += p.minutes();
        }
        return sum;
    }

    private static String number(double x) {
        return x == Math.rint(x) ? String.format(Locale.ROOT, "%d", (long) x) : String.format(Locale.ROOT, "%s", x);
    }
}
