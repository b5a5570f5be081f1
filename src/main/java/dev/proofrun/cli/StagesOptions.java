package dev.proofrun.cli;

import dev.proofrun.design.Spending;
import picocli.CommandLine.Option;

/**
 * {@code --stages} and {@code --spending}, as {@code size} and {@code plan new} declare them (a picocli mixin).
 * Each command checks them with its own words: {@code plan new} refuses a spending given for one stage,
 * {@code size} ignores it; an absent spending means {@link Spending#byDefault()}.
 */
final class StagesOptions {

    @Option(names = "--stages", defaultValue = "1", paramLabel = "S",
            description = "Planned looks: 1 (default, one grade at the end) to 4; the study may stop at a look when the"
                    + " answer is clear (the staged design of the chosen subgroup size is simulated: some seconds).")
    int stages;

    @Option(names = "--spending", paramLabel = "kim-demets-2|obrien-fleming|pocock",
            description = "How a staged study spends its false-pass risk across the looks (default "
                    + Spending.DEFAULT_TOKEN + ").")
    String spending;
}
