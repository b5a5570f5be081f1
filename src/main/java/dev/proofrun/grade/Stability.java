package dev.proofrun.grade;

import dev.proofrun.control.ChartPair;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The stability evidence for one characteristic. See {@link StabilityJudge} for how signals and the
 * between-subgroup variation become the finding.
 *
 * @param charts                 the control charts with limits from the data
 * @param signals                every run-rule signal, placed on subgroups
 * @param locationSignalPoints   points of the location chart at which some rule fired
 * @param expectedLocationByChance expected number of such points on a stable process with this many
 *                               subgroups and these rules
 * @param locationChance         probability that a stable process signals at this many points or more
 * @param spreadSignalPoints     points beyond the limits on the spread chart
 * @param expectedSpreadByChance expected number of those on a stable process
 * @param spreadChance           probability of at least that many by chance
 * @param stabilityRatio         σ_overall/σ_within
 * @param anovaF                 one-way ANOVA F between subgroups (empty for n = 1)
 * @param anovaP                 its p-value (empty for n = 1)
 * @param stable                 the finding
 */
public record Stability(ChartPair charts, List<ChartSignal> signals, int locationSignalPoints,
        double expectedLocationByChance, double locationChance, int spreadSignalPoints, double expectedSpreadByChance,
        double spreadChance, double stabilityRatio, OptionalDouble anovaF, OptionalDouble anovaP, boolean stable) {

    public Stability {
        signals = List.copyOf(signals);
    }
}
