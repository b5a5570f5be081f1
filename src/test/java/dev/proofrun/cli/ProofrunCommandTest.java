package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class ProofrunCommandTest {

    @Test
    void versionNamesTheProduct() {
        CommandRun r = run("--version");
        assertEquals(0, r.code());
        assertTrue(r.out().startsWith("proofrun "), r.out());
        assertTrue(!r.out().contains("${"), "version not filtered: " + r.out());
    }

    @Test
    void unknownOptionIsAUsageErrorWithExitTwo() {
        CommandRun r = run("--no-such-option");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("no-such-option"), r.err());
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
