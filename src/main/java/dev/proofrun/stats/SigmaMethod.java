package dev.proofrun.stats;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;
import java.util.Locale;

/**
 * How the within-subgroup (short-term) standard deviation σ_w is estimated. The same constant is used by
 * the design (through the estimator's degrees of freedom) and by the grading, so plan and verdict agree.
 *
 * <p>Degrees of freedom: {@link #POOLED} has ν = Σ(nᵢ−1) exactly; {@link #RBAR}, {@link #SBAR} and
 * {@link #MOVING_RANGE} have an <em>effective</em> ν found by matching the estimator's coefficient of
 * variation to that of a scaled chi variable (Patnaik 1950, Biometrika 37:78–87).
 */
public enum SigmaMethod implements Token {

    /** σ̂_w = R̄/d2(n), the average subgroup range over d2. Equal subgroup sizes, 2 ≤ n ≤ 50. */
    RBAR,
    /** σ̂_w = S̄/c4(n), the average subgroup standard deviation over c4; unequal sizes weighted. n ≥ 2. */
    SBAR,
    /** σ̂_w = s_p/c4(ν+1), s_p the pooled standard deviation with ν = Σ(nᵢ−1). n ≥ 2. */
    POOLED,
    /** Individuals (n = 1): σ̂_w = MR̄/d2(2), MR̄ the average moving range of span 2, d2(2) = 2/√π. */
    MOVING_RANGE;

    /** The word on the command line and in plan files: the name as {@link Token} makes it, {@code mr} for the moving range. */
    @Override
    public String token() {
        return this == MOVING_RANGE ? "mr" : Token.super.token();
    }

    /**
     * The default for subgroups of size n: moving range for n = 1, R̄/d2 for n ≤ 10, S̄/c4 above
     * (common practice: ranges lose efficiency past about ten readings).
     */
    public static SigmaMethod defaultFor(int subgroupSize) {
        if (subgroupSize < 1) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "subgroup size must be at least 1: %d", subgroupSize));
        }
        if (subgroupSize == 1) {
            return MOVING_RANGE;
        }
        return subgroupSize <= 10 ? RBAR : SBAR;
    }

    /** The method named by its word ({@code rbar}, {@code mr}, …), as {@link Tokens#parse} reads it. */
    public static SigmaMethod fromToken(String token) {
        return Tokens.parse(SigmaMethod.class, "sigma method", token);
    }
}
