package dev.proofrun.cli;

import picocli.CommandLine.Option;

/**
 * The gauge's resolution and standard deviation, as {@code size} and {@code plan new} declare them (a picocli
 * mixin). Both commands warn about a resolution coarser than a tenth of the tolerance with the same words
 * ({@link GaugeCheck}); what each does with the standard deviation its own help says.
 */
final class GaugeOptions {

    @Option(names = "--resolution", paramLabel = "R", description = "Gauge resolution; warned above a tenth of the tolerance.")
    Double resolution;

    @Option(names = "--gauge-sd", paramLabel = "SD", description = "Gauge standard deviation, if known.")
    Double gaugeSd;
}
