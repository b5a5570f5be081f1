package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.DemoPlan;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What the command line says when the command line itself, or the file it is given, is wrong. */
class CommandLineWordsTest {

    @TempDir
    Path tmp;

    @Test
    void aMisspeltOptionIsNamedAloneWithItsLikelySpelling() {
        CommandRun r = run("grade", "--reprot", "x.pdf", "plan.json", "returned.csv");
        assertEquals(2, r.code());
        String[] lines = r.err().split("\\R");
        assertEquals("proofrun grade: unknown option '--reprot' (did you mean --report or --require-demonstrated?)",
                lines[0]);
        assertEquals("See 'proofrun grade --help'.", lines[1]);
        assertFalse(r.err().contains("returned.csv"), "the positional file is not called unknown");
    }

    @Test
    void aMisspeltCommandIsNamedWithItsLikelySpelling() {
        CommandRun r = run("sizee");
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("proofrun: unknown command 'sizee' (did you mean size"), r.err());
    }

    @Test
    void aBinaryFileGivenAsReadingsSaysItIsNotText() throws IOException {
        Path bin = tmp.resolve("scan.csv");
        Files.write(bin, new byte[] {'%', 'P', 'D', 'F', '-', '1', '.', '7', '\n', 0, 1, 2, 3});
        CommandRun r = run("estimate", bin.toString(), "--usl", "1");
        assertEquals(2, r.code());
        assertEquals("proofrun: " + bin + ": not a text file (binary content at byte 10): give the CSV file, or an "
                + ".xlsx file where one is accepted", r.err().strip());
        assertFalse(r.err().contains("Input length"), r.err());
    }

    @Test
    void aBinaryFileGivenToGradeSaysItIsNotText() throws IOException {
        CommandRun demo = run("demo", "--out", tmp.toString());
        assertEquals(0, demo.code(), demo.err());
        Path bin = tmp.resolve("photo.csv");
        Files.write(bin, new byte[] {(byte) 0xff, (byte) 0xd8, (byte) 0xff, (byte) 0xe0, 0, 16, 'J', 'F', 'I', 'F'});
        CommandRun r = run("grade", tmp.resolve(DemoPlan.FILE_NAME).toString(), bin.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains(bin + ": not a text file"), r.err());
    }
}
