package dev.proofrun.design;

/**
 * How many of a plan's k subgroups may be lost (missing or unusable) before the grader calls the study not
 * valid: a tenth of the planned subgroups, rounded down. proofrun's choice, not a trade rule: a study that lost
 * more no longer has the design's power and spread over time. The grader applies it when a plan states no
 * allowance of its own; the designer counts it in the power ({@link ProcedurePower}).
 */
public final class LossAllowance {

    private LossAllowance() {
    }

    /** ⌊k/10⌋. */
    public static int of(int subgroups) {
        return subgroups / 10;
    }
}
