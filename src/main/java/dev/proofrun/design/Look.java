package dev.proofrun.design;

import dev.proofrun.stats.Confidence;

/**
 * One planned look of a staged study. At {@code subgroups} usable subgroups the grader grades with all the
 * readings so far: <em>demonstrated</em> when the lower bound at {@code confidence} (above the plan's stated
 * confidence, so that the whole study keeps its false-pass risk) reaches c₀; stopped for futility when the index
 * estimate is below {@code futility}; otherwise the people collect the next stage. At the last look there is no
 * next stage: what is not demonstrated there is not demonstrated.
 *
 * @param subgroups  usable subgroups at this look, counted from the start of the study
 * @param confidence the one-sided confidence of the bound compared with c₀ at this look, in (0.5, 1)
 *                   ({@link Confidence#isComputable}: it may exceed what a person may state)
 * @param futility   the estimate below which the study stops for futility; NaN where this look has none
 */
public record Look(int subgroups, double confidence, double futility) {

    public Look {
        if (subgroups < 1) {
            throw new IllegalArgumentException("a look needs at least one subgroup: " + subgroups);
        }
        Confidence.requireComputable(confidence);
        if (Double.isInfinite(futility)) {
            throw new IllegalArgumentException("futility must be finite or NaN");
        }
    }

    /** Whether this look can stop the study for futility. */
    public boolean stopsForFutility() {
        return !Double.isNaN(futility);
    }
}
