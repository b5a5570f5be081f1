package dev.proofrun.control;

import dev.proofrun.text.Token;

/** The statistic a control chart plots, one point per subgroup (moving range: per pair of subgroups). */
public enum ChartStatistic implements Token {
    /** Subgroup mean x̄ᵢ. */
    MEAN,
    /** Subgroup range Rᵢ = max − min. */
    RANGE,
    /** Subgroup standard deviation sᵢ (divisor nᵢ − 1). */
    STANDARD_DEVIATION,
    /** The single reading of an individuals chart. */
    INDIVIDUAL,
    /** |xᵢ − xᵢ₋₁|, the moving range of span 2. */
    MOVING_RANGE;

    /** The word used in JSON, e.g. {@code mean}, {@code moving-range}; {@code sd} for the standard deviation. */
    @Override
    public String token() {
        return this == STANDARD_DEVIATION ? "sd" : Token.super.token();
    }
}
