package dev.proofrun.schedule;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * When the plant makes parts: the time zone, the working days, the named shifts, the breaks, the dates on
 * which no shift runs (holidays, shutdowns) and the production rate.
 *
 * <p>A shift runs on a date when the date is a working day and not a non-working date; a shift that runs
 * past midnight belongs to the date it starts on. Wall-clock times are in {@code zone}; see
 * {@link Scheduler} for how daylight-saving changes are treated.
 *
 * @param zone            the plant's time zone, e.g. Europe/Berlin
 * @param workingDays     the days of the week on which shifts run, at least one
 * @param shifts          the shifts, sorted by start, names unique, not overlapping one another
 * @param breaks          breaks repeated every working day
 * @param nonWorkingDates dates on which no shift starts
 * @param rate            the production rate while running
 */
public record ProductionCalendar(ZoneId zone, Set<DayOfWeek> workingDays, List<Shift> shifts,
        List<BreakWindow> breaks, SortedSet<LocalDate> nonWorkingDates, ProductionRate rate) {

    private static final int MINUTES_PER_DAY = 24 * 60;

    /**
     * @throws IllegalArgumentException if zone, rate, days or shifts are missing
     * @throws IllegalArgumentException if two shifts share a name or overlap (also across midnight)
     */
    public ProductionCalendar {
        if (zone == null || rate == null) {
            throw new IllegalArgumentException("zone and rate are required");
        }
        if (workingDays == null || workingDays.isEmpty()) {
            throw new IllegalArgumentException("at least one working day is required");
        }
        if (shifts == null || shifts.isEmpty()) {
            throw new IllegalArgumentException("at least one shift is required");
        }
        workingDays = Set.copyOf(EnumSet.copyOf(workingDays));
        List<Shift> sorted = new ArrayList<>(shifts);
        sorted.sort(Comparator.comparing(Shift::start));
        shifts = List.copyOf(sorted);
        breaks = breaks == null ? List.of() : List.copyOf(breaks);
        nonWorkingDates = nonWorkingDates == null ? new TreeSet<>() : new TreeSet<>(nonWorkingDates);
        nonWorkingDates = java.util.Collections.unmodifiableSortedSet(nonWorkingDates);
        requireDistinctAndApart(shifts);
    }

    private static void requireDistinctAndApart(List<Shift> shifts) {
        for (int i = 0; i < shifts.size(); i++) {
            for (int j = i + 1; j < shifts.size(); j++) {
                Shift a = shifts.get(i);
                Shift b = shifts.get(j);
                if (a.name().equals(b.name())) {
                    throw new IllegalArgumentException("two shifts are named " + a.name());
                }
                if (overlap(a, b)) {
                    throw new IllegalArgumentException(String.format(Locale.ROOT,
                            "shifts %s (%s) and %s (%s) overlap", a.name(), a.window(), b.name(), b.window()));
                }
            }
        }
    }

    /** Overlap on the minute line, with b also moved a day either way to catch night shifts. */
    private static boolean overlap(Shift a, Shift b) {
        int as = minuteOfDay(a);
        int ae = as + (int) a.nominalLength().toMinutes();
        int bs = minuteOfDay(b);
        int be = bs + (int) b.nominalLength().toMinutes();
        for (int day = -1; day <= 1; day++) {
            int off = day * MINUTES_PER_DAY;
            if (as < be + off && bs + off < ae) {
                return true;
            }
        }
        return false;
    }

    private static int minuteOfDay(Shift s) {
        return s.start().getHour() * 60 + s.start().getMinute();
    }

    /** True when shifts start on this date. */
    public boolean isWorkingDate(LocalDate date) {
        return workingDays.contains(date.getDayOfWeek()) && !nonWorkingDates.contains(date);
    }

    /** The working days in week order. */
    public List<DayOfWeek> workingDaysInOrder() {
        return List.copyOf(EnumSet.copyOf(workingDays));
    }
}
