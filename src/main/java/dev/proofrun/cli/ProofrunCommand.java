package dev.proofrun.cli;

import dev.proofrun.text.DecimalMark;
import dev.proofrun.text.Decimals;
import dev.proofrun.text.Shown;
import dev.proofrun.text.UserException;
import java.io.PrintWriter;
import java.util.List;
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
                + "Run without arguments to open the wizard.")
public final class ProofrunCommand implements Runnable {

    /**
     * The subcommands, in the order of the usage. Registered here rather than in {@code @Command} so that a
     * run of one named job builds only that job's model (picocli reads every subcommand's annotations when
     * it is added: about 0.1 s on a cold JVM, a twentieth of grading a million readings).
     */
    private static final List<Class<?>> SUBCOMMANDS = List.of(
            CommandLine.HelpCommand.class,
            SizeCommand.class,
            PlanCommand.class,
            SheetCommand.class,
            EstimateCommand.class,
            GradeCommand.class,
            DemoCommand.class);

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
        CommandLine cl = commandLine(args);
        cl.setOut(out);
        cl.setErr(err);
        return cl.execute(args);
    }

    /** The configured picocli command line: user errors become one line and exit code 2. */
    public static CommandLine commandLine() {
        return configured(SUBCOMMANDS);
    }

    /**
     * The command line for these arguments: when the first names a job (not {@code help}, which names the
     * others), only that job is registered; it parses, helps and refuses exactly as in the full command
     * line (ProofrunCommandTest compares both).
     */
    static CommandLine commandLine(String... args) {
        if (args.length > 0 && !"help".equals(args[0])) {
            for (Class<?> c : SUBCOMMANDS) {
                if (c != CommandLine.HelpCommand.class && c.getAnnotation(Command.class).name().equals(args[0])) {
                    return configured(List.of(c));
                }
            }
        }
        return commandLine();
    }

    /**
     * A command line picocli could not parse, said in one line or two. For a misspelt option only the option
     * is named, with the likely spellings: picocli also reports the argument the misspelt option left over
     * (its value is taken as the first file, so the last file seems one too many), which sends people looking
     * at a file that is fine.
     */
    private static int refuseArguments(CommandLine.ParameterException ex, String[] args) {
        CommandLine line = ex.getCommandLine();
        PrintWriter err = line.getErr();
        String message = ex.getMessage();
        if (ex instanceof CommandLine.UnmatchedArgumentException u) {
            List<String> options = u.getUnmatched().stream().filter(a -> a.startsWith("-")).toList();
            if (!options.isEmpty()) {
                message = (options.size() == 1 ? "unknown option " : "unknown options ")
                        + String.join(", ", options.stream().map(o -> "'" + o + "'").toList());
                List<String> near = u.getSuggestions();
                if (!near.isEmpty()) {
                    message += " (did you mean " + String.join(" or ", near.subList(0, Math.min(3, near.size())))
                            + "?)";
                }
            } else if (line.getParent() == null && !u.getSuggestions().isEmpty()) {
                message = "unknown command '" + u.getUnmatched().get(0) + "' (did you mean "
                        + String.join(" or ", u.getSuggestions()) + "?)";
            }
        }
        String name = line.getCommandSpec().qualifiedName();
        err.println(name + ": " + message);
        err.println("See '" + name + " --help'.");
        err.flush();
        return EXIT_INPUT;
    }

    /**
     * A number in an option value, by the one number rule with a decimal point ({@link DecimalMark#POINT}): no
     * {@code 0x1p3} or {@code 1.5d}, which Java's own parser would take. A number that overflows, and a name of a
     * value that is not finite ({@code Infinity}, {@code NaN}, {@link Decimals#namesNonFinite}), come back as that
     * value, so the option's own check says "must be a finite number".
     */
    static Double optionNumber(String text) {
        String t = text.trim();
        if (Decimals.namesNonFinite(t)) {
            boolean nan = t.replace("+", "").replace("-", "").equalsIgnoreCase("nan");
            return nan ? Double.NaN : t.startsWith("-") ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
        }
        double v = DecimalMark.POINT.parse(t);
        if (Double.isNaN(v)) {
            throw new CommandLine.TypeConversionException("'" + Shown.cell(text) + "' is not a number"
                    + (DecimalMark.POINT.otherMarkIn(t) ? " (use a decimal point: " + t.replace(',', '.') + ")" : ""));
        }
        return v;
    }

    private static CommandLine configured(List<Class<?>> subcommands) {
        CommandLine cl = new CommandLine(new ProofrunCommand());
        for (Class<?> c : subcommands) {
            cl.addSubcommand(c);
        }
        // after the subcommands: picocli hands a converter to the commands present when it is registered
        cl.registerConverter(Double.class, ProofrunCommand::optionNumber);
        cl.registerConverter(Double.TYPE, ProofrunCommand::optionNumber);
        cl.setParameterExceptionHandler(ProofrunCommand::refuseArguments);
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
