package dev.proofrun.cli;

import dev.proofrun.design.Design;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedDesigner;
import dev.proofrun.design.StagedMessage;
import dev.proofrun.design.Stages;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The planned looks {@code plan new --stages S} writes into a plan, from the staged designer
 * ({@link StagedDesigner}): the looks' confidences calibrated on the joint distribution of the looks so that the
 * whole study keeps its false-pass risk, and futility boundaries from β-spending at the expected index.
 *
 * <p>One characteristic: the designer chooses the most subgroups K (the smallest that gives the wanted power at
 * every look's gates), unless k is given, when the looks are calibrated at that k. Several characteristics: K is
 * the largest any of them needs (or the given k); each look takes the strictest (highest) confidence any
 * characteristic's own calibration asks for at that K, so none of them passes a false study more often than its
 * own staged design allows; and there are no futility stops, since one boundary cannot serve indices of
 * different targets. The power printed for several is each characteristic's own at K, an approximation the
 * command says.
 */
final class StagedLooks {

    /** The design and looks of a staged plan, with what {@code plan new} prints about them. */
    record Planned(Design design, Stages stages, List<String> lines) {
    }

    private StagedLooks() {
    }

    /**
     * @param chars     the plan's characteristics (each normal-model; one confidence)
     * @param design    the single-stage design chosen for the plan (its n; its k if given)
     * @param kGiven    whether k was given on the command line
     * @param power     the wanted power
     * @param stages    S, 2 to {@value Stages#MOST}
     * @param spending  how α is spent across the looks
     * @throws UserException for a skewed shape, looks fewer than {@value Stages#LEAST_APART} apart, or a design
     *                       the designer cannot reach
     */
    static Planned of(List<Characteristic> chars, Design design, boolean kGiven, double power, int stages,
            Spending spending) {
        for (Characteristic c : chars) {
            if (!c.shape().isNormal()) {
                throw new UserException(StagedMessage.STAGES_NEED_NORMAL, c.shape().token());
            }
        }
        int n = design.subgroupSize();
        List<DesignRequest> requests = new ArrayList<>();
        for (Characteristic c : chars) {
            requests.add(DesignRequest.of(c.limits().sides(), c.requirement(), c.expectation()).withPower(power)
                    .withSubgroupSizes(List.of(n)));
        }
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
        Stages planned = new Stages(spending, looks);
        List<String> lines = new ArrayList<>();
        lines.add(PlanOptionMessage.STAGES_PLANNED.format(stages, joined(looks, true), joined(looks, false),
                spending.token(), k, n, n * k));
        for (int i = 0; i < chars.size(); i++) {
            StagedDesign d = atK.get(i);
            lines.add(PlanOptionMessage.STAGES_POWER.format(chars.get(i).id(), d.power(), d.expectedReadingsAtExpected(),
                    d.singleStage().readings(), chars.size() == 1 ? "" : PlanOptionMessage.STAGES_SHARED.english()));
        }
        return new Planned(Design.of(n, k), planned, lines);
    }

    private static String joined(List<Look> looks, boolean subgroups) {
        List<String> parts = new ArrayList<>();
        for (Look l : looks) {
            parts.add(subgroups ? String.valueOf(l.subgroups())
                    : String.format(Locale.ROOT, "%.2f", 100 * l.confidence()));
        }
        return String.join(", ", parts);
    }
}
