package dev.proofrun.sheet;

import dev.proofrun.design.Design;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.Gauge;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.PlanState;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Schedule;
import dev.proofrun.schedule.Slot;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/** Invented plans of any size for the sheet tests, built on the demo plan's calendar and part. */
public final class SheetFixtures {

    private SheetFixtures() {
    }

    /**
     * A plan with {@code slots} slots every 20 minutes from 2027-03-01 06:00 (+01:00) and {@code chars}
     * two-sided characteristics C1… (nominal 10·i, tolerance ±0.05, resolution 0.001).
     */
    public static StudyPlan plan(String id, int slots, int chars, int n, boolean issued) {
        List<Characteristic> cs = new ArrayList<>();
        for (int i = 1; i <= chars; i++) {
            cs.add(characteristic("C" + i, "diameter " + i, 10.0 * i));
        }
        return plan(id, slots, cs, n, issued);
    }

    static Characteristic characteristic(String id, String name, double nominal) {
        return new Characteristic(id, name, "mm", OptionalDouble.of(nominal),
                SpecLimits.twoSided(nominal - 0.05, nominal + 0.05), Optional.of(Gauge.of("bore gauge", 0.001)),
                Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.centred(1.67));
    }

    static StudyPlan plan(String id, int slots, List<Characteristic> cs, int n, boolean issued) {
        StudyPlan demo = DemoPlan.draft();
        OffsetDateTime start = OffsetDateTime.of(2027, 3, 1, 6, 0, 0, 0, ZoneOffset.ofHours(1));
        List<Slot> list = new ArrayList<>();
        for (int i = 0; i < slots; i++) {
            list.add(new Slot(Slot.idFor(i + 1, slots), start.plusMinutes(20L * i), 10, i % 2 == 0 ? "early" : "late",
                    30L * i));
        }
        Schedule schedule = new Schedule(list, n, 20.0 * slots, 20.0, start.plusMinutes(20L * slots), 1 + slots / 24,
                1 + slots / 72);
        StudyPlan draft = new StudyPlan(id, demo.part(), demo.people(), cs, demo.calendar(), demo.span(),
                Design.of(n, slots), demo.spacing(), demo.seed(), schedule, PlanState.DRAFT, Optional.empty(),
                Optional.empty());
        return issued ? PlanFiles.issue(draft) : draft;
    }
}
