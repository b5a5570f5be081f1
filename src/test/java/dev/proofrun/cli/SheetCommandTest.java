package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.PlanFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code proofrun sheet}: three files and their paths, or one line and exit 2 with nothing written. */
class SheetCommandTest {

    @TempDir
    Path tmp;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    @Test
    void writesTheThreeFilesAndPrintsTheirPaths() throws IOException {
        Path plan = tmp.resolve("plan.json");
        PlanFiles.write(plan, DemoPlan.create());
        Path dir = tmp.resolve("out");
        assertEquals(0, run("sheet", plan.toString(), "--out", dir.toString(), "--paper", "letter"), err.toString());
        List<String> lines = out.toString().lines().toList();
        assertEquals(List.of(dir.resolve("PR-2027-0311-sheet.pdf").toString(),
                dir.resolve("PR-2027-0311-fill-in.csv").toString(),
                dir.resolve("PR-2027-0311-fill-in.xlsx").toString()), lines);
        for (String line : lines) {
            assertTrue(Files.size(Path.of(line)) > 0, line);
        }
        assertEquals(3, listing(dir).size(), "no temporary files left");
    }

    @Test
    void aDraftIsRefusedWithoutTheFlagAndMarkedWithIt() throws IOException {
        Path plan = tmp.resolve("draft.json");
        PlanFiles.write(plan, DemoPlan.draft());
        Path dir = tmp.resolve("out");
        assertEquals(2, run("sheet", plan.toString(), "--out", dir.toString()));
        assertTrue(err.toString().contains("is a draft"), err.toString());
        assertEquals(1, err.toString().lines().count(), "one line");
        assertFalse(err.toString().contains("Exception"));
        assertFalse(Files.exists(dir) && !listing(dir).isEmpty(), "nothing written");

        assertEquals(0, run("sheet", plan.toString(), "--out", dir.toString(), "--draft"), err.toString());
        assertEquals(3, listing(dir).size());
    }

    @Test
    void badInputIsOneLineAndExitTwoWithNoFiles() throws IOException {
        Path plan = tmp.resolve("plan.json");
        PlanFiles.write(plan, DemoPlan.create());
        Path dir = tmp.resolve("out");
        assertEquals(2, run("sheet", plan.toString(), "--out", dir.toString(), "--paper", "a3"));
        assertTrue(err.toString().contains("a3"), err.toString());
        assertEquals(2, run("sheet", tmp.resolve("missing.json").toString(), "--out", dir.toString()));
        Path broken = tmp.resolve("broken.json");
        Files.writeString(broken, "{\"format\": \"proofrun-plan\", ");
        assertEquals(2, run("sheet", broken.toString(), "--out", dir.toString()));
        Path file = tmp.resolve("a-file");
        Files.writeString(file, "x");
        assertEquals(2, run("sheet", plan.toString(), "--out", file.toString()));
        assertTrue(err.toString().contains("is not a directory"), err.toString());
        assertFalse(err.toString().contains("Exception"), err.toString());
        assertFalse(Files.exists(dir), "nothing written");
        assertEquals("x", Files.readString(file), "the user's file untouched");
    }

    private static List<Path> listing(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.toList();
        }
    }
}
