package dev.proofrun.plan;

import dev.proofrun.design.Design;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedDesigner;
import dev.proofrun.design.StagedMessage;
import dev.proofrun.design.Stages;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;

/**
 * The planned looks a staged plan carries, from the staged designer ({@link StagedDesigner}), as both
 * {@code plan new --stages S} writes them (and a wizard step that plans looks would): the looks' confidences calibrated on
 * the joint distribution of the looks so that the whole study keeps its false-pass risk, and futility boundaries
 * from β-spending at the expected index.
 *
 * <p>One characteristic: the designer chooses the most subgroups K (the smallest that gives the wanted power at
 * every look's gates), unless k is given, when the looks are calibrated at that k. Several characteristics: K is
 * the largest any of them needs (or the given k); each look takes the strictest (highest) confidence any
 * characteristic's own calibration asks for at that K, so none of them passes a false study more often than its
 * own staged design allows; and there are no futility stops, since one boundary cannot serve indices of
 * different targets. The power of each characteristic is its own at K (its own calibration), an approximation
 * for several, which callers say.
 *
 * @param design  the plan's design: the given n and K subgroups
 * @param stages  the looks the plan carries
 * @param ownAtK  each characteristic's own staged design at K, in the characteristics' order
 */
public record PlannedStages(Design design, Stages stages, List<StagedDesign> ownAtK) {

    public PlannedStages {
        ownAtK = List.copyOf(ownAtK);
    }

    /**
     * @param chars    the plan's characteristics (each normal-model; one confidence)
     * @param design   the single-stage design chosen for the plan (its n; its k if given)
     * @param kGiven   whether k is the plan's own (given on the command line, kept from a plan file)
     * @param power    the wanted power
     * @param stages   S, 2 to {@value Stages#MOST}
     * @param spending how α is spent across the looks
     * @throws UserException for a skewed shape, looks fewer than {@value Stages#LEAST_APART} apart, or a design
     *                       the designer cannot reach
     */
    public static PlannedStages of(List<Characteristic> chars, Design design, boolean kGiven, double power,
            int stages, Spending spending) {
        for (Characteristic c : chars) {
            if (!c.shape().isNormal()) {
                throw new UserException(StagedMessage.STAGES_NEED_NORMAL, c.shape().token());
            }
        }
        List<DesignRequest> requests = new ArrayList<>();
        for (Characteristic c : chars) {
            requests.add(DesignRequest.of(c.limits().sides(), c.requirement(), c.expectation()).withPower(power));
        }
        return of(requests, design, kGiven, stages, spending);
    }

    /**
     * The same from the characteristics' design requests (their sides, requirement, expectation and power; the
     * subgroup sizes are replaced by the design's n).
     */
    public static PlannedStages of(List<DesignRequest> each, Design design, boolean kGiven, int stages,
            Spending spending) {
        for (DesignRequest r : each) {
            if (r.requirement().confidence() != each.get(0).requirement().confidence()) {
                throw new UserException(StagedMessage.STAGES_ONE_CONFIDENCE);
            }
        }
        int n = design.subgroupSize();
        List<DesignRequest> requests = each.stream().map(r -> r.withSubgroupSizes(List.of(n))).toList();
        List<StagedDesign> own = new ArrayList<>();
        int k = design.subgroups();
        if (!kGiven) {
            k = 0;
            for (DesignRequest r : requests) {
                StagedDesign d = StagedDesigner.design(r, n, stages, spending);
                own.add(d);
                k = Math.max(k, d.stages().last().subgroups());
            }
        }
        List<StagedDesign> atK = new ArrayList<>();
        for (int i = 0; i < requests.size(); i++) {
            boolean ready = !own.isEmpty() && own.get(i).stages().last().subgroups() == k;
            atK.add(ready ? own.get(i) : StagedDesigner.at(requests.get(i), n, k, stages, spending));
        }
        List<Look> looks = new ArrayList<>();
        for (int j = 0; j < stages; j++) {
            double confidence = 0;
            for (StagedDesign d : atK) {
                confidence = Math.max(confidence, d.stages().looks().get(j).confidence());
            }
            double futility = atK.size() == 1 ? atK.get(0).stages().looks().get(j).futility() : Double.NaN;
            looks.add(new Look(atK.get(0).stages().looks().get(j).subgroups(), confidence, futility));
        }
        Design planned = new Design(n, k, design.sigmaMethod(), design.boundMethod());
        return new PlannedStages(planned, new Stages(spending, looks), atK);
    }
}
