package dev.proofrun.design;

/**
 * One candidate design in a {@link DesignTable}: for subgroups of size n, the smallest number of subgroups
 * that reaches the wanted power and meets the floors.
 *
 * @param subgroupSize        n
 * @param subgroups           k after the floors
 * @param readings            N = n·k
 * @param power               the probability that the grader returns <em>demonstrated</em> when the process is as
 *                            expected: the whole procedure, every gate counted ({@link ProcedurePower})
 * @param boundPower          the probability that the lower bound alone reaches c₀ (the bound's power, no gates)
 * @param criticalEstimate    ĉ*, the smallest estimated index that passes at the expected centring
 * @param degreesOfFreedom    ν of the sigma estimate (effective for R̄/d2, S̄/c4 and moving range)
 * @param limitedBy           what fixed k
 * @param falseAlarm          P(the grader calls a stable process unstable) at this (n, k), its own rule
 *                            ({@code control.StabilityRisk})
 * @param detection           P(the grader calls the process unstable | the mean moves by δ·σ_w for the second half)
 * @param shift               δ
 * @param anySignalFalseAlarm P(some chart rule fires at least once | stable process): what a chart user sees, not
 *                            what the grader decides
 * @param anySignalDetection  P(some chart rule fires at least once | mean δ·σ_w off centre for the second half)
 */
public record DesignRow(int subgroupSize, int subgroups, int readings, double power, double boundPower,
        double criticalEstimate, double degreesOfFreedom, LimitedBy limitedBy, double falseAlarm, double detection,
        double shift, ChartRisk anySignalFalseAlarm, ChartRisk anySignalDetection) {
}
