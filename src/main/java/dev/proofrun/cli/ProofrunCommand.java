package dev.proofrun.cli;

import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The top of the command line. Each job is a subcommand in its own class in this package; add it to
 * {@code subcommands} below. Exit codes: 0 done, 1 a verdict the caller asked to fail on, 2 unusable input
 * or a refused request (one line on standard error, never a stack trace).
 */
@Command(name = "proofrun",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Plan, schedule, issue and grade process-capability studies.%n"
                + "Run without arguments to open the wizard.",
        subcommands = {
            CommandLine.HelpCommand.class,
            SizeCommand.class,
            PlanCommand.class,
            SheetCommand.class,
            EstimateCommand.class,
            GradeCommand.class,
            DemoCommand.class,
        })
public final class ProofrunCommand implements Runnable {

    /** Exit code for unusable input or a refused request. */
    public static final int EXIT_INPUT = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Runs the command line with the process's standard streams. */
    public static int run(String... args) {
        return run(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args);
    }

    /** Runs the command line with the given streams (tests use this). */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        CommandLine cl = commandLine();
        cl.setOut(out);
        cl.setErr(err);
        return cl.execute(args);
    }

    /** The configured picocli command line: user errors become one line and exit code 2. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new ProofrunCommand());
        cl.setExecutionExceptionHandler((ex, line, parseResult) -> {
            Throwable cause = ex;
            if (cause instanceof UserException || cause instanceof IllegalArgumentException) {
                line.getErr().println("proofrun: " + cause.getMessage());
                line.getErr().flush();
                return EXIT_INPUT;
            }
            throw ex;
        });
        return cl;
    }
}
