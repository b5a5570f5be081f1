package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A fill-in workbook written by another program — Debian's /usr/bin/python3 with openpyxl (3.0.9) — read
 * back: numbers stored as numbers with a 2-decimal display format (the stored value must win), a reading
 * typed as text with a decimal comma, a real date-time cell in the taken column, columns in another order,
 * a blank row. Skipped when that Python or openpyxl is missing.
 */
class XlsxReadTest {

    @TempDir
    Path dir;

    private static final String SCRIPT = String.join("\n",
            "import sys, datetime, openpyxl",
            "wb = openpyxl.Workbook(); ws = wb.active; ws.title = 'fill-in'",
            "ws.append(['slot', 'x2', 'x1', 'characteristic', 'plan', 'taken', 'remark'])",
            "ref = 'PR-TEST-1@0123456789ab'",
            "ws.append(['S01', 10.0015, 10.002, 'D1', ref, datetime.datetime(2027, 3, 1, 6, 4), ''])",
            "ws.append([None, None, None, None, None, None, None])",
            "ws.append(['S02', '9,998', 9.999, 'D1', ref, '06:31', 'typed as text'])",
            "ws.append(['S03', 10.003, 10.0, 'D1', ref, datetime.datetime(2027, 3, 1, 7, 2), ''])",
            "for row in ws.iter_rows(min_row=2):",
            "    for c in row[1:3]:",
            "        c.number_format = '0.00'",
            "wb.save(sys.argv[1])");

    @Test
    void workbookWrittenByOpenpyxlReadsBack() throws Exception {
        Path python = Path.of("/usr/bin/python3");
        assumeTrue(Files.isExecutable(python), "no /usr/bin/python3");
        Path script = dir.resolve("write.py");
        Files.write(script, SCRIPT.getBytes(StandardCharsets.UTF_8));
        Path xlsx = dir.resolve("returned.xlsx");
        Process p = new ProcessBuilder(python.toString(), script.toString(), xlsx.toString()).redirectErrorStream(true).start();
        assumeTrue(p.waitFor(60, TimeUnit.SECONDS), "python did not finish");
        String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assumeTrue(p.exitValue() == 0 || !output.contains("No module named 'openpyxl'"), "no openpyxl");
        assertEquals(0, p.exitValue(), output);

        GradingPlan plan = TestPlans.plan(2, 3, TestPlans.bore());
        GradeResult r = Grader.grade(plan, xlsx, "returned.xlsx");
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(3, g.completeness().completeSubgroups(), r.problems().toString());
        assertEquals(10.002, g.subgroups().get(0)[0], 0.0);
        assertEquals(10.0015, g.subgroups().get(0)[1], 0.0); // stored value, not the "10.00" the format shows
        assertEquals(9.999, g.subgroups().get(1)[0], 0.0);
        assertEquals(9.998, g.subgroups().get(1)[1], 0.0);
        // 10.0015 is off the 0.001 resolution: flagged with its row and column; the text "9,998" is said as
        // read with a decimal comma; nothing else
        assertEquals(2, r.problems().size(), r.problems().toString());
        assertTrue(r.problems().get(0).toString().startsWith("returned.xlsx, row 2, column x2: warning: 10.0015 is not a multiple"),
                r.problems().toString());
        assertEquals("returned.xlsx, row 4, column x2: note: readings with a decimal comma, read as the decimal mark (never a "
                + "thousands separator) in this workbook: 1; the first, '9,998', is 9.998", r.problems().get(1).toString());
        assertEquals(0, g.completeness().lateSubgroups());
    }

    @Test
    void notAWorkbookIsAOneLineError() throws IOException {
        Path f = dir.resolve("broken.xlsx");
        Files.write(f, "not a zip".getBytes(StandardCharsets.UTF_8));
        dev.proofrun.text.UserException e = org.junit.jupiter.api.Assertions.assertThrows(dev.proofrun.text.UserException.class,
                () -> Grader.grade(TestPlans.plan(2, 3, TestPlans.bore()), f, "broken.xlsx"));
        assertTrue(e.getMessage().startsWith("broken.xlsx: cannot read the file"), e.getMessage());
    }
}
