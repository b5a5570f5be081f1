package dev.proofrun.sheet;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.DataValidation;
import org.apache.poi.ss.usermodel.DataValidationConstraint;
import org.apache.poi.ss.usermodel.DataValidationHelper;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.util.CellRangeAddressList;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.streaming.SXSSFSheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;

/**
 * Writes the fill-in workbook (Apache POI, XLSX). Rows are streamed ({@code SXSSFWorkbook}, a window of
 * {@value #WINDOW} rows in memory), which keeps a plan of thousands of rows fast.
 *
 * <p>First sheet {@value #FILL_IN}: the columns of {@link FillInColumns}, the header row frozen, every cell
 * a string cell except the readings. The sheet is protected without a password: the four prefilled columns
 * are locked, the cells people fill in ({@code taken}, {@code lot}, {@code operator}, the readings,
 * {@code remark}) are unlocked. {@code taken}, {@code lot}, {@code operator} and {@code remark} are
 * formatted as text, so "06:42" stays what was typed; the reading cells accept decimal numbers only (data
 * validation, error box on anything else). Prefilled text that a spreadsheet could evaluate
 * ({@link CellText#risky}) carries the quote-prefix style, so it stays text and the value is exact.
 *
 * <p>Second sheet {@value #SUMMARY}: the plan in brief — identity, part, design, frequency, each
 * characteristic with its limits and gauge, and the caution. Protected, all locked.
 */
public final class FillInXlsx {

    /** Name of the first sheet. */
    public static final String FILL_IN = "fill-in";
    /** Name of the second sheet. */
    public static final String SUMMARY = "plan";

    /** Readings beyond ±1e300 are refused by the validation: in practice, "any decimal number". */
    private static final String READING_BOUND = "1E+300";

    /** Rows kept in memory while streaming. */
    private static final int WINDOW = 200;

    private FillInXlsx() {
    }

    /**
     * Writes the workbook for a plan. The stream is not closed.
     *
     * @throws IOException if writing fails
     */
    public static void write(StudyPlan plan, OutputStream out) throws IOException {
        SXSSFWorkbook wb = new SXSSFWorkbook(WINDOW);
        try {
            Styles styles = new Styles(wb);
            fillIn(plan, wb.createSheet(FILL_IN), styles);
            PlanSummarySheet.write(plan, wb.createSheet(SUMMARY), styles.header, styles.prefilled, styles.prefilledQuoted);
            wb.setActiveSheet(0);
            wb.write(out);
        } finally {
            wb.dispose();
            wb.close();
        }
        out.flush();
    }

    private static void fillIn(StudyPlan plan, SXSSFSheet sheet, Styles styles) {
        int n = plan.design().subgroupSize();
        List<String> header = FillInColumns.header(plan);
        int editableEnd = FillInColumns.width(n); // a staged plan's stage column after it is prefilled
        int[] stage = FillInColumns.stageOfSlot(plan);
        Row head = sheet.createRow(0);
        for (int i = 0; i < header.size(); i++) {
            Cell cell = head.createCell(i);
            cell.setCellValue(header.get(i));
            cell.setCellStyle(styles.header);
        }
        int r = 1;
        List<Slot> slots = plan.schedule().slots();
        for (int s = 0; s < slots.size(); s++) {
            Slot slot = slots.get(s);
            for (Characteristic c : plan.characteristics()) {
                Row row = sheet.createRow(r++);
                List<String> pre = FillInColumns.prefilled(plan, slot, c);
                for (int i = 0; i < pre.size(); i++) {
                    Cell cell = row.createCell(i);
                    cell.setCellValue(pre.get(i));
                    cell.setCellStyle(CellText.risky(pre.get(i)) ? styles.prefilledQuoted : styles.prefilled);
                }
                for (int i = FillInColumns.FIRST_EDITABLE; i < editableEnd; i++) {
                    boolean reading = i >= FillInColumns.FIRST_READING && i < FillInColumns.FIRST_READING + n;
                    row.createCell(i).setCellStyle(reading ? styles.reading : styles.editableText);
                }
                if (plan.isStaged()) {
                    Cell cell = row.createCell(editableEnd);
                    cell.setCellValue(Integer.toString(stage[s]));
                    cell.setCellStyle(styles.prefilled);
                }
            }
        }
        int last = r - 1;
        if (last >= 1) {
            DataValidationHelper helper = sheet.getDataValidationHelper();
            DataValidationConstraint decimal = helper.createDecimalConstraint(
                    DataValidationConstraint.OperatorType.BETWEEN, "-" + READING_BOUND, READING_BOUND);
            DataValidation v = helper.createValidation(decimal, new CellRangeAddressList(1, last,
                    FillInColumns.FIRST_READING, FillInColumns.FIRST_READING + n - 1));
            v.setEmptyCellAllowed(true);
            v.setShowErrorBox(true);
            v.setErrorStyle(DataValidation.ErrorStyle.STOP);
            v.createErrorBox("Reading", "Enter the reading as a number, to the gauge's resolution.");
            v.setShowPromptBox(false);
            sheet.addValidationData(v);
        }
        sheet.createFreezePane(0, 1);
        int[] widths = {22, 7, 14, 24, 18, 12, 12};
        for (int i = 0; i < header.size(); i++) {
            int chars = i < widths.length ? widths[i] : (i == editableEnd - 1 ? 30 : 10);
            sheet.setColumnWidth(i, chars * 256);
        }
        protect(sheet);
    }

    /** Protection without a password; people may still resize columns and select any cell. */
    static void protect(SXSSFSheet sheet) {
        sheet.enableLocking();
        sheet.lockFormatColumns(false);
        sheet.lockFormatRows(false);
        sheet.lockSelectLockedCells(false);
        sheet.lockSelectUnlockedCells(false);
    }

    /** The cell styles of the workbook. */
    private static final class Styles {
        final CellStyle header;
        final CellStyle prefilled;
        final CellStyle prefilledQuoted;
        final CellStyle reading;
        final CellStyle editableText;

        Styles(SXSSFWorkbook wb) {
            short text = wb.createDataFormat().getFormat("@");
            Font bold = wb.createFont();
            bold.setBold(true);
            header = wb.createCellStyle();
            header.setFont(bold);
            header.setLocked(true);
            header.setDataFormat(text);
            prefilled = wb.createCellStyle();
            prefilled.setLocked(true);
            prefilled.setDataFormat(text);
            prefilledQuoted = wb.createCellStyle();
            prefilledQuoted.cloneStyleFrom(prefilled);
            prefilledQuoted.setQuotePrefixed(true);
            reading = wb.createCellStyle();
            reading.setLocked(false);
            editableText = wb.createCellStyle();
            editableText.setLocked(false);
            editableText.setDataFormat(text);
        }
    }
}
