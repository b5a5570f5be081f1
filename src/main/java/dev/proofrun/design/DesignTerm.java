package dev.proofrun.design;

import dev.proofrun.text.MessageKey;

/**
 * The names of a design table's columns and their one-line explanations, the same in {@code size}'s table
 * and in the wizard's: one word per concept. Symbols are the ones the domain uses: ĉ* (the critical
 * estimate, {@link DesignRow#criticalEstimate()}), ν (the degrees of freedom of the within-sigma estimate,
 * {@link DesignRow#degreesOfFreedom()}), and what set k ({@link LimitedBy}, shown by its token).
 */
public enum DesignTerm implements MessageKey {
    CRITICAL_ESTIMATE("ĉ*"),
    CRITICAL_ESTIMATE_TIP("ĉ*: the smallest estimated index whose lower bound reaches the required minimum, at the "
            + "expected centring"),
    DEGREES_OF_FREEDOM("ν"),
    DEGREES_OF_FREEDOM_TIP("ν: degrees of freedom of the within-sigma estimate (effective, after Patnaik 1950, for "
            + "R̄/d2, S̄/c4 and moving range)"),
    K_SET_BY("k set by"),
    K_SET_BY_TIP("k set by: what fixed the number of subgroups k, the wanted power or a practice floor (min-subgroups, "
            + "min-readings)");

    private final String english;

    DesignTerm(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
