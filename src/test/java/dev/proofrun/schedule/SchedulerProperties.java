package dev.proofrun.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.util.EnumSet;
import java.util.List;
import java.util.TreeSet;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;

/**
 * Properties over random calendars, starts (any day of 2027, so daylight-saving weeks occur), k, n and
 * seeds. Breaks are kept out of 01:00-03:00, where the oracle {@link WorkingClock} reads repeated wall time
 * differently from the scheduler's documented rule.
 */
class SchedulerProperties {

    private static final List<List<Shift>> SHIFT_SETS = List.of(
            List.of(Shift.of("early", "06:00", "14:00"), Shift.of("late", "14:00", "22:00"), Shift.of("night", "22:00", "06:00")),
            List.of(Shift.of("day", "07:00", "15:30")),
            List.of(Shift.of("A", "05:30", "13:30"), Shift.of("B", "13:30", "21:30")),
            List.of(Shift.of("night", "21:00", "05:00")));
    private static final List<BreakWindow> BREAKS = List.of(BreakWindow.of("09:00", "09:20"), BreakWindow.of("12:00", "12:30"),
            BreakWindow.of("18:30", "18:45"), BreakWindow.of("23:50", "00:10"), BreakWindow.of("04:00", "04:15"));
    private static final List<String> ZONES = List.of("Europe/Berlin", "America/Chicago", "Asia/Kolkata", "Australia/Sydney");

    @Provide
    Arbitrary<ProductionCalendar> calendars() {
        return Arbitraries.integers().between(0, SHIFT_SETS.size() - 1).flatMap(set ->
                Arbitraries.integers().between(0, ZONES.size() - 1).flatMap(zone ->
                        Arbitraries.subsetOf(BREAKS).flatMap(breaks ->
                                Arbitraries.of(true, false).map(weekend -> new ProductionCalendar(ZoneId.of(ZONES.get(zone)),
                                        weekend ? EnumSet.allOf(DayOfWeek.class) : EnumSet.range(DayOfWeek.MONDAY, DayOfWeek.FRIDAY),
                                        SHIFT_SETS.get(set), List.copyOf(breaks),
                                        new TreeSet<>(List.of(LocalDate.of(2027, 3, 31), LocalDate.of(2027, 11, 3))),
                                        ProductionRate.perHour(120))))));
    }

    @Property(tries = 150, seed = "20270301")
    void slotsAreInsideWorkingTimeAndEvenlySpread(@ForAll("calendars") ProductionCalendar cal,
            @ForAll @IntRange(min = 0, max = 364) int day, @ForAll @IntRange(min = 2, max = 60) int k,
            @ForAll @IntRange(min = 1, max = 10) int n, @ForAll @IntRange(min = 1, max = 4) int shifts,
            @ForAll boolean random, @ForAll @LongRange(min = 0, max = 1_000_000) long seed) {
        LocalDate date = LocalDate.of(2027, 1, 1).plusDays(day);
        while (!cal.isWorkingDate(date)) {
            date = date.plusDays(1);
        }
        LocalDateTime start = date.atTime(cal.shifts().get(0).start());
        Spacing spacing = random ? Spacing.RANDOM : Spacing.EVEN;
        Schedule s;
        try {
            s = Scheduler.schedule(cal, StudySpan.shifts(start, shifts), k, n, spacing, seed);
        } catch (dev.proofrun.text.UserException e) {
            assertEquals(ScheduleMessage.SLOTS_TOO_CLOSE, e.key());
            return;
        }
        assertEquals(k, s.slots().size());
        WorkingClock clock = new WorkingClock(cal);
        double partMinutes = cal.rate().minutesFor(n);
        for (int i = 0; i < k; i++) {
            Slot slot = s.slots().get(i);
            assertNotNull(clock.shiftAt(slot.start()), slot::toString);
            assertEquals(Slot.idFor(i + 1, k), slot.id());
            if (i > 0) {
                assertTrue(slot.start().isAfter(s.slots().get(i - 1).start()), "strict time order: " + slot);
                long gap = clock.runningMinutes(s.slots().get(i - 1).start().toInstant(), slot.start().toInstant());
                if (spacing == Spacing.EVEN) {
                    assertEquals(s.spacingMinutes(), gap, 1.0, slot::toString);
                } else {
                    assertTrue(gap >= partMinutes - 1.0, slot::toString);
                }
            }
        }
        assertTrue(s.shifts() == shifts, "the span covers the shifts asked for");
        assertTrue(!s.slots().get(k - 1).start().toInstant().isAfter(s.end().toInstant()));
        assertEquals(s, Scheduler.schedule(cal, StudySpan.shifts(start, shifts), k, n, spacing, seed), "reproducible");
    }
}
