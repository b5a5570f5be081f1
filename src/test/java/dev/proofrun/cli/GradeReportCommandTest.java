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
            assertTrue(text.contains("Verdict for the part:"), text);
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
        assertTrue(err.toString().contains("could not write the grade report"), err.toString());
        assertFalse(err.toString().contains("Exception"), err.toString());
    }
}
