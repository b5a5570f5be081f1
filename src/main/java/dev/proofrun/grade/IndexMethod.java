package dev.proofrun.grade;

import dev.proofrun.text.Token;

/**
 * How the required index and its bounds were computed; named in every output ({@code method} in the JSON).
 */
public enum IndexMethod implements Token {
    /**
     * Normal model: (limit − x̄)/(3σ̂) with the plan's σ estimator; exact bounds ({@code stats.CapabilityBounds}:
     * chi-square, noncentral t, or the plan's two-sided Cpk method). Equals the ISO 22514-2 percentile index
     * for the normal model.
     */
    NORMAL_THEORY("normal theory, exact bounds"),
    /**
     * Lognormal or Weibull model: the percentile index of ISO 22514-2 (Clements 1989) from the fitted model's
     * quantiles, on the overall spread; bounds by generalized pivotal quantities ({@code stats.PivotalBound}).
     */
    PERCENTILE("the ISO 22514-2 percentile method, generalized pivotal bounds"),
    /**
     * Folded-normal model: the same percentile index (the same JSON token, the model tells them apart); bounds by
     * inverting the test of the index at each mean/σ of a confidence set and keeping the least favourable
     * ({@code stats.FoldedNormalBound}).
     */
    PERCENTILE_INVERTED("the ISO 22514-2 percentile method, bounds at the least favourable mean/sigma");

    private final String words;

    IndexMethod(String words) {
        this.words = words;
    }

    /** The word in the JSON: {@code normal-theory}, or {@code iso-22514-2-percentile} for both percentile methods. */
    @Override
    public String token() {
        return this == NORMAL_THEORY ? Token.super.token() : "iso-22514-2-percentile";
    }

    /** The words in text, report and screen. */
    public String words() {
        return words;
    }
}
