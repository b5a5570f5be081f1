package dev.proofrun.cli;

import dev.proofrun.stats.SpecLimits;
import picocli.CommandLine.Option;

/**
 * {@code --lsl} and {@code --usl} as {@code estimate}, {@code size} and {@code plan new} declare them (a picocli
 * mixin), read with {@link OptionValues#limits}.
 */
final class SpecLimitOptions {

    @Option(names = "--lsl", paramLabel = "X", description = "Lower specification limit.")
    Double lsl;

    @Option(names = "--usl", paramLabel = "X", description = "Upper specification limit.")
    Double usl;

    /** Whether either limit was given. */
    boolean given() {
        return lsl != null || usl != null;
    }

    /** @throws dev.proofrun.text.UserException as {@link OptionValues#limits} */
    SpecLimits limits() {
        return OptionValues.limits(lsl, usl);
    }
}
