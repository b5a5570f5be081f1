package dev.proofrun.design;

/**
 * One candidate design in a {@link DesignTable}: for subgroups of size n, the smallest number of subgroups
 * that reaches the wanted power and meets the floors.
 *
 * @param subgroupSize      n
 * @param subgroups         k after the floors
 * @param readings          N = n·k
 * @param power             the probability that a study of this size demonstrates the requirement when the
 *                          process is as expected (at k, after the floors)
 * @param criticalEstimate  ĉ*, the smallest estimated index that passes at the expected centring
 * @param degreesOfFreedom  ν of the sigma estimate (effective for R̄/d2, S̄/c4 and moving range)
 * @param limitedBy         what fixed k
 * @param falseAlarm        P(chart signals at least once | stable process)
 * @param detection         P(chart signals at least once | mean δ·σ_w off centre for the second half)
 */
public record DesignRow(int subgroupSize, int subgroups, int readings, double power, double criticalEstimate,
        double degreesOfFreedom, LimitedBy limitedBy, ChartRisk falseAlarm, ChartRisk detection) {
}
