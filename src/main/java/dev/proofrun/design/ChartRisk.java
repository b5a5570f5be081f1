package dev.proofrun.design;

/**
 * A probability that the mean chart (individuals chart for n = 1) signals at least once during a study,
 * with the 3σ limits alone and with all eight run rules of {@code control.RunRule}.
 *
 * @param beyondLimits the probability with the rule "a point beyond the 3σ limits" alone (closed form)
 * @param allRules     the probability with all eight run rules (a stored seeded simulation, see
 *                     {@link RuleRisks}; standard error about 0.003 at most)
 */
public record ChartRisk(double beyondLimits, double allRules) {
}
