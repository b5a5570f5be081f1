package dev.proofrun.capability;

import dev.proofrun.stats.IndexKind;
import java.util.OptionalDouble;

/**
 * Point estimates of the indices; an index that the specification does not define is empty (never
 * zero or NaN). For a one-sided specification cpk and ppk equal the one-sided index that exists.
 *
 * @param cp  (USL − LSL)/(6σ_w)
 * @param cpu (USL − x̄)/(3σ_w)
 * @param cpl (x̄ − LSL)/(3σ_w)
 * @param cpk min(Cpu, Cpl)
 * @param pp  (USL − LSL)/(6s)
 * @param ppu (USL − x̄)/(3s)
 * @param ppl (x̄ − LSL)/(3s)
 * @param ppk min(Ppu, Ppl)
 * @param cpm Taguchi index against the target (see {@link CapabilityAnalysis})
 */
public record Indices(OptionalDouble cp, OptionalDouble cpu, OptionalDouble cpl, OptionalDouble cpk,
        OptionalDouble pp, OptionalDouble ppu, OptionalDouble ppl, OptionalDouble ppk, OptionalDouble cpm) {

    /** The index of the given kind. */
    public OptionalDouble of(IndexKind kind) {
        switch (kind) {
            case CP:
                return cp;
            case CPU:
                return cpu;
            case CPL:
                return cpl;
            case CPK:
                return cpk;
            case PP:
                return pp;
            case PPU:
                return ppu;
            case PPL:
                return ppl;
            case PPK:
                return ppk;
            default:
                throw new AssertionError(kind);
        }
    }
}
