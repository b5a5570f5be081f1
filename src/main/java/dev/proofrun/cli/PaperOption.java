package dev.proofrun.cli;

import picocli.CommandLine.Option;

/** {@code --paper}, as {@code sheet} and {@code grade} declare it (a picocli mixin), read by {@code Paper.of}. */
final class PaperOption {

    @Option(names = "--paper", paramLabel = "a4|letter", defaultValue = "a4",
            description = "Paper size of the PDF (default: ${DEFAULT-VALUE}).")
    String paper;
}
