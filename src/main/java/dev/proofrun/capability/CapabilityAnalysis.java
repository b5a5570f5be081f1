package dev.proofrun.capability;

import dev.proofrun.stats.AndersonDarling;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.CapabilityBounds;
import dev.proofrun.stats.Confidence;
import dev.proofrun.stats.NormalTheoryBound;
import dev.proofrun.stats.Nonconforming;
import dev.proofrun.stats.SampleMoments;
import dev.proofrun.stats.SigmaEstimate;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.stats.Subgroups;
import dev.proofrun.stats.WithinSigma;
import dev.proofrun.text.UserException;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * Capability of a set of readings against a specification: the indices, their lower confidence bounds,
 * expected and observed nonconforming parts, and a normality test.
 *
 * <ul>
 * <li>σ_w from {@link WithinSigma} (default {@link SigmaMethod#defaultFor} of the common subgroup size;
 *     S̄/c4 when sizes differ), s = overall standard deviation (divisor N − 1).</li>
 * <li>Cp = (USL − LSL)/(6σ_w), Cpu = (USL − x̄)/(3σ_w), Cpl = (x̄ − LSL)/(3σ_w), Cpk = min; the same with s
 *     for Pp, Ppu, Ppl, Ppk (ISO 22514-2 symbols). One-sided specifications give only Cpu/Ppu or
 *     Cpl/Ppl, and Cpk/Ppk equal them.</li>
 * <li>Cpm = (USL − LSL)/(6τ), τ = sqrt(s² + (x̄ − T)²) (Chan, Cheng &amp; Spiring 1988, JQT 20:162–175).
 *     T is the nominal when given, else the midpoint of a two-sided tolerance; a one-sided
 *     specification without a nominal has no Cpm; with a nominal it gets the one-sided analogue
 *     |limit − T|/(3τ).</li>
 * <li>Lower bounds through the bound engine {@link NormalTheoryBound} (formulas in {@link CapabilityBounds}): Cp with ν_w = the estimator's (effective) degrees of
 *     freedom, Pp with N − 1; Cpk/Ppk with the chosen {@link BoundMethod} for a two-sided
 *     specification and the exact noncentral-t bound for a one-sided one.</li>
 * </ul>
 */
public final class CapabilityAnalysis {

    private CapabilityAnalysis() {
    }

    /**
     * Analyses the readings.
     *
     * @param subgroups  the readings in subgroups (individuals in time order as subgroups of one)
     * @param limits     the specification
     * @param nominal    the target T for Cpm, or null
     * @param method     the within-sigma estimator, or null for the default
     * @param confidence confidence of the lower bounds, in (0.5, 0.9999)
     * @param bound      the bound method for two-sided Cpk/Ppk
     * @throws UserException if there are fewer than 2 readings, no spread, no spread within subgroups,
     *                       a method that does not fit the subgroups, a nominal outside the tolerance,
     *                       or a confidence out of range
     * @throws IllegalArgumentException if a reading is not finite
     */
    public static CapabilityResult of(List<double[]> subgroups, SpecLimits limits, Double nominal, SigmaMethod method,
            double confidence, BoundMethod bound) {
        return of(subgroups, limits, nominal, method, confidence, bound, true);
    }

    /**
     * The same figures as {@link #of} without the normality test ({@link CapabilityResult#normality()} is
     * empty): for a caller that judges the shape itself and would discard the test — grading does, on the
     * readings spread over the gauge's resolution. Saves a sort of all readings.
     *
     * @throws UserException as {@link #of}
     * @throws IllegalArgumentException as {@link #of}
     */
    public static CapabilityResult withoutNormality(List<double[]> subgroups, SpecLimits limits, Double nominal,
            SigmaMethod method, double confidence, BoundMethod bound) {
        return of(subgroups, limits, nominal, method, confidence, bound, false);
    }

    private static CapabilityResult of(List<double[]> subgroups, SpecLimits limits, Double nominal, SigmaMethod method,
            double confidence, BoundMethod bound, boolean testNormality) {
        Objects.requireNonNull(subgroups, "subgroups");
        Objects.requireNonNull(limits, "limits");
        Objects.requireNonNull(bound, "bound");
        if (!Confidence.isStatable(confidence)) {
            throw new UserException(CapabilityMessage.CONFIDENCE_OUT_OF_RANGE, confidence);
        }
        long total = subgroups.stream().mapToLong(g -> g.length).sum();
        if (total < 2) {
            throw new UserException(CapabilityMessage.TOO_FEW_READINGS, total);
        }
        SampleMoments moments = SampleMoments.of(subgroups);
        if (!(moments.standardDeviation() > 0)) {
            throw new UserException(CapabilityMessage.NO_SPREAD, moments.mean());
        }
        OptionalInt size = commonSize(subgroups);
        SigmaMethod chosen = method != null ? method
                : size.isPresent() ? SigmaMethod.defaultFor(size.getAsInt()) : SigmaMethod.SBAR;
        SigmaEstimate within;
        try {
            within = WithinSigma.estimate(chosen, subgroups);
        } catch (IllegalArgumentException e) {
            throw new UserException(CapabilityMessage.SIGMA_METHOD_REFUSED, e.getMessage());
        }
        if (!(within.value() > 0)) {
            throw new UserException(CapabilityMessage.NO_WITHIN_SPREAD);
        }
        OptionalDouble target = target(limits, nominal);
        double mean = moments.mean();
        double s = moments.standardDeviation();
        Indices idx = indices(limits, target, mean, within.value(), s);
        int n = Math.toIntExact(total);
        LowerBounds lower = new LowerBounds(
                cpBound(idx.cp(), n, within.degreesOfFreedom(), confidence),
                cpkBound(limits, idx.cpk(), idx.cp(), n, within.degreesOfFreedom(), confidence, bound),
                cpBound(idx.pp(), n, moments.degreesOfFreedom(), confidence),
                cpkBound(limits, idx.ppk(), idx.pp(), n, moments.degreesOfFreedom(), confidence, bound));
        PartsPerMillion ppm = new PartsPerMillion(
                Nonconforming.expectedPpm(limits, mean, within.value()),
                Nonconforming.expectedPpm(limits, mean, s),
                Nonconforming.observedOutside(limits, subgroups), total);
        Optional<AndersonDarling.Result> normality = testNormality && total >= AndersonDarling.MIN_READINGS
                ? Optional.of(AndersonDarling.test(Subgroups.flatten(subgroups))) : Optional.empty();
        return new CapabilityResult(total, subgroups.size(), size, mean, within, s, limits, target, idx, lower,
                confidence, bound, ppm, normality);
    }

    private static OptionalDouble target(SpecLimits limits, Double nominal) {
        if (nominal == null) {
            return limits.midpoint();
        }
        boolean inside = Double.isFinite(nominal)
                && (limits.lower().isEmpty() || nominal > limits.lower().getAsDouble())
                && (limits.upper().isEmpty() || nominal < limits.upper().getAsDouble());
        if (!inside) {
            throw new UserException(CapabilityMessage.NOMINAL_OUTSIDE, nominal);
        }
        return OptionalDouble.of(nominal);
    }

    static Indices indices(SpecLimits limits, OptionalDouble target, double mean, double sw, double s) {
        OptionalDouble width = limits.width();
        OptionalDouble toUpper = limits.upper().isPresent()
                ? OptionalDouble.of(limits.upper().getAsDouble() - mean) : OptionalDouble.empty();
        OptionalDouble toLower = limits.lower().isPresent()
                ? OptionalDouble.of(mean - limits.lower().getAsDouble()) : OptionalDouble.empty();
        OptionalDouble cp = scale(width, 6 * sw);
        OptionalDouble cpu = scale(toUpper, 3 * sw);
        OptionalDouble cpl = scale(toLower, 3 * sw);
        OptionalDouble pp = scale(width, 6 * s);
        OptionalDouble ppu = scale(toUpper, 3 * s);
        OptionalDouble ppl = scale(toLower, 3 * s);
        OptionalDouble cpm = OptionalDouble.empty();
        if (target.isPresent()) {
            double t = target.getAsDouble();
            double tau = Math.sqrt(s * s + (mean - t) * (mean - t));
            if (width.isPresent()) {
                cpm = OptionalDouble.of(width.getAsDouble() / (6 * tau));
            } else {
                double reach = limits.upper().isPresent() ? limits.upper().getAsDouble() - t : t - limits.lower().getAsDouble();
                cpm = OptionalDouble.of(reach / (3 * tau));
            }
        }
        return new Indices(cp, cpu, cpl, min(cpu, cpl), pp, ppu, ppl, min(ppu, ppl), cpm);
    }

    private static OptionalDouble cpBound(OptionalDouble c, int n, double nu, double confidence) {
        return c.isPresent() ? OptionalDouble.of(new NormalTheoryBound(NormalTheoryBound.Form.SPREAD, c.getAsDouble(),
                Double.NaN, n, nu, BoundMethod.EXACT).lower(confidence)) : OptionalDouble.empty();
    }

    private static OptionalDouble cpkBound(SpecLimits limits, OptionalDouble ck, OptionalDouble c, int n, double nu,
            double confidence, BoundMethod bound) {
        NormalTheoryBound.Form form = limits.isTwoSided() ? NormalTheoryBound.Form.TWO_SIDED : NormalTheoryBound.Form.ONE_SIDED;
        double cp = limits.isTwoSided() ? c.getAsDouble() : Double.NaN;
        return OptionalDouble.of(new NormalTheoryBound(form, ck.getAsDouble(), cp, n, nu, bound).lower(confidence));
    }

    private static OptionalDouble scale(OptionalDouble distance, double spread) {
        return distance.isPresent() ? OptionalDouble.of(distance.getAsDouble() / spread) : OptionalDouble.empty();
    }

    private static OptionalDouble min(OptionalDouble a, OptionalDouble b) {
        if (a.isPresent() && b.isPresent()) {
            return OptionalDouble.of(Math.min(a.getAsDouble(), b.getAsDouble()));
        }
        return a.isPresent() ? a : b;
    }

    private static OptionalInt commonSize(List<double[]> subgroups) {
        int n = subgroups.get(0).length;
        for (double[] g : subgroups) {
            if (g.length != n) {
                return OptionalInt.empty();
            }
        }
        return OptionalInt.of(n);
    }
}
