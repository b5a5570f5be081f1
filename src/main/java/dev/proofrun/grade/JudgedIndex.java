package dev.proofrun.grade;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.CapabilityBounds;
import dev.proofrun.stats.NormalTheoryBound;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;

/**
 * The required index estimated from one set of readings (on the scale of the chosen model), with what its
 * confidence bounds need, so the bounds can be recomputed for a larger study ({@link #lowerAt}).
 *
 * <p>Bounds, by the kind of index: Cp/Pp exact chi-square, Ĉ·sqrt(χ²_{α,ν}/ν); one-sided Cpu/Cpl/Ppu/Ppl
 * (and Cpk/Ppk of a one-sided specification) exact noncentral t; two-sided Cpk/Ppk by the plan's bound
 * method (exact, centring from the data, or Bissell) — all through the one bound engine, {@link NormalTheoryBound}
 * (formulas in {@link CapabilityBounds}). For the Weibull
 * percentile indices no exact theory exists: Cp-like indices use the chi-square bound with ν = N − 1 and the
 * others Bissell's approximation with ν = N − 1 (an approximation, named in the reasons by the model).
 *
 * @param kind       the required index
 * @param estimate   its estimate
 * @param cp         Ĉp (Ĉpp for the overall family) for the exact two-sided Cpk bound, NaN when one-sided
 * @param readings   N
 * @param df         ν of the sigma estimate behind it
 * @param side       which formula the bounds use
 * @param method     the plan's bound method
 */
record JudgedIndex(IndexKind kind, double estimate, double cp, int readings, double df, BoundSide side, BoundMethod method) {

    /** Which bound formula applies. */
    enum BoundSide { POTENTIAL, ONE_SIDED, TWO_SIDED, APPROXIMATE_POTENTIAL, APPROXIMATE }

    /** The index from a mean, a sigma and the limits; NaN when it does not exist for these limits. */
    static double value(IndexKind kind, SpecLimits limits, double mean, double sigma) {
        double cpu = limits.upper().isPresent() ? (limits.upper().getAsDouble() - mean) / (3 * sigma) : Double.NaN;
        double cpl = limits.lower().isPresent() ? (mean - limits.lower().getAsDouble()) / (3 * sigma) : Double.NaN;
        switch (kind.side()) {
            case BOTH:
                return limits.isTwoSided() ? limits.width().getAsDouble() / (6 * sigma) : Double.NaN;
            case UPPER:
                return cpu;
            case LOWER:
                return cpl;
            default:
                return limits.isTwoSided() ? Math.min(cpu, cpl) : (Double.isNaN(cpu) ? cpl : cpu);
        }
    }

    static BoundSide sideFor(IndexKind kind, SpecLimits limits) {
        switch (NormalTheoryBound.Form.of(kind, limits.isTwoSided())) {
            case SPREAD:
                return BoundSide.POTENTIAL;
            case ONE_SIDED:
                return BoundSide.ONE_SIDED;
            default:
                return BoundSide.TWO_SIDED;
        }
    }

    double lower(double confidence) {
        return bound().lower(confidence);
    }

    double upper(double confidence) {
        return bound().upper(confidence);
    }

    /** The lower bound a study of {@code n} readings and ν = {@code nu} would give with the same estimates. */
    double lowerAt(int n, double nu, double confidence) {
        return bound().withStudy(n, nu).lower(confidence);
    }

    /** The bound engine of this estimate; the approximate sides use ν = N − 1 and Bissell's two-sided formula. */
    NormalTheoryBound bound() {
        switch (side) {
            case POTENTIAL:
            case APPROXIMATE_POTENTIAL:
                return new NormalTheoryBound(NormalTheoryBound.Form.SPREAD, estimate, cp, readings, df, method);
            case ONE_SIDED:
                return new NormalTheoryBound(NormalTheoryBound.Form.ONE_SIDED, estimate, cp, readings, df, method);
            case TWO_SIDED:
                return new NormalTheoryBound(NormalTheoryBound.Form.TWO_SIDED, estimate, cp, readings, df, method);
            default:
                return new NormalTheoryBound(NormalTheoryBound.Form.TWO_SIDED, estimate, Double.NaN, readings, df,
                        BoundMethod.BISSELL);
        }
    }

    /** The evidence record for the result. */
    IndexEvidence evidence(Requirement r, ShapeFamily model) {
        return evidence(r, model, r.confidence());
    }

    /** The evidence record with its bounds at {@code confidence} (a staged study's look) instead of the requirement's. */
    IndexEvidence evidence(Requirement r, ShapeFamily model, double confidence) {
        // the upper bound only matters (and is only shown) when the estimate is below c0; the exact two-sided
        // bound costs about a second at a million readings, so it is not computed otherwise
        double up = estimate < r.minimum() ? upper(confidence) : Double.NaN;
        return new IndexEvidence(kind, r.minimum(), confidence, estimate, lower(confidence), up, model);
    }
}
