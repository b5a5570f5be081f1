package dev.proofrun.control;

import java.util.Locale;
import java.util.Objects;

/**
 * One run rule firing at one point of a chart.
 *
 * @param rule  the rule
 * @param index the 0-based index of the point that completes the pattern
 */
public record RuleFiring(RunRule rule, int index) {

    /** @throws IllegalArgumentException if index &lt; 0 */
    public RuleFiring {
        Objects.requireNonNull(rule, "rule");
        if (index < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "index must not be negative: %d", index));
        }
    }
}
