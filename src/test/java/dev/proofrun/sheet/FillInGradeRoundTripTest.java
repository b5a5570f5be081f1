package dev.proofrun.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Grader;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The formula guard survives the whole loop: a plan whose id and characteristic id start with {@code -}
 * (invented: plan "-PR-9", characteristic "-7") goes through the sheet, is filled in, and grades with every
 * subgroup usable — the leading quote the sheet wrote before the risky text is removed by the reader, in the
 * CSV and in a workbook where a spreadsheet kept the quote as part of the text.
 */
class FillInGradeRoundTripTest {

    private static final int SLOTS = 25;
    private static final int N = 5;

    @TempDir
    Path dir;

    private StudyPlan plan() {
        return SheetFixtures.plan("-PR-9", SLOTS, List.of(SheetFixtures.characteristic("-7", "seal height", 5.0)), N, true);
    }

    /** Readings on the 0.001 grid around the nominal 5.000 (tolerance ±0.05), seeded; invented. */
    private static String reading(SplittableRandom rng) {
        return String.format(Locale.ROOT, "%.3f", 5.0 + 0.001 * (rng.nextInt(21) - 10));
    }

    private static void assertAllUsable(GradeResult r, String file) {
        assertTrue(r.problems().isEmpty(), () -> file + ": " + r.problems());
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals("-7", g.id());
        assertEquals(SLOTS, g.completeness().completeSubgroups(), file);
    }

    @Test
    void csvFilledInGradesWithTheQuotesRemoved() throws IOException {
        StudyPlan plan = plan();
        SheetFiles.Written w = SheetFiles.write(plan, dir, Paper.A4, false);
        List<String> lines = Files.readAllLines(w.csv(), StandardCharsets.UTF_8);
        assertTrue(lines.get(1).startsWith("'-PR-9@"), lines.get(1));
        assertTrue(lines.get(1).contains(",'-7,"), lines.get(1));
        SplittableRandom rng = new SplittableRandom(9);
        List<String> filled = new ArrayList<>();
        filled.add(lines.get(0));
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",", -1); // plan,slot,characteristic,planned,taken,lot,operator,x1..x5,remark
            for (int j = 0; j < N; j++) {
                c[FillInColumns.FIRST_READING + j] = reading(rng);
            }
            filled.add(String.join(",", c));
        }
        Path returned = dir.resolve("returned.csv");
        Files.write(returned, filled, StandardCharsets.UTF_8);
        assertAllUsable(Grader.grade(GradingPlans.of(plan), returned, "returned.csv"), "returned.csv");
    }

    @Test
    void workbookFilledInGradesWithOrWithoutTheQuoteInTheText() throws IOException {
        StudyPlan plan = plan();
        SheetFiles.Written w = SheetFiles.write(plan, dir, Paper.A4, false);
        for (boolean quoteInText : new boolean[] {false, true}) {
            SplittableRandom rng = new SplittableRandom(10);
            Path returned = dir.resolve("returned-" + quoteInText + ".xlsx");
            try (InputStream in = Files.newInputStream(w.xlsx()); XSSFWorkbook wb = new XSSFWorkbook(in)) {
                Sheet sheet = wb.getSheet(FillInXlsx.FILL_IN);
                for (int r = 1; r <= sheet.getLastRowNum(); r++) {
                    Row row = sheet.getRow(r);
                    if (quoteInText) {
                        // as a spreadsheet that imported the CSV keeps it: the quote is part of the text
                        row.getCell(0).setCellValue("'" + row.getCell(0).getStringCellValue());
                        row.getCell(2).setCellValue("'" + row.getCell(2).getStringCellValue());
                    } else {
                        assertEquals("-7", row.getCell(2).getStringCellValue()); // the workbook keeps the exact value
                    }
                    for (int j = 0; j < N; j++) {
                        row.createCell(FillInColumns.FIRST_READING + j).setCellValue(Double.parseDouble(reading(rng)));
                    }
                }
                try (OutputStream out = Files.newOutputStream(returned)) {
                    wb.write(out);
                }
            }
            String name = returned.getFileName().toString();
            assertAllUsable(Grader.grade(GradingPlans.of(plan), returned, name), name);
        }
    }

    @Test
    void aQuoteBeforeOrdinaryTextIsKept() throws IOException {
        // only a quote before one of the six risky characters is the guard's; "'C1" stays "'C1" and is unknown
        StudyPlan plan = plan();
        SheetFiles.Written w = SheetFiles.write(plan, dir, Paper.A4, false);
        List<String> lines = Files.readAllLines(w.csv(), StandardCharsets.UTF_8);
        String row = lines.get(1).replace(",'-7,", ",'7,");
        Path returned = dir.resolve("odd.csv");
        Files.write(returned, List.of(lines.get(0), row), StandardCharsets.UTF_8);
        GradeResult r = Grader.grade(GradingPlans.of(plan), returned, "odd.csv");
        assertTrue(r.problems().stream().anyMatch(p -> p.toString().startsWith("odd.csv, row 2, column characteristic")
                && p.toString().contains("'7")), r.problems().toString());
    }
}
