package dev.proofrun.stats;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;

/**
 * The distribution model a characteristic's readings are planned to follow. The shape belongs to the plan:
 * it is declared before the data exists and the grader fits only that model (it never hunts among models).
 *
 * <p>Each family is a location–scale family on some scale y = g(x):
 * <ul>
 * <li>{@link #NORMAL}: y = x, normal(μ, σ). The default.</li>
 * <li>{@link #LOGNORMAL}: y = ln x, normal(μ, σ) — for characteristics bounded at zero and skewed to the right
 *     (roughness, flatness, leak rate; common practice).</li>
 * <li>{@link #WEIBULL}: two-parameter Weibull(k, c) with F(x) = 1 − exp(−(x/c)^k); y = ln x follows the
 *     smallest-extreme-value distribution with location ln c and scale 1/k (Lawless 2003, <em>Statistical
 *     Models and Methods for Lifetime Data</em>, 2nd ed., §4.1) — for zero-bounded characteristics whose skew
 *     changes with the shape k (runout, burr height, loosening torque; common practice).</li>
 * <li>{@link #FOLDED_NORMAL}: x = |Y| with Y normal(μ, σ) ({@link FoldedNormal}) — for characteristics bounded
 *     at zero whose signed deviation is normal (position, runout; common practice). It is not a location–scale
 *     family: its bound is a test inversion at the least favourable mean/σ ({@link FoldedNormalBound}), not a pivotal one.</li>
 * <li>{@link #LOGNORMAL3}, {@link #WEIBULL3}: the same two models for x − θ, with the threshold θ a
 *     <em>declared plan value</em> (the physical stop or datum the readings cannot go below), never estimated
 *     from the readings: with θ known, x − θ follows the two-parameter family and its pivotal bound holds as it
 *     is (docs/decisions/declared-shape-grading.md, "Threshold shapes"). {@link #base()} names that family. Where
 *     only a stop below the real start is known, the plan gives it as a <em>floor</em> instead and the grade takes
 *     the least bound over the thresholds the readings leave possible ({@link FloorBound}; same record, "Floor").</li>
 * </ul>
 * The location–scale form is what makes the lower bound of a percentile index a pivotal computation
 * ({@code grade.PercentileBound}). Tokens are the words in plan files, the characteristics CSV and
 * {@code --shape}.
 */
public enum ShapeFamily implements Token {
    /** Normal: the readings as they are. */
    NORMAL(Double.NEGATIVE_INFINITY),
    /** Lognormal: ln x is normal; readings must be positive. */
    LOGNORMAL(0),
    /** Two-parameter Weibull: ln x is smallest-extreme-value; readings must be positive. */
    WEIBULL(0),
    /** Folded normal |Y|, Y normal(μ, σ): readings must not be negative ({@link FoldedNormal}). Not location–scale. */
    FOLDED_NORMAL(0),
    /** Lognormal of x − θ with a declared threshold θ: readings must lie above θ. */
    LOGNORMAL3(0),
    /** Two-parameter Weibull of x − θ with a declared threshold θ: readings must lie above θ. */
    WEIBULL3(0);

    private final double lowerBound;

    ShapeFamily(double lowerBound) {
        this.lowerBound = lowerBound;
    }

    /**
     * The smallest value the model allows: −∞ for the normal, 0 otherwise (readings must lie above it; the folded
     * normal also allows 0 itself). For the threshold shapes it is the bound of x − θ, so θ on the readings' scale.
     */
    public double lowerBound() {
        return lowerBound;
    }

    /** True for the shapes that need a declared threshold θ: {@link #LOGNORMAL3}, {@link #WEIBULL3}. */
    public boolean hasThreshold() {
        return this == LOGNORMAL3 || this == WEIBULL3;
    }

    /** The two-parameter family x − θ follows for a threshold shape ({@link #LOGNORMAL} or {@link #WEIBULL}); itself otherwise. */
    public ShapeFamily base() {
        switch (this) {
            case LOGNORMAL3:
                return LOGNORMAL;
            case WEIBULL3:
                return WEIBULL;
            default:
                return this;
        }
    }

    /** True when the model is the normal one (today's exact normal-theory bounds apply). */
    public boolean isNormal() {
        return this == NORMAL;
    }

    /** True for the families whose bound is pivotal ({@link PivotalBound}): normal, lognormal, Weibull. */
    public boolean isLocationScale() {
        return this != FOLDED_NORMAL;
    }

    /**
     * The shape named by its word in files and options ("normal", "lognormal", "weibull", "folded-normal",
     * "lognormal3", "weibull3"), as {@link Tokens#parse} reads it.
     */
    public static ShapeFamily fromToken(String token) {
        return Tokens.parse(ShapeFamily.class, "shape", token);
    }
}
