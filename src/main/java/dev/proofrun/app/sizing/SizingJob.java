package dev.proofrun.app.sizing;

import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.FieldNumbers;
import dev.proofrun.app.session.RowRequirement;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.text.UserException;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.StudyDesigner;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/** One computation of the Sample-size step, run on the worker: everything the step shows for one request. */
final class SizingJob {

    private SizingJob() {
    }

    /**
     * @param all   the table of every subgroup size
     * @param own   the table of the chosen subgroup size alone, when it is not the recommended one
     * @param kept  the power at the plan's own k, when the plan keeps one the designer can evaluate
     * @param curve the OC curve at the plan's own k, likewise
     */
    record Answer(DesignTable all, DesignTable own, SizingCost.KeptPower kept, SizingCurves.PlanCurve curve) {
    }

    /**
     * The request for the characteristic in focus, with its own requirement ({@link RowRequirement}) and the wanted
     * power; empty while the goal is incomplete.
     *
     * @throws UserException            when the designer refuses the request (c₁ ≤ c₀)
     * @throws IllegalArgumentException when the power is out of range
     */
    static Optional<DesignRequest> request(GoalViewModel goal, String power) {
        Optional<Requirement> req = goal.focusBinding().get()
                .flatMap(row -> RowRequirement.of(row, goal.requirementBinding().get()));
        Optional<Expectation> exp = goal.expectationBinding().get();
        if (goal.requirementBinding().get().isEmpty() || req.isEmpty() || exp.isEmpty()
                || goal.focusBinding().get().get().limits().isEmpty()) {
            return Optional.empty();
        }
        OptionalDouble p = FieldNumbers.parse(power);
        DesignRequest r = DesignRequest.of(goal.focusBinding().get().get().limits().get().sides(), req.get(), exp.get());
        return Optional.of(p.isPresent() ? r.withPower(p.getAsDouble()) : r);
    }

    /**
     * @param wanted the chosen subgroup size, 0 for the recommended one
     * @param kept   the plan's own k, if it keeps one (a plan file's, or the design shared by all characteristics)
     */
    static Answer compute(DesignRequest req, int wanted, Optional<Integer> kept) {
        DesignTable every = StudyDesigner.design(req);
        DesignTable own = null;
        if (wanted > 0 && wanted != every.recommended().subgroupSize()
                && every.rows().stream().anyMatch(r -> r.subgroupSize() == wanted)) {
            own = StudyDesigner.design(req.withSubgroupSizes(List.of(wanted)));
        }
        int n = (own != null ? own : every).recommended().subgroupSize();
        SizingCost.KeptPower power = null;
        SizingCurves.PlanCurve curve = null;
        if (kept.isPresent()) {
            try {
                power = new SizingCost.KeptPower(n, kept.get(), StudyDesigner.power(req, n, kept.get()));
                curve = new SizingCurves.PlanCurve(n, kept.get(), StudyDesigner.operatingCharacteristic(req, n, kept.get()));
            } catch (IllegalArgumentException outsideTheDesignersRange) {
                power = null; // said as "power not computed for this k"; no OC curve for it
            }
        }
        return new Answer(every, own, power, curve);
    }
}
