package dev.proofrun.cli;

import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * What a study is to show and what the process is believed to have, as {@code size} and {@code plan new} declare
 * them (a picocli mixin): the required index and its minimum, the confidence, the expected index (and Cp for an
 * off-centre process) and the wanted power. Each command reads them with {@link OptionValues} and its own rules.
 */
final class StudyGoalOptions {

    @Option(names = "--index", defaultValue = "cpk", paramLabel = "INDEX",
            description = "Required index: cpk, ppk, cp, pp, cpu, cpl, ppu or ppl (default ${DEFAULT-VALUE}).")
    String index;

    @Option(names = "--target", paramLabel = "C0",
            description = "Required minimum of the index (one characteristic; not with --characteristics).")
    Double target;

    @Mixin
    ConfidenceOption level;

    @Option(names = "--expected", paramLabel = "C1", description = "The index the process is believed to have.")
    Double expected;

    @Option(names = "--expected-cp", paramLabel = "CP1",
            description = "The expected Cp (Pp) for a two-sided Cpk/Ppk; without it the process is taken as centred.")
    Double expectedCp;

    @Option(names = "--power", defaultValue = "0.9", description = "Wanted power when the design is solved (default ${DEFAULT-VALUE}).")
    double power;

    /** The confidence of the lower bound. */
    double confidence() {
        return level.confidence;
    }
}
