package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.DemoPlan;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What the command line says when the command line itself, or the file it is given, is wrong. */
class CommandLineWordsTest {

    @TempDir
    Path tmp;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    @Test
    void aMisspeltOptionIsNamedAloneWithItsLikelySpelling() {
        assertEquals(2, run("grade", "--reprot", "x.pdf", "plan.json", "returned.csv"));
        String[] lines = err.toString().split("\\R");
        assertEquals("proofrun grade: unknown option '--reprot' (did you mean --report or --require-demonstrated?)",
                lines[0]);
        assertEquals("See 'proofrun grade --help'.", lines[1]);
        assertFalse(err.toString().contains("returned.csv"), "the positional file is not called unknown");
    }

    @Test
    void aMisspeltCommandIsNamedWithItsLikelySpelling() {
        assertEquals(2, run("sizee"));
        assertTrue(err.toString().startsWith("proofrun: unknown command 'sizee' (did you mean size"), err.toString());
    }

    @Test
    void aBinaryFileGivenAsReadingsSaysItIsNotText() throws IOException {
        Path bin = tmp.resolve("scan.csv");
        Files.write(bin, new byte[] {'%', 'P', 'D', 'F', '-', '1', '.', '7', '\n', 0, 1, 2, 3});
        assertEquals(2, run("estimate", bin.toString(), "--usl", "1"));
        assertEquals("proofrun: " + bin + ": not a text file (binary content at byte 10): give the CSV file, or an "
                + ".xlsx file where one is accepted", err.toString().strip());
        assertFalse(err.toString().contains("Input length"), err.toString());
    }

    @Test
    void aBinaryFileGivenToGradeSaysItIsNotText() throws IOException {
        assertEquals(0, run("demo", "--out", tmp.toString()), err.toString());
        Path bin = tmp.resolve("photo.csv");
        Files.write(bin, new byte[] {(byte) 0xff, (byte) 0xd8, (byte) 0xff, (byte) 0xe0, 0, 16, 'J', 'F', 'I', 'F'});
        err.getBuffer().setLength(0);
        assertEquals(2, run("grade", tmp.resolve(DemoPlan.FILE_NAME).toString(), bin.toString()));
        assertTrue(err.toString().contains(bin + ": not a text file"), err.toString());
    }
}
