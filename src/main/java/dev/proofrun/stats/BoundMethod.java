package dev.proofrun.stats;

import dev.proofrun.text.Tokens;
import java.util.Locale;

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
public enum BoundMethod {
    EXACT("exact"),
    BISSELL("bissell");

    private final String token;

    BoundMethod(String token) {
        this.token = token;
    }

    public String token() {
        return token;
    }

    /** @throws IllegalArgumentException for an unknown token */
    public static BoundMethod fromToken(String token) {
        return Tokens.find(BoundMethod.class, BoundMethod::token, token)
                .orElseThrow(() -> new IllegalArgumentException(String.format(Locale.ROOT, "unknown bound method '%s' (exact or bissell)", token)));
    }
}
