package dev.proofrun.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.time.OffsetDateTime;
import java.util.Iterator;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The fill-in CSV: the contract's header, one row per slot and characteristic, inert text, round trip. */
class FillInCsvTest {

    static String csv(StudyPlan plan) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        FillInCsv.write(plan, out);
        byte[] bytes = out.toByteArray();
        assertFalse(bytes.length >= 3 && bytes[0] == (byte) 0xEF, "no byte-order mark");
        return new String(bytes, StandardCharsets.UTF_8);
    }

    static List<CSVRecord> records(String text) throws IOException {
        try (CSVParser p = CSVParser.parse(new StringReader(text), CSVFormat.RFC4180)) {
            return p.getRecords();
        }
    }

    @Test
    void theHeaderIsTheContractsAndEveryRowIsPrefilledFromThePlan() throws IOException {
        StudyPlan plan = DemoPlan.create();
        String text = csv(plan);
        // TEAM.md contract: plan,slot,characteristic,planned,taken,lot,operator,x1,...,xn,remark (n = 5)
        assertTrue(text.startsWith("plan,slot,characteristic,planned,taken,lot,operator,x1,x2,x3,x4,x5,remark\r\n"));
        List<CSVRecord> rows = records(text);
        assertEquals(1 + 25 * 3, rows.size());
        Iterator<CSVRecord> it = rows.subList(1, rows.size()).iterator();
        for (Slot s : plan.schedule().slots()) {
            for (Characteristic c : plan.characteristics()) {
                CSVRecord r = it.next();
                assertEquals(13, r.size());
                assertEquals(plan.id() + "@" + plan.revision().orElseThrow(), r.get(0));
                assertEquals(s.id(), r.get(1));
                assertEquals(c.id(), r.get(2));
                // planned: ISO-8601 with offset, minutes, as in the contract's example 2027-03-01T06:40+01:00
                assertTrue(r.get(3).matches("\\d{4}-\\d\\d-\\d\\dT\\d\\d:\\d\\d[+-]\\d\\d:\\d\\d"), r.get(3));
                assertEquals(s.start().toInstant(), OffsetDateTime.parse(r.get(3)).toInstant());
                for (int i = 4; i < 13; i++) {
                    assertEquals("", r.get(i), "column " + i + " is for people");
                }
            }
        }
    }

    @Test
    void aFilledCopyRoundTripsThroughTheParser() throws IOException {
        StudyPlan plan = SheetFixtures.plan("-PR-9", 4, List.of(SheetFixtures.characteristic("-C1", "=SUM(A1)", 5),
                SheetFixtures.characteristic("C2", "plain", 7)), 3, true);
        List<CSVRecord> rows = records(csv(plan));
        // the plan id and a characteristic id start with '-': written with a leading quote, restored on reading
        assertEquals("'-PR-9@" + plan.revision().orElseThrow(), rows.get(1).get(0));
        assertEquals("'-C1", rows.get(1).get(2));
        assertEquals(plan.reference(), CellText.restore(rows.get(1).get(0)));
        assertEquals("-C1", CellText.restore(rows.get(1).get(2)));
        assertEquals("C2", CellText.restore(rows.get(2).get(2)));
        for (CSVRecord r : rows) {
            for (String cell : r) {
                assertFalse(CellText.risky(cell), "cell evaluates: " + cell);
            }
        }
        // a person fills a row (with a comma and a quote in the remark); it parses back the same
        StringBuilder filled = new StringBuilder();
        try (var printer = new org.apache.commons.csv.CSVPrinter(filled, CSVFormat.RFC4180)) {
            for (CSVRecord r : rows) {
                List<String> cells = new java.util.ArrayList<>(r.toList());
                if (r.getRecordNumber() == 2) {
                    cells.set(4, "06:41");
                    cells.set(7, "-0.5");
                    cells.set(cells.size() - 1, "gauge re-zeroed, \"new\" probe");
                }
                printer.printRecord(cells);
            }
        }
        List<CSVRecord> back = records(filled.toString());
        assertEquals(rows.size(), back.size());
        assertEquals("-0.5", back.get(1).get(7));
        assertEquals("gauge re-zeroed, \"new\" probe", back.get(1).get(10), "remark, column 11 for n = 3");
        assertEquals(rows.get(3).toList(), back.get(3).toList());
    }

    @ParameterizedTest
    @ValueSource(strings = {"=SUM(A1)", "+1", "-1", "@cmd", "\tx", "\rx"})
    void everyFormulaStartIsNeutralised(String text) {
        assertTrue(CellText.risky(text));
        assertEquals("'" + text, CellText.inert(text));
        assertEquals(text, CellText.restore(CellText.inert(text)));
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "D1", "S07", "2027-03-01T06:40+01:00", "'quoted", "a=b"})
    void ordinaryTextIsLeftAlone(String text) {
        assertFalse(CellText.risky(text));
        assertEquals(text, CellText.inert(text));
        assertEquals(text, CellText.restore(text));
    }
}
