package dev.proofrun.design;

import dev.proofrun.stats.Confidence;
import dev.proofrun.stats.IndexKind;
import java.util.Locale;

/**
 * What the study must show: the lower confidence bound of {@code index} at level {@code confidence}
 * reaches {@code minimum} (for example Cpk ≥ 1.33 with 95 % confidence).
 *
 * @param index      the index the customer asks for
 * @param minimum    c₀, the smallest acceptable value of the index
 * @param confidence 1−α, in (0.5, 0.9999) ({@link Confidence#isStatable})
 */
public record Requirement(IndexKind index, double minimum, double confidence) {

    /**
     * @throws IllegalArgumentException if minimum is not positive and finite
     * @throws IllegalArgumentException if confidence is outside (0.5, 0.9999)
     */
    public Requirement {
        if (index == null) {
            throw new IllegalArgumentException("index is required");
        }
        if (!(minimum > 0) || !Double.isFinite(minimum)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "required minimum must be positive: %s", minimum));
        }
        Confidence.requireStatable(confidence);
    }

    public static Requirement of(IndexKind index, double minimum, double confidence) {
        return new Requirement(index, minimum, confidence);
    }
}
