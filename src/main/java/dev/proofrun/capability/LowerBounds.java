package dev.proofrun.capability;

import java.util.OptionalDouble;

/**
 * One-sided lower confidence bounds at the analysis's confidence; empty where the index is.
 *
 * @param cp  exact chi-square bound on σ_w's degrees of freedom
 * @param cpk two-sided specification: the chosen bound method; one-sided: the exact noncentral-t bound
 * @param pp  exact chi-square bound with N − 1 degrees of freedom
 * @param ppk as cpk, with s and N − 1
 */
public record LowerBounds(OptionalDouble cp, OptionalDouble cpk, OptionalDouble pp, OptionalDouble ppk) {
}
