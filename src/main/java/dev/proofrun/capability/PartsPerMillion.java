package dev.proofrun.capability;

/**
 * Nonconforming parts: expected under a normal model with σ_w (within) and with s (overall), and
 * observed among the readings (strictly outside a limit).
 *
 * @param within          expected ppm with mean x̄ and σ_w
 * @param overall         expected ppm with mean x̄ and s
 * @param observedOutside readings outside the tolerance
 * @param readings        all readings N
 */
public record PartsPerMillion(double within, double overall, long observedOutside, long readings) {

    /** Observed ppm: 10⁶ · observedOutside / N. */
    public double observed() {
        return 1e6 * observedOutside / readings;
    }
}
