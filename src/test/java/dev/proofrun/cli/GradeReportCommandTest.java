package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.DemoPlan;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code proofrun grade ... --report FILE.pdf} writes the report, on the demo's two-command loop. */
class GradeReportCommandTest {

    @TempDir
    Path tmp;

    /** The demo's plan and its returned file, as {@code demo --out} writes them before each test. */
    private Path plan;
    private Path data;

    @BeforeEach
    void writeTheDemo() {
        ok("demo", "--out", tmp.toString());
        plan = tmp.resolve(DemoPlan.FILE_NAME);
        data = tmp.resolve(DemoCommand.RETURNED);
    }

    /** Runs a command that must succeed and keeps what it printed. */
    private static CommandRun ok(String... args) {
        CommandRun r = run(args);
        assertEquals(0, r.code(), r.err());
        return r;
    }

    @Test
    void theDemoGradesIntoAReport() throws IOException {
        Path pdf = tmp.resolve("grade.pdf");
        CommandRun graded = ok("grade", plan.toString(), data.toString(), "--report", pdf.toString());
        assertFalse(graded.err().contains("not available"), graded.err());
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(pdf))) {
            String text = new PDFTextStripper().getText(doc);
            assertTrue(text.contains("Not valid for the part"), text);
            PDFTextStripper firstPage = new PDFTextStripper();
            firstPage.setStartPage(1);
            firstPage.setEndPage(1);
            String first = firstPage.getText(doc).replaceAll("\\s+", " ");
            // the demo: R4 inconclusive says in the verdict box how many more subgroups would settle it; F7 is
            // not valid and shows no estimate beside its verdict; every page's foot names the part's verdict
            assertTrue(first.contains("more subgroups"), first);
            assertTrue(first.contains("Not valid F7 seat push-out force (Cpk \u2265 1.33 required; no capability statement)"), first);
            assertTrue(text.contains("Not valid: these figures describe the study's past, not the process."), text);
            assertTrue(text.contains("Part verdict: Not valid. Graded "), text);
            assertFalse(text.contains("not-valid"), "verdicts in words, not tokens");
            // evidence a customer files: the returned file by name only, the tool's version, the plan's revision
            assertFalse(text.contains(tmp.toString()), "no folder of the grading machine in the report");
            assertTrue(text.contains("Returned file: " + DemoCommand.RETURNED + "."), text);
            assertTrue(text.contains("proofrun " + dev.proofrun.text.ProductVersion.get()), text);
            assertTrue(text.contains("revision 1 (" + DemoPlan.create().revision().orElseThrow() + ")"), text);
            assertTrue(text.contains("Prepared by") && text.contains("Reviewed by"), "the block to sign");
            assertTrue(graded.out().contains("Wrote the grade report " + pdf), graded.out());
            assertTrue(doc.getNumberOfPages() >= 1 + DemoPlan.create().characteristics().size());
        }
    }

    @Test
    void aReportThatCannotBeWrittenIsOneLineAndExitTwo() throws IOException {
        Path pdf = tmp.resolve("no-such-dir").resolve("grade.pdf");
        CommandRun r = run("grade", plan.toString(), data.toString(), "--report", pdf.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("the folder " + tmp.resolve("no-such-dir") + " does not exist"), r.err());
        assertFalse(r.err().contains(".tmp"), "no temporary file's name");
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void paperLetterGivesLetterPagesAndAnUnknownPaperWritesNothing() throws IOException {
        Path letter = tmp.resolve("letter.pdf");
        Path a4 = tmp.resolve("a4.pdf");
        ok("grade", plan.toString(), data.toString(), "--report", letter.toString(), "--paper", "letter");
        ok("grade", plan.toString(), data.toString(), "--report", a4.toString());
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(letter))) {
            for (var page : doc.getPages()) {
                // US Letter 8.5 in x 11 in = 612 pt x 792 pt
                assertEquals(612f, page.getMediaBox().getWidth(), 0.01f);
                assertEquals(792f, page.getMediaBox().getHeight(), 0.01f);
            }
        }
        try (PDDocument doc = Loader.loadPDF(Files.readAllBytes(a4))) {
            // ISO 216 A4 210 mm x 297 mm = 595.28 pt x 841.89 pt (the default)
            assertEquals(595.28f, doc.getPage(0).getMediaBox().getWidth(), 0.01f);
            assertEquals(841.89f, doc.getPage(0).getMediaBox().getHeight(), 0.01f);
        }
        Path a3 = tmp.resolve("a3.pdf");
        CommandRun r = run("grade", plan.toString(), data.toString(), "--report", a3.toString(), "--paper", "a3");
        assertEquals(2, r.code());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("a3"), r.err());
        assertEquals("", r.out(), "no partial output");
        assertFalse(Files.exists(a3));
    }
}
