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
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code proofrun grade ... --report FILE.pdf} writes the report, on the demo's two-command loop. */
class GradeReportCommandTest {

    @TempDir
    Path tmp;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    @Test
    void theDemoGradesIntoAReport() throws IOException {
        assertEquals(0, run("demo", "--out", tmp.toString()), err.toString());
        Path plan = tmp.resolve(DemoPlan.FILE_NAME);
        Path data = tmp.resolve(DemoCommand.RETURNED);
        Path pdf = tmp.resolve("grade.pdf");
        assertEquals(0, run("grade", plan.toString(), data.toString(), "--report", pdf.toString()), err.toString());
        assertFalse(err.toString().contains("not available"), err.toString());
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
            assertTrue(out.toString().contains("Wrote the grade report " + pdf), out.toString());
            assertTrue(doc.getNumberOfPages() >= 1 + DemoPlan.create().characteristics().size());
        }
    }

    @Test
    void aReportThatCannotBeWrittenIsOneLineAndExitTwo() throws IOException {
        assertEquals(0, run("demo", "--out", tmp.toString()), err.toString());
        Path plan = tmp.resolve(DemoPlan.FILE_NAME);
        Path data = tmp.resolve(DemoCommand.RETURNED);
        Path pdf = tmp.resolve("no-such-dir").resolve("grade.pdf");
        assertEquals(2, run("grade", plan.toString(), data.toString(), "--report", pdf.toString()));
        assertTrue(err.toString().contains("the folder " + tmp.resolve("no-such-dir") + " does not exist"), err.toString());
        assertFalse(err.toString().contains(".tmp"), "no temporary file's name");
        assertFalse(err.toString().contains("Exception"), err.toString());
    }

    @Test
    void paperLetterGivesLetterPagesAndAnUnknownPaperWritesNothing() throws IOException {
        assertEquals(0, run("demo", "--out", tmp.toString()), err.toString());
        Path plan = tmp.resolve(DemoPlan.FILE_NAME);
        Path data = tmp.resolve(DemoCommand.RETURNED);
        Path letter = tmp.resolve("letter.pdf");
        Path a4 = tmp.resolve("a4.pdf");
        assertEquals(0, run("grade", plan.toString(), data.toString(), "--report", letter.toString(), "--paper", "letter"),
                err.toString());
        assertEquals(0, run("grade", plan.toString(), data.toString(), "--report", a4.toString()), err.toString());
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
        out.getBuffer().setLength(0);
        err.getBuffer().setLength(0);
        assertEquals(2, run("grade", plan.toString(), data.toString(), "--report", a3.toString(), "--paper", "a3"));
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertTrue(err.toString().contains("a3"), err.toString());
        assertEquals("", out.toString(), "no partial output");
        assertFalse(Files.exists(a3));
    }
}
