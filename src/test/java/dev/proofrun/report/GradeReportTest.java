package dev.proofrun.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Grader;
import dev.proofrun.grade.GradingPlan;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.Reason;
import dev.proofrun.grade.SimulatedReturn;
import dev.proofrun.paper.Ink;
import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The grade report of the demo plan with an invented, seeded return: D1 from a stable process well inside
 * its limits, R4 skewed, F7 with a step in the mean half way (so its verdict is not-valid). The report must
 * name every verdict and reason, in text a reader can extract, and draw its pages.
 */
class GradeReportTest {

    @TempDir
    Path dir;

    @Test
    void theReportStatesVerdictsAndReasonsAndDrawsItsCharts() throws IOException {
        StudyPlan plan = DemoPlan.create();
        GradingPlan gp = GradingPlans.of(plan);
        Path returned = DemoReturns.write(gp, dir.resolve("returned.csv"), 7L, SimulatedReturn.Process.skewed(0.35, 0.2),
                SimulatedReturn.Process.stepping(6.0, 0.2, 0.5, 1.0));
        GradeResult result = Grader.grade(gp, returned, "returned.csv");

        ByteArrayOutputStream out = new ByteArrayOutputStream();
        GradeReport.write(result, plan, Paper.A4, out);
        Files.write(dir.resolve("report.pdf"), out.toByteArray());
        if (System.getProperty("proofrun.keepReport") != null) {
            Files.write(Path.of(System.getProperty("proofrun.keepReport")), out.toByteArray());
        }
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            String first = text(doc, 1, 1).replaceAll("\\s+", " ");
            assertTrue(first.contains(result.verdict().words() + " for the part"), first);
            String all = text(doc, 1, doc.getNumberOfPages()).replaceAll("\\s+", " ");
            for (CharacteristicGrade g : result.characteristics()) {
                assertTrue(first.contains(g.verdict().words() + " " + g.id() + " " + g.name()), "verdict of " + g.id());
                for (Reason r : g.reasons()) {
                    assertTrue(all.contains(r.text().replaceAll("\\s+", " ")), "reason: " + r.text());
                }
            }
            String caution = result.caution().replaceAll("\\s+", " ");
            assertTrue(first.contains(caution), "the caution in the verdict box");
            CharacteristicGrade last = result.characteristics().get(result.characteristics().size() - 1);
            String lastReason = VerdictSection.decisive(last).get(0).text().replaceAll("\\s+", " ");
            assertTrue(first.indexOf(lastReason) < first.indexOf(caution)
                    && first.indexOf(caution) < first.indexOf("Problems in the returned file"),
                    "the caution closes the verdict box, after the last reason");
            assertTrue(all.contains("Subgroup means") && all.contains("Probability plot"));
            assertTrue(all.contains("USL") && all.contains("LSL"));
            PDFRenderer r = new PDFRenderer(doc);
            for (int p = 0; p < doc.getNumberOfPages(); p++) {
                assertTrue(Ink.darkPixels(r.renderImage(p, 0.4f)) > 300, "page " + (p + 1) + " has ink");
            }
        }
    }

    @Test
    void aReturnWithTooLittleDataStillGivesAReport() throws IOException {
        StudyPlan plan = DemoPlan.create();
        GradingPlan gp = GradingPlans.of(plan);
        Path full = DemoReturns.write(gp, dir.resolve("full.csv"), 11L, SimulatedReturn.Process.stable(0.4, 0.05),
                SimulatedReturn.Process.stable(6.0, 0.2));
        // only the header and slot S01 come back: one subgroup per characteristic, no stability or shape evidence
        Path shortFile = dir.resolve("short.csv");
        Files.write(shortFile, Files.readAllLines(full).subList(0, 4));
        GradeResult result = Grader.grade(gp, shortFile, "short.csv");
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        GradeReport.write(result, plan, Paper.LETTER, out);
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            String all = text(doc, 1, doc.getNumberOfPages()).replaceAll("\\s+", " ");
            assertTrue(all.contains(result.verdict().words() + " for the part"));
            assertTrue(all.contains("Not enough usable data for this step."), all);
        }
    }

    private static String text(PDDocument doc, int from, int to) throws IOException {
        PDFTextStripper s = new PDFTextStripper();
        s.setStartPage(from);
        s.setEndPage(to);
        return s.getText(doc);
    }
}
