package dev.proofrun.stats;

import dev.proofrun.text.Tokens;
import java.util.Locale;

/**
 * The capability and performance indices (symbols as in ISO 22514-2).
 * "Within" indices use σ_w, "overall" ones the sample standard deviation s of all readings.
 */
public enum IndexKind {
    /** (USL−LSL)/(6σ_w); two-sided only. */
    CP("cp", true, Side.BOTH),
    /** (USL−μ)/(3σ_w). */
    CPU("cpu", true, Side.UPPER),
    /** (μ−LSL)/(3σ_w). */
    CPL("cpl", true, Side.LOWER),
    /** min(Cpu, Cpl); for a one-sided specification the one that exists. */
    CPK("cpk", true, Side.NEAREST),
    /** (USL−LSL)/(6s); two-sided only. */
    PP("pp", false, Side.BOTH),
    /** (USL−μ)/(3s). */
    PPU("ppu", false, Side.UPPER),
    /** (μ−LSL)/(3s). */
    PPL("ppl", false, Side.LOWER),
    /** min(Ppu, Ppl); for a one-sided specification the one that exists. */
    PPK("ppk", false, Side.NEAREST);

    /** Which limit(s) an index uses. */
    public enum Side { BOTH, UPPER, LOWER, NEAREST }

    private final String token;
    private final boolean within;
    private final Side side;

    IndexKind(String token, boolean within, Side side) {
        this.token = token;
        this.within = within;
        this.side = side;
    }

    public String token() {
        return token;
    }

    /** True for indices on σ_w (Cp family), false for those on s (Pp family). */
    public boolean usesWithinSigma() {
        return within;
    }

    public Side side() {
        return side;
    }

    /** Upper-case symbol as printed: "Cpk", "Ppu". */
    public String symbol() {
        return Character.toUpperCase(token.charAt(0)) + token.substring(1);
    }

    /** @throws IllegalArgumentException for an unknown token */
    public static IndexKind fromToken(String token) {
        return Tokens.find(IndexKind.class, IndexKind::token, token)
                .orElseThrow(() -> new IllegalArgumentException(String.format(Locale.ROOT, "unknown index '%s'", token)));
    }
}
