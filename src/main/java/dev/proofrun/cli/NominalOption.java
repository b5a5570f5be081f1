package dev.proofrun.cli;

import picocli.CommandLine.Option;

/**
 * {@code --nominal}, as {@code estimate} and {@code plan new} declare it (a picocli mixin): the target of Cpm
 * in both, given now ({@code estimate}) or stored in the plan for the grade ({@code plan new}).
 */
final class NominalOption {

    @Option(names = "--nominal", paramLabel = "X",
            description = "Nominal value, the target of Cpm (default: the midpoint of two-sided limits; none for one-sided).")
    Double nominal;
}
