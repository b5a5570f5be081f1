package dev.proofrun.sheet;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import java.util.List;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.streaming.SXSSFSheet;

/** The second sheet of the fill-in workbook: the plan in brief, protected. */
final class PlanSummarySheet {

    private PlanSummarySheet() {
    }

    static void write(StudyPlan plan, SXSSFSheet sheet, CellStyle header, CellStyle plain, CellStyle quoted) {
        Writer w = new Writer(sheet, plain, quoted);
        List<Slot> slots = plan.schedule().slots();
        w.row(header, "Plan", plan.id());
        w.row(null, "Revision", plan.revision().isPresent() ? plan.revisionWords() : "draft (not issued)");
        w.row(null, "Reference in the fill-in file", plan.reference());
        w.row(null, "Part", plan.part().name());
        w.row(null, "Part number", plan.part().number());
        w.row(null, "Part revision", plan.part().revision());
        w.row(null, "Author", plan.people().author());
        w.row(null, "Collector", plan.people().collector());
        w.row(null, "Subgroup size", Integer.toString(plan.design().subgroupSize()));
        w.row(null, "Subgroups (slots)", Integer.toString(slots.size()));
        w.row(null, "Frequency", plan.summary());
        w.row(null, "First slot", slots.get(0).id() + " " + SheetNumbers.planned(slots.get(0).start()));
        w.row(null, "Last slot", slots.get(slots.size() - 1).id() + " " + SheetNumbers.planned(slots.get(slots.size() - 1).start()));
        w.row(null, "Time zone", plan.calendar().zone().getId());
        w.skip();
        w.row(header, "Id", "Characteristic", "Unit", "Nominal", "LSL", "USL", "Gauge", "Resolution", "Requirement", "Shape");
        for (Characteristic c : plan.characteristics()) {
            int d = SheetNumbers.decimals(c);
            w.row(null, c.id(), c.name(), c.unit(), SheetNumbers.number(c.nominal(), d), SheetNumbers.number(c.limits().lower(), d),
                    SheetNumbers.number(c.limits().upper(), d), c.gauge().map(g -> g.name()).orElse("\u2014"),
                    SheetNumbers.resolution(c), SheetNumbers.requirement(c), c.shapeWords());
        }
        w.skip();
        w.row(header, "Caution");
        for (String line : SheetWording.CAUTION) {
            w.row(null, line);
        }
        int[] widths = {28, 40, 8, 10, 10, 10, 24, 11, 30, 11};
        for (int i = 0; i < widths.length; i++) {
            sheet.setColumnWidth(i, widths[i] * 256);
        }
        FillInXlsx.protect(sheet);
    }

    private static final class Writer {
        private final SXSSFSheet sheet;
        private final CellStyle plain;
        private final CellStyle quoted;
        private int next;

        Writer(SXSSFSheet sheet, CellStyle plain, CellStyle quoted) {
            this.sheet = sheet;
            this.plain = plain;
            this.quoted = quoted;
        }

        void row(CellStyle style, String... cells) {
            Row row = sheet.createRow(next++);
            for (int i = 0; i < cells.length; i++) {
                Cell cell = row.createCell(i);
                String value = cells[i] == null ? "" : cells[i];
                cell.setCellValue(value);
                cell.setCellStyle(CellText.risky(value) ? quoted : (style != null ? style : plain));
            }
        }

        void skip() {
            next++;
        }
    }
}
