package dev.proofrun.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Grader;
import dev.proofrun.grade.GradingPlan;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.SimulatedReturn;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import dev.proofrun.stats.Nonconforming;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report as evidence: stamp, file name, words, sign-off, the nonconforming sentence, histogram bins. */
class ReportPiecesTest {

    @TempDir
    Path dir;

    @Test
    void everyPageCarriesTheStampAndNoFolderOfTheGradingMachine() throws IOException {
        StudyPlan plan = DemoPlan.create();
        GradingPlan gp = GradingPlans.of(plan);
        Path returned = DemoReturns.write(gp, dir.resolve("returned.csv"), 11L, SimulatedReturn.Process.skewed(0.35, 0.2),
                SimulatedReturn.Process.stable(6.0, 0.2));
        // the grade keeps the name as the user typed it: here the full path
        GradeResult result = Grader.grade(gp, returned, returned.toAbsolutePath().toString());
        ReportStamp stamp = new ReportStamp(OffsetDateTime.of(2027, 4, 2, 14, 7, 0, 0, ZoneOffset.ofHours(2)), "9.8.7");
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        GradeReport.write(result, plan, Paper.A4, stamp, out);
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            for (int p = 1; p <= doc.getNumberOfPages(); p++) {
                PDFTextStripper s = new PDFTextStripper();
                s.setStartPage(p);
                s.setEndPage(p);
                String page = s.getText(doc).replaceAll("\\s+", " ");
                assertTrue(page.contains("Graded 2027-04-02 14:07 +02:00, proofrun 9.8.7"), "stamp on page " + p);
                assertTrue(page.contains(", revision 1 (" + plan.revision().orElseThrow() + ")"), "revision on page " + p);
                assertTrue(page.contains("returned file returned.csv"), "file name on page " + p);
                assertFalse(page.contains(dir.toString()), "no folder on page " + p);
                assertTrue(page.contains("Part verdict: " + result.verdict().words() + "."), "verdict on page " + p);
            }
            String all = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(all.contains("Sign-off Name Date Signature Prepared by Reviewed by"), "block to sign");
            for (Verdict v : Verdict.values()) {
                assertFalse(all.contains(" " + v.token() + " ") && v.token().contains("-"), "token " + v.token());
            }
            CharacteristicGrade d1 = result.characteristics().get(0);
            double bound = Nonconforming.upperPpm(d1.judged().index(), d1.limits(), d1.judged().lower()).getAsDouble();
            assertTrue(all.contains("Nonconforming parts: at most " + ReportNumbers.ppm(bound) + " ppm outside the tolerance at 95 % "
                    + "confidence (from the lower bound of Cpk under the normal model); counted 0 of 125 readings"), all);
            assertFalse(all.contains("expected overall"), "no observed/within/overall triple");
        }
    }

    @Test
    void theReturnedFileIsNamedWithoutItsFolders() {
        assertEquals("r.csv", ReportNumbers.fileName("/home/someone/work/r.csv"));
        assertEquals("r.csv", ReportNumbers.fileName("C:\\Users\\someone\\r.csv"));
        assertEquals("r.csv", ReportNumbers.fileName("r.csv"));
    }

    /**
     * Readings on a 0.0005 grid from 21.9950 to 22.0070 (25 grid values), 125 of them: ⌈√125⌉ = 12 bins wanted,
     * so m = ⌈25/12⌉ = 3 steps a bin and ⌈25/3⌉ = 9 bins, the first edge half a step below the smallest reading.
     * Every grid value then lies 0.5, 1.5 or 2.5 steps into its bin, never on an edge.
     */
    @Test
    void histogramBinsAreWholeGaugeSteps() {
        Histogram.Bins b = HistogramBlock.bins(21.9950, 22.0070, 125, 0.0005);
        assertEquals(3, b.steps());
        assertEquals(9, b.count());
        assertEquals(0.0015, b.width(), 1e-12);
        assertEquals(21.99475, b.start(), 1e-12);
        for (int j = 0; j < 25; j++) {
            double x = 21.9950 + j * 0.0005;
            double pos = (x - b.start()) / b.width();
            double frac = pos - Math.floor(pos);
            assertTrue(frac > 0.1 && frac < 0.9, "grid value " + j + " sits inside its bin: " + frac);
            assertTrue(Math.floor(pos) < b.count(), "grid value " + j + " has a bin");
        }
        Histogram.Bins plain = HistogramBlock.bins(0, 1, 100, Double.NaN);
        assertEquals(10, plain.count());
        assertEquals(0, plain.steps());
    }
}
