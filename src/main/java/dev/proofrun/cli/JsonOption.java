package dev.proofrun.cli;

import picocli.CommandLine.Option;

/** {@code --json}, as {@code estimate}, {@code size} and {@code grade} declare it (a picocli mixin). */
final class JsonOption {

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;
}
