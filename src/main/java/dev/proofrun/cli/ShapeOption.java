package dev.proofrun.cli;

import picocli.CommandLine.Option;

/**
 * {@code --shape}, the distribution the readings are planned to follow, as {@code size} and {@code plan new}
 * declare it (a picocli mixin), read by {@link OptionValues#shape}. What a skewed shape needs besides is said at
 * the options that give it: {@code size --skewness}, {@code plan new --threshold} and {@code --floor}.
 */
final class ShapeOption {

    @Option(names = "--shape", paramLabel = "NAME",
            description = "The distribution the readings are planned to follow, one of normal (default), lognormal,"
                    + " weibull, folded-normal, lognormal3 or weibull3.")
    String shape;
}
