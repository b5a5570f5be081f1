package dev.proofrun.stats;

import java.util.Locale;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * A fitted member of a {@link ShapeFamily}, held as location u and scale b on the family's
 * location–scale scale y = g(x) (x for the normal, ln x for the lognormal and Weibull):
 * F(x) = G((g(x) − u)/b) with G the standard normal (normal, lognormal) or the standard smallest-extreme-value
 * distribution G(z) = 1 − exp(−eᶻ) (Weibull: shape k = 1/b, scale c = eᵘ).
 * The folded normal is not of that form: location and scale are the μ ≥ 0 and σ of the normal Y whose
 * absolute value is read ({@link FoldedNormal} does its arithmetic).
 *
 * <p>A threshold θ (the declared one of a {@link ShapeFamily#LOGNORMAL3} or {@link ShapeFamily#WEIBULL3} shape)
 * shifts the lognormal or Weibull: F(x) = G((ln(x − θ) − u)/b), quantiles θ + e^(u + b·zₚ). The location, scale
 * and {@link #family()} are those of x − θ; θ = 0 is the two-parameter model.
 *
 * @param family    the model (of x − θ: lognormal or Weibull when there is a threshold)
 * @param location  u: μ (normal), μ of ln x (lognormal), ln c (Weibull), μ of Y (folded normal)
 * @param scale     b &gt; 0: σ (normal), σ of ln x (lognormal), 1/k (Weibull), σ of Y (folded normal)
 * @param threshold θ, the declared threshold; 0 for the two-parameter models and always 0 for the normal and
 *                  folded normal
 */
public record ShapeFit(ShapeFamily family, double location, double scale, double threshold) {

    private static final NormalDistribution STANDARD = NormalDistribution.of(0, 1);
    private static final double MAX_SCORE = 40;

    /** @throws IllegalArgumentException if the location is not finite or the scale not positive and finite */
    public ShapeFit {
        if (!Double.isFinite(location) || !(scale > 0) || !Double.isFinite(scale)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "no such fit: location %s, scale %s", location, scale));
        }
        if (!Double.isFinite(threshold) || (threshold != 0 && family != ShapeFamily.LOGNORMAL && family != ShapeFamily.WEIBULL)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "no threshold %s for the %s model", threshold, family.token()));
        }
    }

    /** A fit without a threshold (θ = 0). */
    public ShapeFit(ShapeFamily family, double location, double scale) {
        this(family, location, scale, 0);
    }

    /** The same fit of x − θ with the threshold θ: the three-parameter model. */
    public ShapeFit withThreshold(double theta) {
        return new ShapeFit(family, location, scale, theta);
    }

    /** The smallest value the model allows on the readings' scale: θ plus the family's bound. */
    public double lowerBound() {
        return family.lowerBound() + threshold;
    }

    /** Quantile of the standard member: Φ⁻¹(p), or ln(−ln(1 − p)) for the smallest extreme value. */
    public static double standardQuantile(ShapeFamily family, double p) {
        return family == ShapeFamily.WEIBULL ? Math.log(-Math.log1p(-p)) : STANDARD.inverseCumulativeProbability(p);
    }

    /** Distribution function of the standard member. */
    public static double standardCdf(ShapeFamily family, double z) {
        return family == ShapeFamily.WEIBULL ? -Math.expm1(-Math.exp(z)) : STANDARD.cumulativeProbability(z);
    }

    /** Upper tail 1 − G(z) of the standard member, accurate far out. */
    public static double standardSurvival(ShapeFamily family, double z) {
        return family == ShapeFamily.WEIBULL ? Math.exp(-Math.exp(z)) : STANDARD.survivalProbability(z);
    }

    /** y = g(x): x itself for the normal, ln x otherwise (NaN for x ≤ 0). */
    public static double toScale(ShapeFamily family, double x) {
        if (family.isNormal()) {
            return x;
        }
        return x > 0 ? Math.log(x) : Double.NaN;
    }

    /** x = g⁻¹(y). */
    public static double fromScale(ShapeFamily family, double y) {
        return family.isNormal() ? y : Math.exp(y);
    }

    /** The p-quantile on the readings' scale. */
    public double quantile(double p) {
        if (family == ShapeFamily.FOLDED_NORMAL) {
            return FoldedNormal.quantile(location, scale, p);
        }
        return threshold + fromScale(family, location + scale * standardQuantile(family, p));
    }

    /** F(x); 0 at or below the model's lower bound. */
    public double cdf(double x) {
        if (family == ShapeFamily.FOLDED_NORMAL) {
            return FoldedNormal.cdf(location, scale, x);
        }
        if (x <= lowerBound()) {
            return 0;
        }
        return standardCdf(family, (toScale(family, x - threshold) - location) / scale);
    }

    /** 1 − F(x), accurate far in the upper tail. */
    public double survival(double x) {
        if (family == ShapeFamily.FOLDED_NORMAL) {
            return FoldedNormal.survival(location, scale, x);
        }
        if (x <= lowerBound()) {
            return 1;
        }
        return standardSurvival(family, (toScale(family, x - threshold) - location) / scale);
    }

    /** ln f(x), the log-density on the readings' scale (Jacobian of y = ln x included); −∞ outside the support. */
    public double logDensity(double x) {
        if (family == ShapeFamily.FOLDED_NORMAL) {
            return FoldedNormal.logDensity(location, scale, x);
        }
        if (x <= lowerBound()) {
            return Double.NEGATIVE_INFINITY;
        }
        double z = (toScale(family, x - threshold) - location) / scale;
        double logG = family == ShapeFamily.WEIBULL ? z - Math.exp(z) : -0.5 * z * z - 0.5 * Math.log(2 * Math.PI);
        return logG - Math.log(scale) - (family.isNormal() ? 0 : Math.log(x - threshold));
    }

    /** Φ⁻¹(F(x)): the reading on the normal scale under this model (ln x standardised for the lognormal). */
    public double normalScore(double x) {
        if (family == ShapeFamily.FOLDED_NORMAL) {
            double upper = FoldedNormal.survival(location, scale, x);
            double score = upper > 0.5 ? STANDARD.inverseCumulativeProbability(FoldedNormal.cdf(location, scale, x))
                    : -STANDARD.inverseCumulativeProbability(upper);
            return Math.max(-MAX_SCORE, Math.min(MAX_SCORE, score));
        }
        if (family != ShapeFamily.WEIBULL) {
            return (toScale(family, x - threshold) - location) / scale;
        }
        double z = (toScale(family, x - threshold) - location) / scale;
        // Φ⁻¹ of a lower tail that may underflow: use the upper tail where it is the smaller one
        double lowerTail = -Math.expm1(-Math.exp(z));
        double score = lowerTail < 0.5 ? STANDARD.inverseCumulativeProbability(lowerTail)
                : -STANDARD.inverseCumulativeProbability(Math.exp(-Math.exp(z)));
        // a tail probability that underflows gives ±∞: keep the score finite and in order (|z| ≤ 40)
        return Math.max(-MAX_SCORE, Math.min(MAX_SCORE, score));
    }

    /** The first parameter as usually quoted: μ (normal, lognormal) or the Weibull shape k = 1/b. */
    public double first() {
        return family == ShapeFamily.WEIBULL ? 1 / scale : location;
    }

    /** The second parameter as usually quoted: σ (normal, lognormal) or the Weibull scale c = eᵘ. */
    public double second() {
        return family == ShapeFamily.WEIBULL ? Math.exp(location) : scale;
    }

    /** "mu = …, sigma = …" in the words of the family, with ", threshold = θ" for a three-parameter fit. */
    public String describe() {
        // seven significant digits: a declared threshold shows as typed, one fitted within a floor's set not to 1e-12
        String theta = java.math.BigDecimal.valueOf(threshold).round(new java.math.MathContext(7)).stripTrailingZeros()
                .toPlainString();
        return threshold == 0 ? describeTwo() : describeTwo() + ", threshold = " + theta;
    }

    private String describeTwo() {
        switch (family) {
            case LOGNORMAL:
                return String.format(Locale.ROOT, threshold == 0 ? "mu = %.4g, sigma = %.4g of ln x" : "mu = %.4g, sigma = %.4g of ln(x - threshold)", location, scale);
            case WEIBULL:
                return String.format(Locale.ROOT, "shape = %.4g, scale = %.4g", first(), second());
            case FOLDED_NORMAL:
                return String.format(Locale.ROOT, "mu = %.4g, sigma = %.4g of the unfolded normal", location, scale);
            default:
                return String.format(Locale.ROOT, "mean = %.6g, sigma = %.4g", location, scale);
        }
    }
}
