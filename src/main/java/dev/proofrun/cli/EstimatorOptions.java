package dev.proofrun.cli;

import picocli.CommandLine.Option;

/**
 * The within-sigma estimator and the bound method, as {@code estimate} and {@code size} declare them (a picocli
 * mixin), read by {@link OptionValues#sigma} and {@link OptionValues#bound}. Individuals always use the moving
 * range: {@code size} takes it for n = 1 whatever is given, {@code estimate} refuses another estimator for them.
 */
final class EstimatorOptions {

    @Option(names = "--sigma", paramLabel = "rbar|sbar|pooled|mr",
            description = "Within-sigma estimator (default rbar for n <= 10, sbar above or for unequal sizes;"
                    + " individuals use mr).")
    String sigma;

    @Option(names = "--bound", defaultValue = "exact", paramLabel = "exact|bissell",
            description = "Bound for two-sided Cpk/Ppk (default ${DEFAULT-VALUE}); one-sided ones are always exact.")
    String bound;
}
