package dev.proofrun.cli;

import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;

/**
 * The planned looks {@code plan new --stages S} writes into a plan.
 *
 * <p><b>PLACEHOLDER until the staged designer is merged</b> (issue 14, item 1: {@code size --stages}). The looks
 * are equally spaced, look j at round(k·j/S) subgroups, and look j's bound is taken at confidence 1 − Δα<sub>j</sub>,
 * where Δα<sub>j</sub> = α(t<sub>j</sub>) − α(t<sub>j−1</sub>) is the α the Lan–DeMets spending function
 * ({@link Spending}) spends between the two information fractions t = k<sub>j</sub>/k. By Bonferroni's inequality
 * the chance of a false pass at any look is then at most ΣΔα<sub>j</sub> = α — whatever the correlation of the
 * looks, which share their readings. That is safe but conservative: the designer computes the boundaries from
 * the joint distribution of the stage estimates, which gives the same α with lower boundaries and so more power,
 * and adds futility boundaries. These looks have none (no futility stop: every study that does not pass early
 * runs to the last look). Replace {@link #of} with the designer's call when it is merged.
 */
final class StagedLooks {

    private StagedLooks() {
    }

    /**
     * @param subgroups  the design's k
     * @param stages     S, 1 to {@value Stages#MOST}
     * @param spending   how α is spent across the looks
     * @param confidence the plan's confidence 1 − α
     * @return S equally spaced looks, the last at k
     * @throws UserException {@link PlanOptionMessage#STAGES_RANGE} for S outside 1..4,
     *                       {@link PlanOptionMessage#STAGES_TOO_CLOSE} when the looks would be fewer than
     *                       {@value Stages#LEAST_APART} subgroups apart
     */
    static Stages of(int subgroups, int stages, Spending spending, double confidence) {
        if (stages < 1 || stages > Stages.MOST) {
            throw new UserException(PlanOptionMessage.STAGES_RANGE, Stages.MOST, stages);
        }
        double alpha = 1 - confidence;
        List<Look> looks = new ArrayList<>();
        int before = 0;
        double spentBefore = 0;
        for (int j = 1; j <= stages; j++) {
            int at = (int) Math.round(subgroups * (double) j / stages);
            if (at - before < Stages.LEAST_APART) {
                throw new UserException(PlanOptionMessage.STAGES_TOO_CLOSE, stages, subgroups, Stages.LEAST_APART,
                        Stages.LEAST_APART * stages);
            }
            double spent = j == stages ? alpha : spending.spent(alpha, at / (double) subgroups);
            looks.add(new Look(at, 1 - (spent - spentBefore), Double.NaN));
            before = at;
            spentBefore = spent;
        }
        return new Stages(spending, looks);
    }
}
