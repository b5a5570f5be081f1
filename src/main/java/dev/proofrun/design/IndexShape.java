package dev.proofrun.design;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;

/**
 * Which sampling distribution governs the estimate of the required index, given the specification's sides.
 */
enum IndexShape {
    /** Cp, Pp: Ĉ = C·σ/σ̂, exact through the chi-square distribution. */
    SPREAD,
    /** Cpu, Cpl, Ppu, Ppl, and Cpk/Ppk of a one-sided specification: noncentral t. */
    ONE_SIDED,
    /** Cpk, Ppk of a two-sided specification: the folded-normal-over-chi integral. */
    TWO_SIDED_MIN;

    /** @throws UserException if the index needs a limit the specification lacks */
    static IndexShape of(IndexKind kind, SpecLimits.Sides sides) {
        boolean twoSided = sides == SpecLimits.Sides.TWO_SIDED;
        switch (kind.side()) {
            case BOTH:
                if (!twoSided) {
                    String instead = kind.usesWithinSigma() ? "Cpk" : "Ppk";
                    throw new UserException(DesignMessage.INDEX_NEEDS_BOTH_LIMITS, kind.symbol(), instead);
                }
                return SPREAD;
            case UPPER:
                if (sides == SpecLimits.Sides.LOWER_ONLY) {
                    throw new UserException(DesignMessage.INDEX_NEEDS_LIMIT, kind.symbol(), "upper");
                }
                return ONE_SIDED;
            case LOWER:
                if (sides == SpecLimits.Sides.UPPER_ONLY) {
                    throw new UserException(DesignMessage.INDEX_NEEDS_LIMIT, kind.symbol(), "lower");
                }
                return ONE_SIDED;
            default:
                return twoSided ? TWO_SIDED_MIN : ONE_SIDED;
        }
    }
}
