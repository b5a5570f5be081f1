package dev.proofrun.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalTime;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The one calendar grammar of the command line and the wizard. */
class CalendarSyntaxTest {

    private static final List<Shift> THREE = List.of(new Shift("early", LocalTime.of(6, 0), LocalTime.of(14, 0)),
            new Shift("late", LocalTime.of(14, 0), LocalTime.of(22, 0)), new Shift("night", LocalTime.of(22, 0), LocalTime.of(6, 0)));

    @Test
    void bothSpellingsOfAShiftReadAlike() {
        assertEquals(THREE, CalendarSyntax.shifts("early=06:00-14:00,late=14:00-22:00,night=22:00-06:00"));
        assertEquals(THREE, CalendarSyntax.shifts("early 06:00-14:00, late 14:00-22:00; night 22:00-06:00"));
        assertEquals(THREE, CalendarSyntax.shifts(" early = 06:00-14:00 ,, late 14:00-22:00,night=22:00-06:00 "));
    }

    @Test
    void whatTheWizardShowsReadsBackTheSame() {
        assertEquals("early 06:00-14:00, late 14:00-22:00, night 22:00-06:00", CalendarSyntax.shifts(THREE));
        assertEquals(THREE, CalendarSyntax.shifts(CalendarSyntax.shifts(THREE)));
        List<BreakWindow> breaks = CalendarSyntax.breaks("09:30-09:45,18:00-18:30");
        assertEquals(breaks, CalendarSyntax.breaks(CalendarSyntax.breaks(breaks)));
        assertEquals("Mon, Tue, Wed, Thu, Fri", CalendarSyntax.workingDays(CalendarSyntax.workingDays("MON-FRI")));
    }

    @Test
    void aWindowAloneIsNamedByItsPlace() {
        List<Shift> s = CalendarSyntax.shifts("06:00-14:00,14:00-22:00");
        assertEquals(List.of("A", "B"), s.stream().map(Shift::name).toList());
    }

    @Test
    void daysInEitherCaseAndRangesOverTheWeekend() {
        assertEquals(EnumSet.range(DayOfWeek.MONDAY, DayOfWeek.FRIDAY), CalendarSyntax.workingDays("Mon-Fri"));
        assertEquals(EnumSet.of(DayOfWeek.MONDAY, DayOfWeek.WEDNESDAY, DayOfWeek.SATURDAY),
                CalendarSyntax.workingDays("monday, WED; Sat"));
        assertEquals(EnumSet.of(DayOfWeek.FRIDAY, DayOfWeek.SATURDAY, DayOfWeek.SUNDAY, DayOfWeek.MONDAY),
                CalendarSyntax.workingDays("FRI-MON"));
    }

    @Test
    void datesAndBlanks() {
        assertEquals(List.of(LocalDate.of(2027, 3, 26), LocalDate.of(2027, 3, 29)),
                List.copyOf(CalendarSyntax.dates("2027-03-29, 2027-03-26")));
        assertEquals(0, CalendarSyntax.dates(" ").size());
        assertEquals(0, CalendarSyntax.dates((String) null).size());
        assertEquals(0, CalendarSyntax.breaks("").size());
    }

    @Test
    void refusalsNameTheItem() {
        assertEquals("'early 06:00 to 14:00' is not a shift such as early 06:00-14:00", refused(() -> CalendarSyntax.shifts("early 06:00 to 14:00")));
        assertEquals("'=06:00-14:00' is not a shift such as early 06:00-14:00", refused(() -> CalendarSyntax.shifts("=06:00-14:00")));
        assertEquals("give at least one shift, such as early 06:00-14:00", refused(() -> CalendarSyntax.shifts(" , ")));
        assertEquals("'early=06:00-25:00': Text '25:00' could not be parsed: Invalid value for HourOfDay (valid values 0 - 23): 25",
                refused(() -> CalendarSyntax.shifts("early=06:00-25:00")));
        assertEquals("'Mon-Fry' is not a day such as Mon or Mon-Fri", refused(() -> CalendarSyntax.workingDays("Mon-Fry")));
        assertEquals("'Mo' is not a day such as Mon or Mon-Fri", refused(() -> CalendarSyntax.workingDays("Mo")));
        assertEquals("give the working days, such as Mon-Fri", refused(() -> CalendarSyntax.workingDays("")));
        assertEquals("'09:30' is not a break such as 09:30-09:45", refused(() -> CalendarSyntax.breaks("09:30")));
        assertEquals("'2027-02-30' is not a date such as 2027-03-26", refused(() -> CalendarSyntax.dates("2027-02-30")));
    }

    private static String refused(org.junit.jupiter.api.function.Executable e) {
        return assertThrows(IllegalArgumentException.class, e).getMessage();
    }
}
