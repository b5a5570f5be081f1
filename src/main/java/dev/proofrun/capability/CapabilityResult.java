package dev.proofrun.capability;

import dev.proofrun.stats.AndersonDarling;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SigmaEstimate;
import dev.proofrun.stats.SpecLimits;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The capability of one set of readings, as {@link CapabilityAnalysis#of} computes it. {@link
 * CapabilityJson#of} gives its JSON view (the same keys for {@code estimate --json} and
 * {@code grade --json}).
 *
 * @param readings     N, all readings
 * @param subgroups    k
 * @param subgroupSize n when all subgroups have the same size, else empty
 * @param mean         x̄ of all readings
 * @param within       σ̂_w with its method and (effective) degrees of freedom
 * @param sigmaOverall s of all readings (divisor N − 1); its degrees of freedom are N − 1
 * @param limits       the specification
 * @param target       the target of Cpm: the nominal, else the midpoint of a two-sided tolerance
 * @param indices      point estimates
 * @param lower        lower confidence bounds
 * @param confidence   confidence of the bounds
 * @param bound        the method for two-sided Cpk/Ppk bounds
 * @param ppm          nonconforming parts
 * @param normality    Anderson–Darling test of all readings, empty below {@value AndersonDarling#MIN_READINGS}
 *                     readings
 */
public record CapabilityResult(long readings, int subgroups, OptionalInt subgroupSize, double mean,
        SigmaEstimate within, double sigmaOverall, SpecLimits limits, OptionalDouble target, Indices indices,
        LowerBounds lower, double confidence, BoundMethod bound, PartsPerMillion ppm,
        Optional<AndersonDarling.Result> normality) {

    /** Degrees of freedom of s: N − 1. */
    public double overallDegreesOfFreedom() {
        return readings - 1.0;
    }

    /** The point estimate of an index, empty if the specification does not define it. */
    public OptionalDouble index(IndexKind kind) {
        return indices.of(kind);
    }

    /** The lower bound of Cp, Cpk, Pp or Ppk (empty for other kinds and for undefined indices). */
    public OptionalDouble lowerBound(IndexKind kind) {
        switch (kind) {
            case CP:
                return lower.cp();
            case CPK:
                return lower.cpk();
            case PP:
                return lower.pp();
            case PPK:
                return lower.ppk();
            default:
                return OptionalDouble.empty();
        }
    }
}
