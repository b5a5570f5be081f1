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
}
