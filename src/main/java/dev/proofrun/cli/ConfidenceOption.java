package dev.proofrun.cli;

import picocli.CommandLine.Option;

/**
 * {@code --confidence}, the confidence of the lower bounds, as {@code estimate} declares it and as
 * {@link StudyGoalOptions} carries it for {@code size} and {@code plan new} (a picocli mixin). Checked by
 * {@link OptionValues#confidence}.
 */
final class ConfidenceOption {

    @Option(names = "--confidence", defaultValue = "0.95", description = "Confidence of the lower bounds (default ${DEFAULT-VALUE}).")
    double confidence;
}
