package dev.proofrun.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/**
 * One run of the real command line in the test's JVM: its exit code and what it printed. The shared fixture of
 * the command tests ({@code import static dev.proofrun.cli.CommandRun.run;}).
 */
record CommandRun(int code, String out, String err) {

    /** Runs {@code proofrun ARGS} and keeps what it printed. */
    static CommandRun run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new CommandRun(code, out.toString(), err.toString());
    }
}
