package dev.proofrun.grade;

import dev.proofrun.text.Token;

/**
 * The distribution model under which the capability is computed: the plan's declared
 * {@link dev.proofrun.stats.ShapeFamily}, as the result and the report name it.
 *
 * <ul>
 * <li>{@link #NORMAL}: the readings as they are; normal-theory indices and exact bounds.</li>
 * <li>{@link #LOGNORMAL}: ln x normal, fitted by maximum likelihood.</li>
 * <li>{@link #WEIBULL}: two-parameter Weibull fitted by maximum likelihood.</li>
 * <li>{@link #FOLDED_NORMAL}: |Y| with Y normal(μ, σ), fitted by maximum likelihood.</li>
 * <li>{@link #LOGNORMAL3}, {@link #WEIBULL3}: the lognormal or Weibull of x − θ with the plan's declared threshold
 *     θ ({@link #base()}), fitted by maximum likelihood with θ held at that value.</li>
 * </ul>
 * Under the lognormal, Weibull and folded-normal models the index is the percentile index of ISO 22514-2 (Clements 1989,
 * Quality Progress 22(9):95–100): Ppu = (USL − X₅₀)/(X₉₉.₈₆₅ − X₅₀), Ppl = (X₅₀ − LSL)/(X₅₀ − X₀.₁₃₅),
 * Pp = (USL − LSL)/(X₉₉.₈₆₅ − X₀.₁₃₅).
 *
 * <p>Its {@link #token() token} is the word in JSON, the same as the shape's.
 */
public enum ShapeModel implements Token {
    NORMAL,
    LOGNORMAL,
    WEIBULL,
    FOLDED_NORMAL,
    LOGNORMAL3,
    WEIBULL3;

    /** The two-parameter model x − θ follows for a threshold model; itself otherwise. */
    public ShapeModel base() {
        return this == LOGNORMAL3 ? LOGNORMAL : this == WEIBULL3 ? WEIBULL : this;
    }

    /** The model of a declared shape. */
    public static ShapeModel of(dev.proofrun.stats.ShapeFamily family) {
        switch (family) {
            case LOGNORMAL:
                return LOGNORMAL;
            case WEIBULL:
                return WEIBULL;
            case FOLDED_NORMAL:
                return FOLDED_NORMAL;
            case LOGNORMAL3:
                return LOGNORMAL3;
            case WEIBULL3:
                return WEIBULL3;
            default:
                return NORMAL;
        }
    }
}
