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
 * The planned looks {@code plan new --stages S} writes into a plan, as {@link PlannedStages} computes them (how
 * K, the looks' confidences and futility boundaries are chosen, for one characteristic or several, is said
 * there), with the lines the command prints about them.
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
