package dev.proofrun.stats;

import java.util.Locale;

/**
 * The two ranges of a confidence 1 − α, each checked here and nowhere else.
 *
 * <ul>
 * <li><b>Stated</b>, (0.5, 0.9999): what a person or a plan may ask for — a requirement's confidence, the
 *     {@code --confidence} of a command. Above 0.9999 the bounds of a study of ordinary size say nothing useful.</li>
 * <li><b>Computable</b>, (0.5, 1): what a bound may be computed at. A staged study compares each look's bound at a
 *     confidence above the stated one (the spending function's share of α), which can exceed 0.9999.</li>
 * </ul>
 * Both ends are excluded: at 0.5 a lower bound is the estimate's median, at 1 it does not exist.
 */
public final class Confidence {

    /** Lowest stated or computable confidence (exclusive). */
    public static final double MIN = 0.5;
    /** Highest stated confidence (exclusive). */
    public static final double MAX_STATED = 0.9999;

    private Confidence() {
    }

    /** Whether a person or plan may state this confidence: strictly between {@value #MIN} and {@value #MAX_STATED}. */
    public static boolean isStatable(double confidence) {
        return confidence > MIN && confidence < MAX_STATED;
    }

    /** Whether a bound can be computed at this confidence: strictly between {@value #MIN} and 1. */
    public static boolean isComputable(double confidence) {
        return confidence > MIN && confidence < 1;
    }

    /**
     * @return the confidence, when {@link #isStatable}
     * @throws IllegalArgumentException otherwise, naming the value
     */
    public static double requireStatable(double confidence) {
        if (!isStatable(confidence)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "confidence must be between 0.5 and 0.9999: %s", confidence));
        }
        return confidence;
    }

    /**
     * @return the confidence, when {@link #isComputable}
     * @throws IllegalArgumentException otherwise, naming the value
     */
    public static double requireComputable(double confidence) {
        if (!isComputable(confidence)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "confidence must be in (0.5, 1): %s", confidence));
        }
        return confidence;
    }
}
