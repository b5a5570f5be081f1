package dev.proofrun.stats;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;

/**
 * How the lower confidence bound of an index is computed.
 *
 * <ul>
 * <li>{@link #EXACT}: Cp/Pp from the chi-square distribution, Ĉ·sqrt(χ²_{α,ν}/ν); Cpu/Cpl from the
 * noncentral t distribution (Chou, Owen &amp; Borrego 1990, JQT 22:223–229); two-sided Cpk/Ppk from the
 * exact distribution of the estimate, a one-dimensional integral of normal probabilities over the chi
 * density (Pearn, Kotz &amp; Johnson 1992, JQT 24:216–231), with the centring taken from the data.</li>
 * <li>{@link #BISSELL}: Cpk/Ppk by the normal approximation Ĉ − z_{1−α}·sqrt(1/(9N) + Ĉ²/(2ν))
 * (Bissell 1990, Applied Statistics 39:331–340); Cp/Pp stay exact.</li>
 * </ul>
 */
public enum BoundMethod implements Token {
    EXACT,
    BISSELL;

    /** The method named by its word ({@code exact}, {@code bissell}), as {@link Tokens#parse} reads it. */
    public static BoundMethod fromToken(String token) {
        return Tokens.parse(BoundMethod.class, "bound method", token);
    }
}
