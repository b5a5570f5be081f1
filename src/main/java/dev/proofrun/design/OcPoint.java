package dev.proofrun.design;

/**
 * One point of the operating-characteristic curve: the probability that the study demonstrates the
 * requirement when the true index is {@code trueIndex} (with the expected relative centring held fixed).
 *
 * @param trueIndex   the true value of the required index
 * @param probability P(lower bound ≥ c₀)
 */
public record OcPoint(double trueIndex, double probability) {
}
