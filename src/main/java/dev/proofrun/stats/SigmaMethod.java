package dev.proofrun.stats;

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
public enum SigmaMethod {

    /** σ̂_w = R̄/d2(n), the average subgroup range over d2. Equal subgroup sizes, 2 ≤ n ≤ 50. */
    RBAR("rbar"),
    /** σ̂_w = S̄/c4(n), the average subgroup standard deviation over c4; unequal sizes weighted. n ≥ 2. */
    SBAR("sbar"),
    /** σ̂_w = s_p/c4(ν+1), s_p the pooled standard deviation with ν = Σ(nᵢ−1). n ≥ 2. */
    POOLED("pooled"),
    /** Individuals (n = 1): σ̂_w = MR̄/d2(2), MR̄ the average moving range of span 2, d2(2) = 2/√π. */
    MOVING_RANGE("mr");

    private final String token;

    SigmaMethod(String token) {
        this.token = token;
    }

    /** The word used on the command line and in plan files. */
    public String token() {
        return token;
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

    /** @throws IllegalArgumentException for an unknown token */
    public static SigmaMethod fromToken(String token) {
        return Tokens.find(SigmaMethod.class, SigmaMethod::token, token)
                .orElseThrow(() -> new IllegalArgumentException(String.format(Locale.ROOT,
                        "unknown sigma method '%s' (rbar, sbar, pooled or mr)", token)));
    }
}
