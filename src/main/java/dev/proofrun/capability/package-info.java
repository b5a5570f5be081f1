/**
 * Capability of readings already in hand: {@code CapabilityAnalysis.of(subgroups, limits, nominal,
 * method, confidence, bound)} → {@code CapabilityResult} with the indices ({@code Indices}; an index the
 * specification does not define is absent, never zero), their lower bounds ({@code LowerBounds}, from
 * {@code stats.CapabilityBounds}: within with the estimator's ν, overall with N − 1), ppm
 * ({@code PartsPerMillion}) and normality. {@code withoutNormality} gives the same figures without the raw-data
 * normality test, for grading, whose shape step replaces it. {@code CapabilityJson} is the one JSON view, used
 * by {@code estimate --json} and {@code grade --json}. Refusals people can act on (no spread, nominal outside
 * the tolerance, a method that does not fit the data) are {@code UserException}s with {@code
 * CapabilityMessage}.
 * Properties ({@code CapabilityPropertiesTest}, jqwik): nothing changes under x → a·x + b.
 */
package dev.proofrun.capability;
