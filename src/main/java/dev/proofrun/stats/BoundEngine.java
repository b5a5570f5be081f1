package dev.proofrun.stats;

/**
 * The confidence bounds of one estimated index: the one entry point through which the estimate, the grader and
 * the designer get a bound, whatever the method behind it.
 *
 * <ul>
 * <li>{@link NormalTheoryBound}: normal theory — Cp/Pp exact chi-square, one-sided indices exact noncentral t,
 *     two-sided Cpk/Ppk by the chosen {@link BoundMethod} (exact or Bissell); formulas in {@link CapabilityBounds}.</li>
 * <li>{@link PercentileEstimate}: the percentile index of a fitted model, by generalized pivotal quantities
 *     ({@link PivotalBound}) for lognormal and Weibull, by test inversion ({@link FoldedNormalBound}) for the
 *     folded normal.</li>
 * </ul>
 *
 * <p>The confidence is a parameter of every call, so a staged study can ask for the usual bound at a look's own
 * confidence; it must be {@link Confidence#isComputable computable}, (0.5, 1), and an
 * {@link IllegalArgumentException} names it otherwise. A lower (upper) bound at 1 − α is exceeded by the true
 * index with probability 1 − α (α).
 */
public interface BoundEngine {

    /** The index estimate the bounds belong to. */
    double estimate();

    /** The lower confidence bound at the one-sided {@code confidence}. */
    double lower(double confidence);

    /** The upper confidence bound at the one-sided {@code confidence}. */
    double upper(double confidence);
}
