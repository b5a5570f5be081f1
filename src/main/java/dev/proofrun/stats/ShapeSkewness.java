package dev.proofrun.stats;

import java.util.Locale;
import org.hipparchus.special.Gamma;

/**
 * The skewness of the readings, which fixes the shape parameter of a two-parameter family, and back.
 *
 * <ul>
 * <li>Lognormal with σ of ln x: γ = (e^{σ²} + 2)·√(e^{σ²} − 1) (rising in σ, from 0).</li>
 * <li>Weibull with shape k: γ = (Γ₃ − 3Γ₁Γ₂ + 2Γ₁³)/(Γ₂ − Γ₁²)^{3/2}, Γᵢ = Γ(1 + i/k) (falling in k; zero near
 *     k = 3.6, about −1.1 as k grows).</li>
 * </ul>
 * The inverse is by bisection on σ ∈ [1e−4, 3] or k ∈ [{@value #K_LOW}, {@value ShapeFitter#MAX_WEIBULL_SHAPE}].
 */
public final class ShapeSkewness {

    static final double K_LOW = 0.3;
    static final double SIGMA_LOW = 1e-4;
    static final double SIGMA_HIGH = 3;

    private ShapeSkewness() {
    }

    /** The skewness of the family with this shape parameter (σ of ln x, or the Weibull k). */
    public static double of(ShapeFamily family, double parameter) {
        switch (family) {
            case LOGNORMAL: {
                double w = Math.exp(parameter * parameter);
                return (w + 2) * Math.sqrt(w - 1);
            }
            case WEIBULL: {
                double g1 = Math.exp(Gamma.logGamma(1 + 1 / parameter));
                double g2 = Math.exp(Gamma.logGamma(1 + 2 / parameter));
                double g3 = Math.exp(Gamma.logGamma(1 + 3 / parameter));
                return (g3 - 3 * g1 * g2 + 2 * g1 * g1 * g1) / Math.pow(g2 - g1 * g1, 1.5);
            }
            default:
                return 0;
        }
    }

    /**
     * The shape parameter giving skewness {@code g}.
     *
     * @throws IllegalArgumentException for the normal family, or a skewness the family cannot have in the range
     *                                  searched (the message gives the range)
     */
    public static double parameter(ShapeFamily family, double g) {
        if (family.isNormal()) {
            throw new IllegalArgumentException("the normal shape has no skewness to set");
        }
        double lo = family == ShapeFamily.WEIBULL ? K_LOW : SIGMA_LOW;
        double hi = family == ShapeFamily.WEIBULL ? ShapeFitter.MAX_WEIBULL_SHAPE : SIGMA_HIGH;
        double glo = of(family, lo);
        double ghi = of(family, hi);
        double min = Math.min(glo, ghi);
        double max = Math.max(glo, ghi);
        if (!(g > min && g < max)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "a %s shape has a skewness between %.3g and %.3g: %s", family.token(), min, max, g));
        }
        boolean rising = ghi > glo;
        for (int i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if ((of(family, mid) < g) == rising) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
