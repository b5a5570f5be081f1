package dev.proofrun.cli;

import dev.proofrun.design.Design;
import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.Stages;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.PlannedStages;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The planned looks {@code plan new --stages S} writes into a plan ({@link PlannedStages}, which the wizard's
 * Sample-size step calls too), with what the command prints about them.
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
        PlannedStages p = PlannedStages.of(chars, design, kGiven, power, stages, spending);
        List<Look> looks = p.stages().looks();
        int n = p.design().subgroupSize();
        int k = p.design().subgroups();
        List<String> lines = new ArrayList<>();
        lines.add(PlanOptionMessage.STAGES_PLANNED.format(stages, joined(looks, true), joined(looks, false),
                spending.token(), k, n, n * k));
        for (int i = 0; i < chars.size(); i++) {
            StagedDesign d = p.ownAtK().get(i);
            lines.add(PlanOptionMessage.STAGES_POWER.format(chars.get(i).id(), d.power(), d.expectedReadingsAtExpected(),
                    d.singleStage().readings(), chars.size() == 1 ? "" : PlanOptionMessage.STAGES_SHARED.english()));
        }
        return new Planned(p.design(), p.stages(), lines);
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
