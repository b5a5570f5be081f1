package dev.proofrun.cli;

/**
 * The command line run several times in one test, keeping only the last run: for tests that run a command and then
 * check what that one run printed. Each run starts with empty writers (see {@link CommandRun}).
 */
final class LastRun {

    private CommandRun last;

    /** Runs {@code proofrun ARGS}, keeps what it printed and returns its exit code. */
    int run(String... args) {
        last = CommandRun.run(args);
        return last.code();
    }

    /** What the last run printed to standard output. */
    String out() {
        return last.out();
    }

    /** What the last run printed to standard error. */
    String err() {
        return last.err();
    }
}
