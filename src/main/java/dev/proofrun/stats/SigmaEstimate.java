package dev.proofrun.stats;

import java.util.Locale;
import java.util.Objects;

/**
 * An estimate of the within-subgroup standard deviation σ_w with the degrees of freedom its bounds use.
 *
 * @param value            σ̂_w, finite and ≥ 0
 * @param method           the estimator that produced it
 * @param degreesOfFreedom ν &gt; 0: exact Σ(nᵢ−1) for {@link SigmaMethod#POOLED}, otherwise the effective
 *                         (usually non-integer) value of {@link WithinSigma#degreesOfFreedom}
 */
public record SigmaEstimate(double value, SigmaMethod method, double degreesOfFreedom) {

    /**
     * @throws IllegalArgumentException if value is negative or not finite
     * @throws IllegalArgumentException if degreesOfFreedom is not positive and finite
     */
    public SigmaEstimate {
        Objects.requireNonNull(method, "method");
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "sigma must be finite and >= 0: %s", value));
        }
        if (!(degreesOfFreedom > 0) || !Double.isFinite(degreesOfFreedom)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "degrees of freedom must be positive and finite: %s", degreesOfFreedom));
        }
    }
}
