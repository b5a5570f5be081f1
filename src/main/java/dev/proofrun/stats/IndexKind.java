package dev.proofrun.stats;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;

/**
 * The capability and performance indices (symbols as in ISO 22514-2).
 * "Within" indices use σ_w, "overall" ones the sample standard deviation s of all readings.
 */
public enum IndexKind implements Token {
    /** (USL−LSL)/(6σ_w); two-sided only. */
    CP(true, Side.BOTH),
    /** (USL−μ)/(3σ_w). */
    CPU(true, Side.UPPER),
    /** (μ−LSL)/(3σ_w). */
    CPL(true, Side.LOWER),
    /** min(Cpu, Cpl); for a one-sided specification the one that exists. */
    CPK(true, Side.NEAREST),
    /** (USL−LSL)/(6s); two-sided only. */
    PP(false, Side.BOTH),
    /** (USL−μ)/(3s). */
    PPU(false, Side.UPPER),
    /** (μ−LSL)/(3s). */
    PPL(false, Side.LOWER),
    /** min(Ppu, Ppl); for a one-sided specification the one that exists. */
    PPK(false, Side.NEAREST);

    /** Which limit(s) an index uses. */
    public enum Side { BOTH, UPPER, LOWER, NEAREST }

    private final boolean within;
    private final Side side;

    IndexKind(boolean within, Side side) {
        this.within = within;
        this.side = side;
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
        String token = token();
        return Character.toUpperCase(token.charAt(0)) + token.substring(1);
    }

    /** The index named by its word ({@code cpk}, {@code ppu}, …), as {@link Tokens#parse} reads it. */
    public static IndexKind fromToken(String token) {
        return Tokens.parse(IndexKind.class, "index", token);
    }
}
