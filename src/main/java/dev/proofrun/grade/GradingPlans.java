package dev.proofrun.grade;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.Gauge;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

/** Builds the {@link GradingPlan} from an issued {@link StudyPlan}. */
public final class GradingPlans {

    private GradingPlans() {
    }

    /**
     * What grading needs of the plan. The allowed shortfall is {@link GradingPlan#defaultAllowedShortfall}
     * (plans do not state one yet); the frequency is the schedule's spacing in running time; a staged plan's
     * looks come along.
     */
    public static GradingPlan of(StudyPlan plan) {
        List<PlannedCharacteristic> cs = new ArrayList<>();
        for (Characteristic c : plan.characteristics()) {
            double resolution = c.gauge().map(Gauge::resolution).orElse(0.0);
            cs.add(new PlannedCharacteristic(c.id(), c.name(), c.unit(), c.limits(),
                    c.nominal().isPresent() ? c.nominal().getAsDouble() : null, resolution, c.requirement(), c.shape(),
                    c.threshold().orElse(Double.NaN), c.floor().orElse(Double.NaN)));
        }
        List<PlannedSlot> slots = new ArrayList<>();
        for (Slot s : plan.schedule().slots()) {
            slots.add(new PlannedSlot(s.id(), s.start().atZoneSameInstant(plan.calendar().zone()), s.windowMinutes()));
        }
        String revision = plan.revision().orElse("draft");
        return new GradingPlan(plan.id(), revision, plan.calendar().zone(), cs, plan.design(), slots,
                GradingPlan.defaultAllowedShortfall(plan.design().subgroups()),
                Duration.ofSeconds(Math.round(plan.schedule().spacingMinutes() * 60)), plan.stages());
    }
}
