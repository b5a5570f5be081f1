package dev.proofrun.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.text.UserException;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneId;
import java.util.EnumSet;
import java.util.List;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class SchedulerTest {

    /** Slots are rounded down to the minute, so running-time gaps may differ from Δ by up to one minute. */
    private static final double MINUTE_ROUNDING = 1.0;

    static ProductionCalendar threeShifts(String zone) {
        return new ProductionCalendar(ZoneId.of(zone), EnumSet.range(DayOfWeek.MONDAY, DayOfWeek.FRIDAY),
                List.of(Shift.of("early", "06:00", "14:00"), Shift.of("late", "14:00", "22:00"),
                        Shift.of("night", "22:00", "06:00")),
                List.of(BreakWindow.of("09:30", "09:45"), BreakWindow.of("18:00", "18:30"), BreakWindow.of("04:00", "04:20")),
                new TreeSet<>(List.of(LocalDate.of(2027, 3, 3))), ProductionRate.perHour(60));
    }

    /** {@code k} evenly spaced slots of one part each over the one shift that starts at {@code start}. */
    private static Schedule oneShift(ProductionCalendar cal, LocalDateTime start, int k) {
        return Scheduler.schedule(cal, StudySpan.shifts(start, 1), k, 1, Spacing.EVEN, 0);
    }

    /** The slots' start times as written (offset included). */
    private static List<String> starts(Schedule s) {
        return s.slots().stream().map(x -> x.start().toString()).collect(Collectors.toList());
    }

    static ProductionCalendar nightsOnly(String zone, List<BreakWindow> breaks) {
        return new ProductionCalendar(ZoneId.of(zone), EnumSet.allOf(DayOfWeek.class),
                List.of(Shift.of("night", "22:00", "06:00")), breaks, new TreeSet<>(), ProductionRate.perHour(60));
    }

    @Test
    void exactlyKSlotsInsideWorkingTimeEvenlySpaced() {
        ProductionCalendar cal = threeShifts("Europe/Berlin");
        // Monday 2027-03-01 06:00, 4 working days: Mon, Tue, (Wed 3rd is a non-working date), Thu, Fri
        Schedule s = Scheduler.schedule(cal, StudySpan.days(LocalDateTime.of(2027, 3, 1, 6, 0), 4), 40, 5, Spacing.EVEN, 0);
        assertEquals(40, s.slots().size());
        WorkingClock clock = new WorkingClock(cal);
        for (Slot slot : s.slots()) {
            assertEquals(slot.shift(), clock.shiftAt(slot.start()), slot.toString());
            LocalDate shiftDate = slot.shift().equals("night") && slot.start().getHour() < 6
                    ? slot.start().toLocalDate().minusDays(1) : slot.start().toLocalDate();
            assertNotEquals(LocalDate.of(2027, 3, 3), shiftDate, "slot on the non-working date: " + slot);
        }
        // 4 days x (24 h - 65 min of breaks) = 4 x 1375 = 5500 running minutes; by hand from the calendar above
        assertEquals(5500.0, s.workingMinutes(), 1e-9);
        assertEquals(5500.0 / 40, s.spacingMinutes(), 1e-9);
        for (int i = 1; i < s.slots().size(); i++) {
            long gap = clock.runningMinutes(s.slots().get(i - 1).start().toInstant(), s.slots().get(i).start().toInstant());
            assertEquals(s.spacingMinutes(), gap, MINUTE_ROUNDING, "gap before " + s.slots().get(i).id());
        }
        assertEquals(12, s.shifts());
        assertEquals(4, s.days());
        assertEquals("S01", s.slots().get(0).id());
        assertEquals("S40", s.slots().get(39).id());
    }

    @Test
    void randomSlotsOfFastPartsNeverShareAMinute() {
        // 3,600 parts an hour: a subgroup of 5 takes 5 s, so with slots about a minute apart two random
        // neighbours could fall into the same minute once rounded down, and the plan file would then refuse
        // its own schedule ("slots must be in time order"). 7 h 30 min of running time, 400 subgroups.
        ProductionCalendar cal = new ProductionCalendar(ZoneId.of("Europe/Berlin"), EnumSet.allOf(DayOfWeek.class),
                List.of(Shift.of("day", "06:00", "14:00")), List.of(BreakWindow.of("10:00", "10:30")), new TreeSet<>(),
                ProductionRate.perHour(3600));
        StudySpan span = StudySpan.shifts(LocalDateTime.of(2027, 3, 1, 6, 0), 1);
        for (long seed = 0; seed < 20; seed++) {
            Schedule s = Scheduler.schedule(cal, span, 400, 5, Spacing.RANDOM, seed);
            for (int i = 1; i < s.slots().size(); i++) {
                assertTrue(s.slots().get(i).start().isAfter(s.slots().get(i - 1).start()),
                        "seed " + seed + ": " + s.slots().get(i - 1) + " then " + s.slots().get(i));
            }
        }
    }

    @Test
    void randomSpacingIsReproducibleFromTheSeedAndStratified() {
        ProductionCalendar cal = threeShifts("America/Chicago");
        StudySpan span = StudySpan.shifts(LocalDateTime.of(2027, 3, 1, 6, 0), 6);
        Schedule a = Scheduler.schedule(cal, span, 30, 5, Spacing.RANDOM, 42);
        Schedule b = Scheduler.schedule(cal, span, 30, 5, Spacing.RANDOM, 42);
        Schedule c = Scheduler.schedule(cal, span, 30, 5, Spacing.RANDOM, 43);
        assertEquals(a, b);
        assertNotEquals(a.slots(), c.slots());
        WorkingClock clock = new WorkingClock(cal);
        Slot first = a.slots().get(0);
        OffsetDateTime start = span.start().atZone(cal.zone()).toOffsetDateTime();
        for (int i = 0; i < a.slots().size(); i++) {
            Slot slot = a.slots().get(i);
            assertNotNull(clock.shiftAt(slot.start()), slot.toString());
            // stratified: slot i lies in the i-th interval of running time [iΔ, (i+1)Δ)
            long t = clock.runningMinutes(start.toInstant(), slot.start().toInstant());
            assertTrue(t >= Math.floor(i * a.spacingMinutes()) - MINUTE_ROUNDING
                    && t < (i + 1) * a.spacingMinutes(), slot + " at running minute " + t);
        }
        assertEquals("S01", first.id());
    }

    @Test
    void nightShiftPastMidnightBelongsToTheDayItStarts() {
        // Friday night shift runs into Saturday; Saturday and Sunday have no shifts; the next is Monday's early
        ProductionCalendar cal = threeShifts("Europe/Berlin");
        Schedule s = Scheduler.schedule(cal, StudySpan.shifts(LocalDateTime.of(2027, 3, 5, 22, 0), 2), 4, 1, Spacing.EVEN, 0);
        List<String> shifts = s.slots().stream().map(Slot::shift).collect(Collectors.toList());
        assertEquals(List.of("night", "night", "early", "early"), shifts);
        assertEquals(LocalDate.of(2027, 3, 6), s.slots().get(1).start().toLocalDate());
        assertEquals(LocalDate.of(2027, 3, 8), s.slots().get(2).start().toLocalDate());
        // night 480 - 20 (break 04:00-04:20) + early 480 - 15 = 925 running minutes
        assertEquals(925.0, s.workingMinutes(), 1e-9);
    }

    // Daylight-saving dates: EU Directive 2000/84/EC (last Sunday of March and October, 01:00 UTC):
    // 2027-03-28 and 2027-10-31. US Energy Policy Act of 2005 (second Sunday of March, first Sunday of
    // November, 02:00 local): 2027-03-14 and 2027-11-07.

    /**
     * A Berlin night shift 22:00–06:00 across each clock change, one part an hour at 60/h (t_i = 60 i + 29.5 minutes
     * of running time): spring forward runs seven hours, fall back nine, through the repeated hour.
     */
    static Stream<Arguments> berlinClockChanges() {
        return Stream.of(
                Arguments.of(LocalDateTime.of(2027, 3, 27, 22, 0), 7, 420.0, List.of("2027-03-27T22:29+01:00",
                        "2027-03-27T23:29+01:00", "2027-03-28T00:29+01:00", "2027-03-28T01:29+01:00", "2027-03-28T03:29+02:00",
                        "2027-03-28T04:29+02:00", "2027-03-28T05:29+02:00"), "2027-03-28T06:00+02:00"),
                Arguments.of(LocalDateTime.of(2027, 10, 30, 22, 0), 9, 540.0, List.of("2027-10-30T22:29+02:00",
                        "2027-10-30T23:29+02:00", "2027-10-31T00:29+02:00", "2027-10-31T01:29+02:00", "2027-10-31T02:29+02:00",
                        "2027-10-31T02:29+01:00", "2027-10-31T03:29+01:00", "2027-10-31T04:29+01:00", "2027-10-31T05:29+01:00"),
                        "2027-10-31T06:00+01:00"));
    }

    @ParameterizedTest(name = "night from {0}: {2} running minutes")
    @MethodSource("berlinClockChanges")
    void aNightShiftInBerlinRunsItsRealHoursAcrossTheClockChange(LocalDateTime start, int k, double minutes,
            List<String> starts, String end) {
        Schedule s = oneShift(nightsOnly("Europe/Berlin", List.of()), start, k);
        assertEquals(minutes, s.workingMinutes(), 1e-9);
        assertEquals(starts, starts(s));
        assertEquals(OffsetDateTime.parse(end), s.end());
    }

    @Test
    void chicagoSpringAndAutumnNights() {
        ProductionCalendar cal = nightsOnly("America/Chicago", List.of(BreakWindow.of("04:00", "04:30")));
        Schedule spring = oneShift(cal, LocalDateTime.of(2027, 3, 13, 22, 0), 6);
        assertEquals(390.0, spring.workingMinutes(), 1e-9); // 7 h - 30 min break
        Schedule autumn = oneShift(cal, LocalDateTime.of(2027, 11, 6, 22, 0), 6);
        assertEquals(510.0, autumn.workingMinutes(), 1e-9); // 9 h - 30 min break
        WorkingClock clock = new WorkingClock(cal);
        for (Schedule s : List.of(spring, autumn)) {
            for (Slot slot : s.slots()) {
                assertNotNull(clock.shiftAt(slot.start()), slot.toString());
            }
            for (int i = 1; i < s.slots().size(); i++) {
                long gap = (s.slots().get(i).start().toEpochSecond() - s.slots().get(i - 1).start().toEpochSecond()) / 60;
                boolean acrossBreak = s.slots().get(i - 1).start().getHour() < 4 && s.slots().get(i).start().getHour() >= 4;
                assertEquals(s.spacingMinutes() + (acrossBreak ? 30 : 0), gap, MINUTE_ROUNDING, s.slots().get(i).toString());
            }
        }
        assertEquals("-06:00", spring.slots().get(0).start().getOffset().toString());
        assertEquals("-05:00", spring.slots().get(5).start().getOffset().toString());
        assertEquals("-05:00", autumn.slots().get(0).start().getOffset().toString());
        assertEquals("-06:00", autumn.slots().get(5).start().getOffset().toString());
    }

    @Test
    void breaksInsideTheClockChangeFollowTheDocumentedRule() {
        // spring: a break 02:15-02:45 does not exist on 28 March in Berlin, so it takes no time that night
        Schedule spring = oneShift(nightsOnly("Europe/Berlin", List.of(BreakWindow.of("02:15", "02:45"))),
                LocalDateTime.of(2027, 3, 27, 22, 0), 7);
        assertEquals(420.0, spring.workingMinutes(), 1e-9);
        // autumn: 02:15-02:45 happens twice; the break is its first occurrence only
        Schedule autumn = oneShift(nightsOnly("Europe/Berlin", List.of(BreakWindow.of("02:15", "02:45"))),
                LocalDateTime.of(2027, 10, 30, 22, 0), 9);
        assertEquals(510.0, autumn.workingMinutes(), 1e-9);
    }

    @Test
    void aShiftStartingInsideTheGapStartsWhenTheClocksJump() {
        ProductionCalendar cal = new ProductionCalendar(ZoneId.of("Europe/Berlin"), EnumSet.allOf(DayOfWeek.class),
                List.of(Shift.of("dawn", "02:30", "10:30")), List.of(), new TreeSet<>(), ProductionRate.perHour(60));
        Schedule s = Scheduler.schedule(cal, StudySpan.shifts(LocalDateTime.of(2027, 3, 27, 2, 30), 2), 4, 1, Spacing.EVEN, 0);
        assertEquals(480.0 + 450.0, s.workingMinutes(), 1e-9); // 27th: 8 h; 28th: 03:00+02:00 to 10:30
    }

    @Test
    void spanOfLotsAndUntilADate() {
        ProductionCalendar cal = threeShifts("Europe/Berlin");
        LocalDateTime start = LocalDateTime.of(2027, 3, 1, 6, 0);
        // 4 lots of 300 parts at 60 parts/h = 1200 running minutes
        Schedule lots = Scheduler.schedule(cal, StudySpan.lots(start, 4, 300), 20, 5, Spacing.EVEN, 0);
        assertEquals(1200.0, lots.workingMinutes(), 1e-9);
        // last slot: t = 19 x 60 + (60 - 5)/2 = 1167.5 running minutes, x 1 part/minute, rounded half up
        assertEquals(1168, lots.slots().get(19).partsSinceStart());
        // until Tuesday: Monday's and Tuesday's shifts (6 shifts, 2 x 1375 minutes)
        Schedule until = Scheduler.schedule(cal, StudySpan.until(start, LocalDate.of(2027, 3, 2)), 20, 5, Spacing.EVEN, 0);
        assertEquals(2750.0, until.workingMinutes(), 1e-9);
        assertEquals(6, until.shifts());
        assertEquals(OffsetDateTime.parse("2027-03-03T06:00+01:00"), until.end());
    }

    @Test
    void refusals() {
        ProductionCalendar cal = threeShifts("Europe/Berlin");
        UserException outside = assertThrows(UserException.class, () -> Scheduler.schedule(cal,
                StudySpan.shifts(LocalDateTime.of(2027, 3, 6, 10, 0), 3), 10, 5, Spacing.EVEN, 0)); // a Saturday
        assertEquals(ScheduleMessage.START_OUTSIDE_SHIFTS, outside.key());
        UserException holiday = assertThrows(UserException.class, () -> Scheduler.schedule(cal,
                StudySpan.shifts(LocalDateTime.of(2027, 3, 3, 10, 0), 3), 10, 5, Spacing.EVEN, 0));
        assertEquals(ScheduleMessage.START_OUTSIDE_SHIFTS, holiday.key());
        // one shift of 465 running minutes; 100 subgroups of 5 at 60/h need 500 minutes
        UserException close = assertThrows(UserException.class, () -> Scheduler.schedule(cal,
                StudySpan.shifts(LocalDateTime.of(2027, 3, 1, 6, 0), 1), 100, 5, Spacing.EVEN, 0));
        assertEquals(ScheduleMessage.SLOTS_TOO_CLOSE, close.key());
        assertTrue(close.getMessage().contains("100 subgroups of 5 parts"), close.getMessage());
        // 93 subgroups of 5 fit exactly: 465/93 = 5 minutes apart
        assertEquals(93, Scheduler.schedule(cal, StudySpan.shifts(LocalDateTime.of(2027, 3, 1, 6, 0), 1), 93, 5,
                Spacing.RANDOM, 1).slots().size());
        UserException until = assertThrows(UserException.class, () -> Scheduler.schedule(cal,
                StudySpan.until(LocalDateTime.of(2027, 3, 2, 6, 0), LocalDate.of(2027, 3, 1)), 10, 5, Spacing.EVEN, 0));
        assertEquals(ScheduleMessage.UNTIL_TOO_EARLY, until.key());
        UserException tooShortUntil = assertThrows(UserException.class, () -> Scheduler.schedule(cal,
                StudySpan.until(LocalDateTime.of(2027, 3, 2, 6, 0), LocalDate.of(2027, 3, 2)), 400, 5, Spacing.EVEN, 0));
        assertEquals(ScheduleMessage.SLOTS_TOO_CLOSE, tooShortUntil.key());
    }

    @Test
    void slotIdsArePaddedToTheWidthOfK() {
        assertEquals("S07", Slot.idFor(7, 25));
        assertEquals("S01", Slot.idFor(1, 5));
        assertEquals("S001", Slot.idFor(1, 125));
        assertEquals("S125", Slot.idFor(125, 125));
    }

    @Test
    void summaryInPlainWords() {
        ProductionCalendar cal = new ProductionCalendar(ZoneId.of("Europe/Berlin"), EnumSet.range(DayOfWeek.MONDAY, DayOfWeek.FRIDAY),
                List.of(Shift.of("early", "06:00", "14:00"), Shift.of("late", "14:00", "22:00"), Shift.of("night", "22:00", "06:00")),
                List.of(), new TreeSet<>(), ProductionRate.perHour(60));
        // 3 shifts on 1 day... 24 h = 1440 minutes; 32 subgroups -> 45 minutes
        Schedule s = Scheduler.schedule(cal, StudySpan.days(LocalDateTime.of(2027, 3, 1, 6, 0), 1), 32, 5, Spacing.EVEN, 0);
        assertEquals("one subgroup of 5 consecutive parts about every 45 minutes over 3 shifts on 1 day", s.summary());
        Schedule t = Scheduler.schedule(cal, StudySpan.days(LocalDateTime.of(2027, 3, 1, 6, 0), 2), 16, 1, Spacing.EVEN, 0);
        assertEquals("one part about every 3 hours over 6 shifts on 2 days", t.summary());
        assertEquals("hour", FrequencySummary.every(61));
        assertEquals("2.5 hours", FrequencySummary.every(151));
        assertEquals("7 minutes", FrequencySummary.every(7.2));
    }
}
