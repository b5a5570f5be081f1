package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.PlanFiles;
import java.io.IOException;
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

    @Test
    void writesTheThreeFilesAndPrintsTheirPaths() throws IOException {
        Path plan = tmp.resolve("plan.json");
        PlanFiles.write(plan, DemoPlan.create());
        Path dir = tmp.resolve("out");
        CommandRun r = run("sheet", plan.toString(), "--out", dir.toString(), "--paper", "letter");
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
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
        CommandRun refused = run("sheet", plan.toString(), "--out", dir.toString());
        assertEquals(2, refused.code());
        assertTrue(refused.err().contains("is a draft"), refused.err());
        assertEquals(1, refused.err().lines().count(), "one line");
        assertFalse(refused.err().contains("Exception"));
        assertFalse(Files.exists(dir) && !listing(dir).isEmpty(), "nothing written");

        CommandRun marked = run("sheet", plan.toString(), "--out", dir.toString(), "--draft");
        assertEquals(0, marked.code(), marked.err());
        assertEquals(3, listing(dir).size());
    }

    @Test
    void badInputIsOneLineAndExitTwoWithNoFiles() throws IOException {
        Path plan = tmp.resolve("plan.json");
        PlanFiles.write(plan, DemoPlan.create());
        Path dir = tmp.resolve("out");
        Path broken = tmp.resolve("broken.json");
        Files.writeString(broken, "{\"format\": \"proofrun-plan\", ");
        Path file = tmp.resolve("a-file");
        Files.writeString(file, "x");
        CommandRun paper = refused("sheet", plan.toString(), "--out", dir.toString(), "--paper", "a3");
        assertTrue(paper.err().contains("a3"), paper.err());
        refused("sheet", tmp.resolve("missing.json").toString(), "--out", dir.toString());
        refused("sheet", broken.toString(), "--out", dir.toString());
        CommandRun notDir = refused("sheet", plan.toString(), "--out", file.toString());
        assertTrue(notDir.err().contains("is not a directory"), notDir.err());
        assertFalse(Files.exists(dir), "nothing written");
        assertEquals("x", Files.readString(file), "the user's file untouched");
    }

    /** A run that must be refused with exit 2 and no stack trace. */
    private static CommandRun refused(String... args) {
        CommandRun r = run(args);
        assertEquals(2, r.code(), r.out());
        assertFalse(r.err().contains("Exception"), r.err());
        return r;
    }

    private static List<Path> listing(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.toList();
        }
    }
}
