package dev.proofrun.app.timing;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.app.timing.WorkingHours.Span;
import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.ProductionRate;
import dev.proofrun.schedule.Shift;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.EnumSet;
import java.util.List;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/** The working minutes of a date, and a collection window clipped to them. */
class WorkingHoursTest {

    private static ProductionCalendar calendar(List<Shift> shifts, List<BreakWindow> breaks) {
        return new ProductionCalendar(ZoneId.of("UTC"), EnumSet.range(DayOfWeek.MONDAY, DayOfWeek.FRIDAY), shifts, breaks,
                new TreeSet<>(), ProductionRate.perHour(60));
    }

    // 2027-03-01 is a Monday, 2027-03-06 a Saturday (java.time)
    private static final LocalDate MONDAY = LocalDate.of(2027, 3, 1);

    @Test
    void twoShiftsWithABreak() {
        ProductionCalendar c = calendar(List.of(Shift.of("early", "06:00", "14:00"), Shift.of("late", "14:00", "22:00")),
                List.of(BreakWindow.of("12:00", "12:30")));
        assertEquals(List.of(new Span(360, 720), new Span(750, 1320)), WorkingHours.of(c, MONDAY));
        assertEquals(List.of(), WorkingHours.of(c, MONDAY.plusDays(5)), "Saturday: no shifts");
    }

    @Test
    void aNightShiftLendsItsTailToTheNextDateEvenANonWorkingOne() {
        ProductionCalendar c = calendar(List.of(Shift.of("night", "22:00", "06:00")), List.of());
        assertEquals(List.of(new Span(0, 360), new Span(1320, 1440)), WorkingHours.of(c, MONDAY.plusDays(1)));
        assertEquals(List.of(new Span(0, 360)), WorkingHours.of(c, MONDAY.plusDays(5)), "Saturday morning: Friday's night shift");
        assertEquals(List.of(new Span(1320, 1440)), WorkingHours.of(c, MONDAY), "Monday: Sunday had no night shift");
    }

    @Test
    void aWindowIsClippedAtTheShiftsEndAndAroundABreak() {
        ProductionCalendar c = calendar(List.of(Shift.of("early", "06:00", "14:00")), List.of(BreakWindow.of("09:30", "09:45")));
        List<Span> working = WorkingHours.of(c, MONDAY);
        // a slot at 13:50 ± 30 min: only 13:20-14:00 is working time
        assertEquals(List.of(new Span(800, 840)), WorkingHours.clip(working, 830 - 30, 830 + 30));
        // a slot at 09:35 ± 15 min: 09:20-09:30 and 09:45-09:50, not the break
        assertEquals(List.of(new Span(560, 570), new Span(585, 590)), WorkingHours.clip(working, 575 - 15, 575 + 15));
        // a slot at 06:05 ± 30 min: not before the shift starts
        assertEquals(List.of(new Span(360, 395)), WorkingHours.clip(working, 365 - 30, 365 + 30));
    }
}
