package dev.proofrun.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code proofrun plan new|show|issue}: make, look at and issue study plans. */
@Command(name = "plan", mixinStandardHelpOptions = true,
        description = "Make a study plan on a production calendar, show it, issue it.",
        subcommands = {PlanNewCommand.class, PlanShowCommand.class, PlanIssueCommand.class})
public final class PlanCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
