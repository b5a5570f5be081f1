package dev.proofrun.grade;

import dev.proofrun.control.ChartStatistic;
import dev.proofrun.control.RunRule;

/**
 * A run-rule signal placed on the study's subgroups.
 *
 * @param chart    the chart's statistic ({@code mean}, {@code range}, ...); JSON "chart"
 * @param rule     the rule that fired
 * @param subgroup 1-based position of the subgroup among the graded subgroups
 * @param slot     the plan's slot id of that subgroup, e.g. "S07"
 */
public record SlotSignal(ChartStatistic chart, RunRule rule, int subgroup, String slot) {
}
