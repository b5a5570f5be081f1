package dev.proofrun.sheet;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes the fill-in CSV: UTF-8 without a byte-order mark, comma separated, CRLF line ends, fields quoted
 * only when they need it (RFC 4180 via Commons CSV {@code CSVFormat.RFC4180}). Columns as in
 * {@link FillInColumns}; the prefilled cells go through {@link CellText#inert}, the others are empty.
 */
public final class FillInCsv {

    private FillInCsv() {
    }

    /**
     * Writes the file for a plan. The stream is flushed, not closed.
     *
     * @param plan the plan
     * @param out  where to write
     * @throws IOException if writing fails
     */
    public static void write(StudyPlan plan, OutputStream out) throws IOException {
        int n = plan.design().subgroupSize();
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        CSVPrinter csv = new CSVPrinter(w, CSVFormat.RFC4180);
        csv.printRecord(FillInColumns.header(plan));
        List<String> row = new ArrayList<>(FillInColumns.width(plan));
        int[] stage = FillInColumns.stageOfSlot(plan);
        List<Slot> slots = plan.schedule().slots();
        for (int s = 0; s < slots.size(); s++) {
            Slot slot = slots.get(s);
            for (Characteristic c : plan.characteristics()) {
                row.clear();
                for (String cell : FillInColumns.prefilled(plan, slot, c)) {
                    row.add(CellText.inert(cell));
                }
                while (row.size() < FillInColumns.width(n)) {
                    row.add("");
                }
                if (plan.isStaged()) {
                    row.add(Integer.toString(stage[s]));
                }
                csv.printRecord(row);
            }
        }
        csv.flush();
    }
}
