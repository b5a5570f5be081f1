package dev.proofrun.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Grader;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.SplittableRandom;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A staged plan's sheet marks where each stage ends and its fill-in files say which stage each slot belongs to; a
 * file filled in for stage 1 only grades at look 1 with no missing slots. Invented plan: 30 slots of 5, one
 * characteristic, looks at 15 and 30 (invented confidences).
 */
class StagedSheetTest {

    private static final int N = 5;

    @TempDir
    Path dir;

    private static StudyPlan staged() {
        StudyPlan draft = SheetFixtures.plan("PR-STAGED-1", 30, 1, N, false).withStages(Optional.of(new Stages(
                Spending.OBRIEN_FLEMING, List.of(new Look(15, 0.995, Double.NaN), new Look(30, 0.955, Double.NaN)))));
        return PlanFiles.issue(draft);
    }

    private static String flat(String s) {
        return s.replaceAll("\\s+", " ");
    }

    @Test
    void theSheetMarksTheEndOfEachStageButTheLast() throws IOException {
        try (PDDocument doc = Loader.loadPDF(SheetPdfTest.pdf(staged(), Paper.A4))) {
            String all = flat(SheetPdfTest.text(doc, 1, doc.getNumberOfPages()));
            assertTrue(all.contains("Stage 1 of 2 ends after slot S15: stop here and send the fill-in file back now")
                    || all.contains("Stage 1 of 2 ends after slot S15: stop here and send the \uFB01ll-in \uFB01le back now"), all);
            assertTrue(all.contains("Collect stage 2 (slots S16 to S30) only when the grade says continue"), all);
            assertTrue(all.contains("collected in 2 stages"), all);
            assertFalse(all.contains("Stage 2 of 2 ends"), "the last stage has no mark");
        }
        StudyPlan single = SheetFixtures.plan("PR-SINGLE-1", 30, 1, N, true);
        try (PDDocument doc = Loader.loadPDF(SheetPdfTest.pdf(single, Paper.A4))) {
            String all = flat(SheetPdfTest.text(doc, 1, doc.getNumberOfPages()));
            assertFalse(all.contains("Stage 1 of") || all.contains("stages"), "a single-stage sheet is as before");
        }
    }

    @Test
    void theFillInFilesCarryTheStageOfEachSlotAndTheSingleStageFilesDoNot() throws IOException {
        SheetFiles.Written w = SheetFiles.write(staged(), dir.resolve("staged"), Paper.A4, false);
        List<String> lines = Files.readAllLines(w.csv(), StandardCharsets.UTF_8);
        assertTrue(lines.get(0).endsWith(",remark,stage"), lines.get(0));
        assertTrue(lines.get(15).startsWith("PR-STAGED-1@") && lines.get(15).contains(",S15,") && lines.get(15).endsWith(",1"));
        assertTrue(lines.get(16).contains(",S16,") && lines.get(16).endsWith(",2"), lines.get(16));
        try (InputStream in = Files.newInputStream(w.xlsx()); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            Sheet sheet = wb.getSheet(FillInXlsx.FILL_IN);
            int stageCol = FillInColumns.width(N);
            assertEquals("stage", sheet.getRow(0).getCell(stageCol).getStringCellValue());
            Cell s30 = sheet.getRow(30).getCell(stageCol);
            assertEquals("2", s30.getStringCellValue());
            assertTrue(s30.getCellStyle().getLocked(), "prefilled from the plan, locked");
            assertFalse(sheet.getRow(30).getCell(FillInColumns.FIRST_READING).getCellStyle().getLocked());
        }
        SheetFiles.Written single = SheetFiles.write(SheetFixtures.plan("PR-SINGLE-1", 30, 1, N, true), dir.resolve("single"),
                Paper.A4, false);
        assertTrue(Files.readAllLines(single.csv()).get(0).endsWith(",remark"));
    }

    @Test
    void aFileFilledInForStageOneGradesAtLookOneWithNothingMissing() throws IOException {
        StudyPlan plan = staged();
        SheetFiles.Written w = SheetFiles.write(plan, dir, Paper.A4, false);
        List<String> lines = Files.readAllLines(w.csv(), StandardCharsets.UTF_8);
        SplittableRandom rng = new SplittableRandom(14);
        List<String> filled = new ArrayList<>(List.of(lines.get(0)));
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",", -1);
            if (c[c.length - 1].equals("1")) {
                for (int j = 0; j < N; j++) { // around the nominal 10.000 of C1 (±0.05), sd about 0.006: invented
                    c[FillInColumns.FIRST_READING + j] = String.format(Locale.ROOT, "%.3f", 10.0 + 0.006 * gauss(rng));
                }
            }
            filled.add(String.join(",", c));
        }
        Path returned = dir.resolve("stage-1.csv");
        Files.write(returned, filled, StandardCharsets.UTF_8);
        GradeResult r = Grader.grade(GradingPlans.of(plan), returned, "stage-1.csv");
        assertTrue(r.problems().isEmpty(), r.problems().toString());
        assertEquals(1, r.look().orElseThrow().number());
        assertEquals(15, r.characteristics().get(0).completeness().completeSubgroups());
        assertTrue(r.verdict() == Verdict.DEMONSTRATED || r.verdict() == Verdict.CONTINUE, r.verdict().token());
    }

    /** A standard normal draw (Box–Muller). */
    private static double gauss(SplittableRandom rng) {
        return Math.sqrt(-2 * Math.log(1 - rng.nextDouble())) * Math.cos(2 * Math.PI * rng.nextDouble());
    }
}
