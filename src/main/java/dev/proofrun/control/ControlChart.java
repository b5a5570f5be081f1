package dev.proofrun.control;

import java.util.List;
import java.util.Objects;

/**
 * One control chart: its points, its limits and the run-rule signals on it.
 *
 * <p>{@code center}, {@code ucl} and {@code lcl} are the limits for the nominal subgroup size (the one
 * most subgroups have). With unequal sizes each point is standardized with its own size's limits, so
 * {@code z} — and therefore the signals — always use the right limits; {@code pointUcl}/{@code pointLcl}
 * hold them per point for drawing.
 *
 * @param statistic what is plotted
 * @param center    centre line
 * @param ucl       upper control limit
 * @param lcl       lower control limit (0 when the 3σ line falls below zero for a spread chart)
 * @param points    the plotted values
 * @param z         the points standardized: (point − centre)/σ_point, limits at ±3
 * @param pointUcl  the upper limit of each point
 * @param pointLcl  the lower limit of each point
 * @param firstSubgroup index (0-based) of the subgroup of points[0]: 0, or 1 for a moving-range chart
 * @param signals   run-rule signals, indices into {@code points}
 */
public record ControlChart(ChartStatistic statistic, double center, double ucl, double lcl, double[] points,
        double[] z, double[] pointUcl, double[] pointLcl, int firstSubgroup, List<RuleFiring> signals) {

    public ControlChart {
        Objects.requireNonNull(statistic, "statistic");
        signals = List.copyOf(signals);
    }

    /** The 0-based subgroup a point index belongs to. */
    public int subgroupOf(int pointIndex) {
        return pointIndex + firstSubgroup;
    }
}
