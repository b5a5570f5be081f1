package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.text.CsvDialect;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Returned files as people leave them, and each malformed case with its message, row and column. Plan:
 * 3 subgroups of 2 readings (allowed shortfall 0), slots S01–S03 at 06:00, 06:30, 07:00 Berlin ±10 min,
 * limits 9.9–10.1, resolution 0.001 (invented).
 */
class ReturnedFileTest {

    @TempDir
    Path dir;

    private final GradingPlan plan = TestPlans.plan(2, 3, TestPlans.bore());
    private static final String REF = "PR-TEST-1@0123456789ab";

    private GradeResult grade(String name, String content) throws IOException {
        Path f = dir.resolve(name);
        Files.write(f, content.getBytes(StandardCharsets.UTF_8));
        return Grader.grade(plan, f, name);
    }

    /** Every expected problem is among {@code p}, and {@code p} holds no other. */
    private static void assertExactly(String[] expected, List<String> p) {
        for (String e : expected) {
            assertTrue(p.contains(e), () -> "missing: " + e + "\nin " + p);
        }
        assertEquals(expected.length, p.size(), p.toString());
    }

    private static List<String> problems(GradeResult r) {
        return r.problems().stream().map(Problem::toString).collect(Collectors.toList());
    }

    private static final String HEADER = "plan,slot,characteristic,planned,taken,lot,operator,x1,x2,remark\n";

    @Test
    void editedFileWithBomSemicolonsDecimalCommasBlankRowsMovedColumnsAndSpaces() throws IOException {
        String csv = "\uFEFFx2 ; slot;characteristic ;plan;taken\n"
                + "\n"
                + "10,002 ; S01 ; D1 ;" + REF + " ; 06:03\n"
                + " ; ; ; ; \n"
                + "9,998;S02;D1;" + REF + ";2027-03-01 06:31\n"
                + "10,000;S03;D1;" + REF + ";2027-03-01T07:02+01:00\n";
        // x1 missing from the header entirely: only x2 is read, so every subgroup is one reading short
        GradeResult r = grade("edited.csv", csv);
        assertEquals(3, r.characteristics().get(0).completeness().incompleteSubgroups());
        assertTrue(problems(r).contains("edited.csv, row 3: error: slot S01 of D1 has 1 of 2 readings; the subgroup is not graded"),
                problems(r).toString());
        String full = "\uFEFFx2;slot;x1;characteristic;plan;taken \n\n"
                + "10,002 ;S01;10,001;D1;" + REF + ";06:03\n;;;;;\n"
                + "9,998;S02;9,999;D1;" + REF + ";2027-03-01 06:31\n"
                + "10,000;S03;10,003;D1;" + REF + ";2027-03-01T07:02+01:00\n";
        GradeResult ok = grade("edited2.csv", full);
        // the decimal commas are read, and said once: "12,003" is never read silently
        assertEquals(List.of("edited2.csv, row 3, column x1: note: readings with a decimal comma, read as the decimal mark "
                + "(never a thousands separator) in this ';'-separated file: 6; the first, '10,001', is 10.001"), problems(ok));
        CharacteristicGrade g = ok.characteristics().get(0);
        assertEquals(3, g.completeness().completeSubgroups());
        assertEquals(10.001, g.subgroups().get(0)[0], 0.0);
        assertEquals(10.002, g.subgroups().get(0)[1], 0.0);
    }

    @Test
    void longFormFromAGauge() throws IOException {
        StringBuilder sb = new StringBuilder("plan,slot,characteristic,taken,value\n");
        String[] slots = {"S01", "S01", "S02", "S02", "S03", "S03", "S03"};
        String[] times = {"06:01", "06:01", "06:30", "06:30", "07:00", "07:00", "07:00"};
        for (int i = 0; i < slots.length; i++) {
            sb.append(REF).append(',').append(slots[i]).append(",D1,").append(times[i]).append(',').append(10 + i * 0.001).append('\n');
        }
        GradeResult r = grade("gauge.csv", sb.toString().replace("10.006000000000001", "10.006"));
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(2, g.completeness().completeSubgroups());
        assertTrue(problems(r).contains("gauge.csv, row 6: error: slot S03 of D1 has 3 readings, the plan asks for 2; the subgroup is not graded"),
                problems(r).toString());
    }

    @Test
    void anotherPlanOrRevisionIsRefusedAtItsCell() {
        UserException e = assertThrows(UserException.class, () -> grade("other.csv",
                HEADER + "PR-TEST-1@ffffffffffff,S01,D1,,06:00,,,10.0,10.0,\n"));
        assertEquals("other.csv, row 2, column plan: the file was written for plan PR-TEST-1@ffffffffffff, but the plan given is "
                + REF + "; the plan wins: grade the file against its own plan", e.getMessage());
    }

    @Test
    void noHeaderAndEmptyFile() {
        UserException e = assertThrows(UserException.class, () -> grade("junk.csv", "a,b,c\n1,2,3\n"));
        assertTrue(e.getMessage().startsWith("junk.csv, row 1: no header row"), e.getMessage());
        UserException empty = assertThrows(UserException.class, () -> grade("empty.csv", HEADER));
        assertEquals("empty.csv: the file has no data rows", empty.getMessage());
        UserException type = assertThrows(UserException.class, () -> grade("data.ods", HEADER));
        assertEquals("data.ods: unsupported file type '.ods': use .csv or .xlsx", type.getMessage());
    }

    @Test
    void eachRowAndCellProblemNamesRowColumnAndSeverity() throws IOException {
        String csv = HEADER
                + REF + ",S01,D1,,06:05,,,10.001,ten,\n"          // row 2: non-numeric x2
                + REF + ",S01,D1,,06:05,,,10.001,10.002,\n"       // row 3: duplicate
                + REF + ",S09,D1,,06:05,,,10.001,10.002,\n"       // row 4: unknown slot
                + REF + ",S02,Q9,,06:05,,,10.001,10.002,\n"       // row 5: unknown characteristic
                + REF + ",S02,D1,,06:55,,,10.0015,10.9,\n"        // row 6: off resolution, implausible, late
                + REF + ",S03,D1,,06:20,,,10.001,,\n";            // row 7: one reading missing, out of order
        List<String> p = problems(grade("bad.csv", csv));
        String[] expected = {
            "bad.csv, row 2, column x2: error: 'ten' is not a number; the reading is missing",
            "bad.csv, row 3, column slot: error: slot S01 of D1 appears again (first at row 2); this row is not used",
            "bad.csv, row 4, column slot: error: slot 'S09' is not in the plan; the row is not used",
            "bad.csv, row 5, column characteristic: error: characteristic 'Q9' is not in the plan; the row is not used",
            "bad.csv, row 6, column taken: warning: taken 06:55, outside the slot's window 2027-03-01T06:20+01:00 to 2027-03-01T06:40+01:00; kept",
            "bad.csv, row 6, column x1: warning: 10.0015 is not a multiple of the gauge's resolution 0.001; kept",
            "bad.csv, row 6, column x2: warning: 10.9 lies more than one tolerance width beyond the limits (9.9 to 10.1): probably a typing error; kept and graded, check it",
            "bad.csv, row 7, column taken: warning: taken 06:20, outside the slot's window 2027-03-01T06:50+01:00 to 2027-03-01T07:10+01:00; kept",
            "bad.csv, row 2: error: slot S01 of D1 has 1 of 2 readings; the subgroup is not graded",
            "bad.csv, row 7, column taken: warning: slot S03 was taken 2027-03-01T06:20+01:00, before slot S02 (taken 2027-03-01T06:55+01:00); kept",
            "bad.csv, row 7: error: slot S03 of D1 has 1 of 2 readings; the subgroup is not graded",
        };
        assertExactly(expected, p);
    }

    @Test
    void aMissingSlotIsNamedAndMakesTheStudyNotValid() throws IOException {
        String csv = HEADER + REF + ",S01,D1,,06:05,,,10.001,10.002,\n" + REF + ",S03,D1,,07:00,,,10.001,10.003,\n";
        GradeResult r = grade("short.csv", csv);
        assertTrue(problems(r).contains("short.csv: error: slot S02 of D1 did not come back"), problems(r).toString());
        assertEquals(Verdict.NOT_VALID, r.verdict());
        assertEquals(Step.COMPLETENESS, r.characteristics().get(0).reasons().get(0).step());
    }

    @Test
    void aSlotReturnedWithEveryBoxEmptyCountsAsMissingNotIncomplete() throws IOException {
        // the fill-in file's prefilled row for S02 came back as printed: no time, no readings
        String csv = HEADER + REF + ",S01,D1,,06:05,,,10.001,10.002,\n" + REF + ",S02,D1,,,,,,,\n"
                + REF + ",S03,D1,,07:00,,,10.001,,\n";
        GradeResult r = grade("blank.csv", csv);
        var c = r.characteristics().get(0).completeness();
        assertEquals(1, c.missingSubgroups(), "the blank S02");
        assertEquals(1, c.incompleteSubgroups(), "S03 with one of two readings");
        assertTrue(problems(r).contains("blank.csv, row 3: error: slot S02 of D1 came back with every box empty: "
                + "counted as missing"), problems(r).toString());
    }

    @Test
    void numbersAsPeopleTypeThem() {
        assertEquals(10.5, CsvDialect.number("10,5"), 0.0);
        assertEquals(-0.25, CsvDialect.number("-0.25"), 0.0);
        assertEquals(1.5e-3, CsvDialect.number("1.5E-3"), 0.0);
        assertTrue(Double.isNaN(CsvDialect.number("NaN")));
        assertTrue(Double.isNaN(CsvDialect.number("1.0f")));
        assertTrue(Double.isNaN(CsvDialect.number("10,0,2")));
        assertTrue(Double.isNaN(CsvDialect.number("ca. 10")));
        assertTrue(Double.isNaN(CsvDialect.number("1e")));
    }

    @Test
    void extraReadingAndUnreadableTimeInTheFillInForm() throws IOException {
        // a third reading column although the plan's n is 2, and a taken time nobody can read
        String csv = "plan,slot,characteristic,planned,taken,lot,operator,x1,x2,x3,remark\n"
                + REF + ",S01,D1,,06:05,,,10.001,10.002,10.003,\n"   // row 2: three readings
                + REF + ",S02,D1,,half past six,,,10.001,10.002,,\n" // row 3: taken unreadable
                + REF + ",S03,D1,,07:00,,,10.001,10.002,,\n";
        List<String> p = problems(grade("extra.csv", csv));
        String[] expected = {
            "extra.csv, row 3, column taken: warning: 'half past six' is not a time (ISO-8601, yyyy-MM-dd HH:mm, or HH:mm on the planned day)",
            "extra.csv, row 2: error: slot S01 of D1 has 3 readings, the plan asks for 2; the subgroup is not graded",
        };
        assertExactly(expected, p);
    }

    @Test
    void unusableHeadersAndAnUnclosedQuoteAreOneLineErrors() {
        UserException noCharacteristic = assertThrows(UserException.class, () -> grade("cols.csv",
                "plan,slot,taken,x1,x2\n" + REF + ",S01,06:00,10.0,10.0\n"));
        assertEquals("cols.csv, row 1: the header has no column 'characteristic'", noCharacteristic.getMessage());
        UserException noReadings = assertThrows(UserException.class, () -> grade("noread.csv",
                "plan,slot,characteristic,taken\n" + REF + ",S01,D1,06:00\n"));
        assertEquals("noread.csv, row 1: the header has neither a 'value' column nor reading columns x1, x2, ...",
                noReadings.getMessage());
        UserException quote = assertThrows(UserException.class, () -> grade("quote.csv",
                HEADER + REF + ",S01,D1,,06:05,,,10.001,10.002,\n" + REF + ",S02,D1,,06:30,,,\"10.001,10.002,\n"));
        assertEquals("quote.csv, row 3: cannot read the file: a quoted field is not closed on its line", quote.getMessage());
    }

    @Test
    void longFormNonNumericValueIsNamedAndItsSubgroupNotGraded() throws IOException {
        String csv = "plan,slot,characteristic,taken,value\n"
                + REF + ",S01,D1,06:01,10.001\n" + REF + ",S01,D1,06:01,n/a\n"
                + REF + ",S02,D1,06:30,10.001\n" + REF + ",S02,D1,06:30,10.002\n"
                + REF + ",S03,D1,07:00,10.001\n" + REF + ",S03,D1,07:00,10.002\n";
        GradeResult r = grade("gauge.csv", csv);
        List<String> p = problems(r);
        assertTrue(p.contains("gauge.csv, row 3, column value: error: 'n/a' is not a number; the reading is missing"), p.toString());
        assertTrue(p.contains("gauge.csv, row 2: error: slot S01 of D1 has 1 of 2 readings; the subgroup is not graded"), p.toString());
        assertEquals(2, r.characteristics().get(0).completeness().completeSubgroups());
    }
}
