package dev.proofrun.plan;

import dev.proofrun.design.Design;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.schedule.BreakWindow;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.ProductionRate;
import dev.proofrun.schedule.Shift;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.schedule.StudySpan;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeSet;

/**
 * The invented demo study saved as {@code plans/demo-valve-body.json}: a valve body machined at an
 * invented plant (Kesselried works of an invented pump maker) on three shifts, with three characteristics —
 * a two-sided bore diameter, an upper-only surface roughness (planned lognormal: bounded at zero and skewed)
 * and a lower-only push-out force. The span
 * crosses the Easter holidays and the spring daylight-saving change of 2027 in Europe/Berlin. All numbers
 * are made up for the demo; none comes from a real part.
 */
public final class DemoPlan {

    /** The file name under {@code plans/}. */
    public static final String FILE_NAME = "demo-valve-body.json";

    private DemoPlan() {
    }

    /** The demo plan as a draft. */
    public static StudyPlan draft() {
        List<Characteristic> characteristics = List.of(
                new Characteristic("D1", "bore diameter", "mm", OptionalDouble.of(22.0),
                        SpecLimits.twoSided(21.987, 22.013),
                        Optional.of(new Gauge("air gauge 22 mm", 0.0005, OptionalDouble.of(0.0003))),
                        Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.offCentre(1.67, 1.8)),
                new Characteristic("R4", "surface roughness Ra", "µm", OptionalDouble.empty(),
                        SpecLimits.upperOnly(0.8),
                        Optional.of(Gauge.of("stylus profilometer", 0.01)),
                        Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.centred(1.8), ShapeFamily.LOGNORMAL),
                new Characteristic("F7", "seat push-out force", "kN", OptionalDouble.empty(),
                        SpecLimits.lowerOnly(4.5),
                        Optional.of(Gauge.of("press force monitor", 0.01)),
                        Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.centred(2.0)));
        ProductionCalendar calendar = new ProductionCalendar(ZoneId.of("Europe/Berlin"),
                EnumSet.range(DayOfWeek.MONDAY, DayOfWeek.FRIDAY),
                List.of(Shift.of("early", "06:00", "14:00"), Shift.of("late", "14:00", "22:00"),
                        Shift.of("night", "22:00", "06:00")),
                List.of(BreakWindow.of("09:30", "09:45"), BreakWindow.of("12:00", "12:30"),
                        BreakWindow.of("17:30", "17:45"), BreakWindow.of("20:00", "20:30"),
                        BreakWindow.of("01:30", "01:45"), BreakWindow.of("03:30", "04:00")),
                new TreeSet<>(List.of(LocalDate.of(2027, 3, 26), LocalDate.of(2027, 3, 29))),
                ProductionRate.cycleSeconds(40));
        StudySpan span = StudySpan.days(LocalDateTime.of(2027, 3, 24, 6, 0), 3);
        return StudyPlan.draft("PR-2027-0311", new Part("valve body", "VB-220-04", "C"),
                new People("M. Brandt, supplier quality", "machining cell 4, Kesselried works"),
                characteristics, calendar, span, Design.of(5, 25), Spacing.RANDOM, 20270324L);
    }

    /** The demo plan, issued. */
    public static StudyPlan create() {
        return PlanFiles.issue(draft());
    }
}
