package dev.proofrun.design;

/**
 * One point of the power curve against the number of subgroups for the recommended subgroup size.
 *
 * @param subgroups k
 * @param readings  N = n·k
 * @param power     P(lower bound ≥ c₀) at the expected index
 */
public record PowerPoint(int subgroups, int readings, double power) {
}
