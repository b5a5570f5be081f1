package dev.proofrun.design;

import java.util.List;

/**
 * A staged study for one subgroup size, from {@link StagedDesigner#design}: its looks (the {@link Stages} the plan
 * and the grader share) and what they promise.
 *
 * @param stages                     the looks and the spending function (the plan's contract)
 * @param subgroupSize               n
 * @param looks                      per look: readings, boundaries on the index scale, stop chances
 * @param power                      P(the grader returns demonstrated at some look | process as expected), every
 *                                   gate counted at every look, futility stops honoured
 * @param boundPower                 the same from the bound and futility decisions alone
 * @param passAtTarget               P(demonstrated at some look | true index = c₀), gates counted, at the least
 *                                   favourable centring tried
 * @param expectedReadingsAtTarget   mean readings collected when the true index is c₀
 * @param expectedReadingsAtExpected mean readings collected when the process is as expected
 * @param maxReadings                readings if the study runs to its last look
 * @param singleStage                the single-stage design of the same n, for comparison
 * @param paths                      simulated studies behind the figures (their standard error on a chance p is
 *                                   √(p(1 − p)/paths))
 */
public record StagedDesign(Stages stages, int subgroupSize, List<StagedLook> looks, double power, double boundPower,
        double passAtTarget, double expectedReadingsAtTarget, double expectedReadingsAtExpected, int maxReadings,
        DesignRow singleStage, int paths) {

    /** A staged design is recommended when it saves at least this share of the expected readings at c₁ … */
    public static final double LEAST_SAVING = 0.15;
    /** … for at most this share more readings at most than the single-stage design. */
    public static final double MOST_EXTRA = 0.20;

    public StagedDesign {
        looks = List.copyOf(looks);
    }

    /** The share of the single stage's readings saved on average when the process is as expected. */
    public double saving() {
        return 1 - expectedReadingsAtExpected / singleStage.readings();
    }

    /** The share more readings than the single stage when the study runs to its last look. */
    public double extra() {
        return maxReadings / (double) singleStage.readings() - 1;
    }

    /**
     * proofrun's rule: staged when it saves at least {@value #LEAST_SAVING} of the expected readings at c₁ for at
     * most {@value #MOST_EXTRA} more readings at most. A single-stage design is never "recommended" over itself.
     */
    public boolean recommended() {
        return stages.staged() && saving() >= LEAST_SAVING - 1e-12 && extra() <= MOST_EXTRA + 1e-12;
    }

    /** The sentence that says whether the staged design is recommended, and why ({@code size --stages}, the wizard). */
    public String reason() {
        if (recommended()) {
            return StagedMessage.STAGED_RECOMMENDED.format(looks.size(), 100 * saving(), 100 * extra());
        }
        return StagedMessage.STAGED_NOT_RECOMMENDED.format(looks.size(), 100 * saving(), 100 * extra(),
                100 * LEAST_SAVING, 100 * MOST_EXTRA);
    }
}
