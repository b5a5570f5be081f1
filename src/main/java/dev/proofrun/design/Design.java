package dev.proofrun.design;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.SigmaMethod;
import java.util.Locale;

/**
 * A study design: {@code subgroups} subgroups (k) of {@code subgroupSize} consecutive parts (n), graded
 * with the given within-sigma estimator and bound method (the plan and the grade use the same ones).
 *
 * @param subgroupSize n ≥ 1
 * @param subgroups    k ≥ 2
 * @param sigmaMethod  the within-sigma estimator; must suit n (moving range only for n = 1)
 * @param boundMethod  the bound method
 */
public record Design(int subgroupSize, int subgroups, SigmaMethod sigmaMethod, BoundMethod boundMethod) {

    /**
     * @throws IllegalArgumentException if n &lt; 1 or k &lt; 2
     * @throws IllegalArgumentException if the estimator does not suit n
     */
    public Design {
        if (subgroupSize < 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "subgroup size must be at least 1: %d", subgroupSize));
        }
        if (subgroups < 2) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "at least 2 subgroups are needed: %d", subgroups));
        }
        if ((subgroupSize == 1) != (sigmaMethod == SigmaMethod.MOVING_RANGE)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "sigma method %s does not suit subgroups of %d", sigmaMethod.token(), subgroupSize));
        }
    }

    /** The default estimator for n with the exact bound. */
    public static Design of(int subgroupSize, int subgroups) {
        return new Design(subgroupSize, subgroups, SigmaMethod.defaultFor(subgroupSize), BoundMethod.EXACT);
    }

    /** N = n·k. */
    public int readings() {
        return subgroupSize * subgroups;
    }
}
