package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class ProofrunCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    @Test
    void versionNamesTheProduct() {
        assertEquals(0, run("--version"));
        assertTrue(out.toString().startsWith("proofrun "), out.toString());
        assertTrue(!out.toString().contains("${"), "version not filtered: " + out);
    }

    @Test
    void unknownOptionIsAUsageErrorWithExitTwo() {
        assertEquals(2, run("--no-such-option"));
        assertTrue(err.toString().contains("no-such-option"), err.toString());
    }

    /** A run that names one job registers only it; what it prints and returns is what the full command line gives. */
    @Test
    void oneJobAloneBehavesAsInTheFullCommandLine() {
        String[][] runs = {{"grade", "--help"}, {"grade"}, {"grade", "--jsn", "a.json", "b.csv"}, {"grade", "a.json", "b.csv", "c"},
            {"grade", "--paper", "a5", "no-plan.json", "no.csv"}, {"grade", "no-plan.json", "no.csv"}, {"size", "--help"},
            {"size", "--bogus"}, {"plan", "--help"}, {"plan", "new", "--help"}, {"plan", "shw"}, {"sheet", "--help"},
            {"estimate", "--help"}, {"demo", "--help"}, {"grade", "-V"}, {"demo", "help"}};
        for (String[] args : runs) {
            assertEquals(ran(ProofrunCommand.commandLine(), args), ran(ProofrunCommand.commandLine(args), args), String.join(" ", args));
        }
        assertEquals(1, ProofrunCommand.commandLine("grade", "x").getSubcommands().size());
        assertEquals(7, ProofrunCommand.commandLine("help", "grade").getSubcommands().size());
        assertEquals(7, ProofrunCommand.commandLine("--version").getSubcommands().size());
    }

    private static String ran(picocli.CommandLine cl, String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        cl.setOut(new PrintWriter(o, true));
        cl.setErr(new PrintWriter(e, true));
        int code = cl.execute(args);
        return code + "\n--out--\n" + o + "\n--err--\n" + e;
    }
}
