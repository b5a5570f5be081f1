package dev.proofrun.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.StudyPlan;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DataValidation;
import org.apache.poi.ss.usermodel.DataValidationConstraint;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.PaneInformation;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;

/** The fill-in workbook, read back with POI. */
class FillInXlsxTest {

    static XSSFWorkbook workbook(StudyPlan plan) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        FillInXlsx.write(plan, out);
        return new XSSFWorkbook(new ByteArrayInputStream(out.toByteArray()));
    }

    @Test
    void headerRowsValidationAndLocks() throws IOException {
        StudyPlan plan = DemoPlan.create();
        try (XSSFWorkbook wb = workbook(plan)) {
            XSSFSheet sheet = wb.getSheetAt(0);
            assertEquals(FillInXlsx.FILL_IN, sheet.getSheetName());
            List<String> header = FillInColumns.header(5);
            Row head = sheet.getRow(0);
            for (int i = 0; i < header.size(); i++) {
                assertEquals(header.get(i), head.getCell(i).getStringCellValue());
            }
            assertEquals(List.of("plan", "slot", "characteristic", "planned", "taken", "lot", "operator", "x1", "x2",
                    "x3", "x4", "x5", "remark"), header, "TEAM.md contract");
            assertEquals(25 * 3, sheet.getLastRowNum());
            Row first = sheet.getRow(1);
            assertEquals(plan.reference(), first.getCell(0).getStringCellValue());
            assertEquals("S01", first.getCell(1).getStringCellValue());
            assertEquals("D1", first.getCell(2).getStringCellValue());
            assertEquals(SheetNumbers.planned(plan.schedule().slots().get(0).start()), first.getCell(3).getStringCellValue());
            assertEquals("F7", sheet.getRow(75).getCell(2).getStringCellValue());

            PaneInformation pane = sheet.getPaneInformation();
            assertNotNull(pane);
            assertTrue(pane.isFreezePane());
            assertEquals(1, pane.getHorizontalSplitPosition(), "header row frozen");

            assertTrue(sheet.getProtect(), "sheet protected");
            for (int r = 1; r <= sheet.getLastRowNum(); r++) {
                Row row = sheet.getRow(r);
                for (int c = 0; c < header.size(); c++) {
                    Cell cell = row.getCell(c);
                    assertNotNull(cell, "cell " + r + "," + c);
                    boolean prefilled = c < 4;
                    assertEquals(prefilled, cell.getCellStyle().getLocked(), "lock of row " + r + " column " + header.get(c));
                }
            }

            List<? extends DataValidation> validations = sheet.getDataValidations();
            assertEquals(1, validations.size());
            DataValidation v = validations.get(0);
            assertEquals(DataValidationConstraint.ValidationType.DECIMAL, v.getValidationConstraint().getValidationType());
            assertTrue(v.getShowErrorBox());
            CellRangeAddress range = v.getRegions().getCellRangeAddress(0);
            assertEquals(1, range.getFirstRow());
            assertEquals(75, range.getLastRow());
            assertEquals(header.indexOf("x1"), range.getFirstColumn());
            assertEquals(header.indexOf("x5"), range.getLastColumn());

            XSSFSheet summary = wb.getSheetAt(1);
            assertEquals(FillInXlsx.SUMMARY, summary.getSheetName());
            assertTrue(summary.getProtect());
            String all = text(summary);
            assertTrue(all.contains(plan.revision().orElseThrow()));
            assertTrue(all.contains(plan.summary()));
            assertTrue(all.contains("bore diameter") && all.contains("21.9870") && all.contains("22.0130"));
        }
    }

    @Test
    void aCharacteristicNamedLikeAFormulaStaysText() throws IOException {
        StudyPlan plan = SheetFixtures.plan("-PR-9", 3, List.of(SheetFixtures.characteristic("-C1", "=SUM(A1)", 5)), 2, true);
        try (XSSFWorkbook wb = workbook(plan)) {
            for (int s = 0; s < wb.getNumberOfSheets(); s++) {
                for (Row row : wb.getSheetAt(s)) {
                    for (Cell cell : row) {
                        assertFalse(cell.getCellType() == CellType.FORMULA, "formula at " + cell.getAddress());
                    }
                }
            }
            Cell plainId = wb.getSheetAt(0).getRow(1).getCell(2);
            assertEquals("-C1", plainId.getStringCellValue(), "the value is kept exactly");
            assertTrue(plainId.getCellStyle().getQuotePrefixed(), "and marked as text");
            assertTrue(wb.getSheetAt(0).getRow(1).getCell(0).getCellStyle().getQuotePrefixed(), "plan id -PR-9");
            boolean found = false;
            for (Row row : wb.getSheetAt(1)) {
                for (Cell cell : row) {
                    if (cell.getCellType() == CellType.STRING && cell.getStringCellValue().equals("=SUM(A1)")) {
                        assertTrue(cell.getCellStyle().getQuotePrefixed());
                        found = true;
                    }
                }
            }
            assertTrue(found, "the name is on the summary sheet, as text");
        }
    }

    private static String text(XSSFSheet sheet) {
        StringBuilder sb = new StringBuilder();
        for (Row row : sheet) {
            for (Cell cell : row) {
                if (cell.getCellType() == CellType.STRING) {
                    sb.append(cell.getStringCellValue()).append('\n');
                }
            }
        }
        return sb.toString();
    }
}
