package dev.proofrun.stats;

import java.util.OptionalDouble;
import org.apache.commons.statistics.distribution.ChiSquaredDistribution;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * The normal-theory bounds of one index estimate ({@link BoundEngine}); which formula of {@link CapabilityBounds}
 * applies is decided here once, from the {@link Form} of the index and the {@link BoundMethod}.
 *
 * <ul>
 * <li>{@link Form#SPREAD} (Cp, Pp): exact chi-square, Ĉ·sqrt(χ²_{α,ν}/ν), whatever the method.</li>
 * <li>{@link Form#ONE_SIDED} (Cpu, Cpl, Ppu, Ppl; Cpk/Ppk of a one-sided specification): exact noncentral t.</li>
 * <li>{@link Form#TWO_SIDED} (Cpk/Ppk of a two-sided specification): the method — exact with the centring from
 *     the data, or Bissell's approximation. With Ĉp NaN the exact method falls back to the noncentral t.</li>
 * </ul>
 *
 * @param form     which formula applies
 * @param estimate Ĉ
 * @param cp       Ĉp (or Ĉpp) for the exact two-sided bound; NaN where there is none
 * @param readings N
 * @param nu       ν, the degrees of freedom of the sigma estimate
 * @param method   the two-sided bound method (ignored by the other forms)
 */
public record NormalTheoryBound(Form form, double estimate, double cp, int readings, double nu, BoundMethod method)
        implements BoundEngine {

    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);

    /** The shape of an index as its bounds see it. */
    public enum Form {
        /** Cp, Pp: the spread against the tolerance width. */
        SPREAD,
        /** Cpu, Cpl, Ppu, Ppl, and Cpk/Ppk of a one-sided specification. */
        ONE_SIDED,
        /** Cpk, Ppk of a two-sided specification: the nearer limit. */
        TWO_SIDED;

        /** The form of {@code kind} against limits that are two-sided or not. */
        public static Form of(IndexKind kind, boolean twoSidedLimits) {
            switch (kind.side()) {
                case BOTH:
                    return SPREAD;
                case UPPER:
                case LOWER:
                    return ONE_SIDED;
                default:
                    return twoSidedLimits ? TWO_SIDED : ONE_SIDED;
            }
        }
    }

    /** @throws IllegalArgumentException if the form or the method is missing */
    public NormalTheoryBound {
        if (form == null || method == null) {
            throw new IllegalArgumentException("the form and the bound method must be given");
        }
    }

    @Override
    public double lower(double confidence) {
        return bound(true, confidence);
    }

    @Override
    public double upper(double confidence) {
        return bound(false, confidence);
    }

    private double bound(boolean lower, double c) {
        switch (form) {
            case SPREAD:
                return lower ? CapabilityBounds.lowerCp(estimate, nu, c) : CapabilityBounds.upperCp(estimate, nu, c);
            case ONE_SIDED:
                return lower ? CapabilityBounds.lowerOneSided(estimate, readings, nu, c)
                        : CapabilityBounds.upperOneSided(estimate, readings, nu, c);
            default:
                return lower ? CapabilityBounds.lowerCpk(estimate, cp, readings, nu, c, method)
                        : CapabilityBounds.upperCpk(estimate, cp, readings, nu, c, method);
        }
    }

    /** The same estimates as a study of {@code n} readings with ν = {@code nu} would bound them. */
    public NormalTheoryBound withStudy(int n, double nu) {
        return new NormalTheoryBound(form, estimate, cp, n, nu, method);
    }

    /**
     * The smallest estimate whose lower bound reaches c₀, where it has a closed form; empty where it must be found
     * from the estimate's exact distribution (the one-sided noncentral t, the exact two-sided bound), which the
     * designer does with its own tail integrals.
     *
     * <ul>
     * <li>SPREAD: c₀·sqrt(ν/χ²_{α,ν}).</li>
     * <li>TWO_SIDED with Bissell: (c₀ + sqrt(c₀² − A·C))/A, A = 1 − z²/(2ν), C = c₀² − z²/(9N), z = z_{1−α};
     *     infinite when A ≤ 0 (no estimate passes).</li>
     * </ul>
     *
     * @throws IllegalArgumentException if the confidence is not {@link Confidence#isComputable computable}
     */
    public static OptionalDouble passingEstimate(Form form, BoundMethod method, double c0, int readings, double nu,
            double confidence) {
        Confidence.requireComputable(confidence);
        double alpha = 1 - confidence;
        if (form == Form.SPREAD) {
            return OptionalDouble.of(c0 * Math.sqrt(nu / ChiSquaredDistribution.of(nu).inverseCumulativeProbability(alpha)));
        }
        if (form == Form.TWO_SIDED && method == BoundMethod.BISSELL) {
            return OptionalDouble.of(bissellPassing(c0, readings, nu, alpha));
        }
        return OptionalDouble.empty();
    }

    /** The estimate whose Bissell bound at 1 − α equals c₀ (also a starting guess for the exact searches). */
    public static double bissellPassing(double c0, int readings, double nu, double alpha) {
        double z = STANDARD_NORMAL.inverseCumulativeProbability(1 - alpha);
        double a = 1 - z * z / (2 * nu);
        double c = c0 * c0 - z * z / (9.0 * readings);
        if (!(a > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return (c0 + Math.sqrt(c0 * c0 - a * c)) / a;
    }
}
