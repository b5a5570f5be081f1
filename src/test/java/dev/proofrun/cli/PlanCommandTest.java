package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PlanCommandTest {

    @TempDir
    Path dir;

    private final LastRun cli = new LastRun();

    private String[] newPlan(Path file, String... extra) {
        List<String> a = new ArrayList<>(List.of("plan", "new", "--out", file.toString(), "--id", "PR-2027-0042",
                "--part", "gear shaft", "--characteristic", "journal diameter", "--unit", "mm",
                "--lsl", "24.98", "--usl", "25.02", "--target", "1.33", "--expected", "1.8",
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin",
                "--shifts", "early=06:00-14:00,late=14:00-22:00,night=22:00-06:00", "--breaks", "09:30-09:45,18:00-18:30",
                "--rate", "80", "--start", "2027-03-01T06:00"));
        // options given in extra replace the defaults above (picocli refuses an option given twice)
        for (int i = 0; i < extra.length; i++) {
            int at = a.indexOf(extra[i]);
            boolean hasValue = i + 1 < extra.length && !extra[i + 1].startsWith("--");
            if (at >= 0 && hasValue) {
                a.set(at + 1, extra[++i]);
            } else {
                a.add(extra[i]);
                if (hasValue) {
                    a.add(extra[++i]);
                }
            }
        }
        return a.toArray(new String[0]);
    }

    @Test
    void newShowIssue() throws Exception {
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(newPlan(file, "--span-days", "2")), cli.err());
        // 2 days x 3 shifts, 1440 - 45 minutes of breaks a day = 2790 minutes; 2790/25 = 111.6 -> "about every 2 hours"
        assertTrue(cli.out().contains("one subgroup of 5 consecutive parts about every 2 hours over 6 shifts on 2 days"), cli.out());
        assertEquals(0, cli.run("plan", "show", file.toString()));
        assertTrue(cli.out().contains("S25"), cli.out());

        assertEquals(0, cli.run("plan", "issue", file.toString()));
        StudyPlan issued = PlanFiles.read(file);
        assertTrue(cli.out().contains(issued.revision().orElseThrow()));
        assertEquals(0, cli.run("plan", "issue", file.toString()));
        assertTrue(cli.out().contains("already issued"), cli.out());

        assertEquals(0, cli.run("plan", "show", "--json", file.toString()));
        JsonNode j = new ObjectMapper().readTree(cli.out());
        assertEquals("issued", j.get("state").asText());
        assertEquals(issued.revision().orElseThrow(), j.get("revision").asText());
        assertTrue(j.get("summary").asText().startsWith("one subgroup of 5"));
        JsonNode slots = j.get("slots");
        assertEquals(25, slots.size());
        for (String field : List.of("id", "start", "windowMinutes", "shift", "partsSinceStart")) {
            assertTrue(slots.get(0).has(field), field);
        }
        assertEquals("S01", slots.get(0).get("id").asText());
        assertEquals(OffsetDateTime.parse(slots.get(0).get("start").asText()), issued.schedule().slots().get(0).start());
    }

    @Test
    void characteristicsFromCsv() throws Exception {
        Path csv = dir.resolve("chars.csv");
        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected\n"
                + "D1,bore,mm,12.0,11.98,12.02,1.33,1.8\nR2,runout,mm,,,0.05,1.33,2.0\n");
        Path file = dir.resolve("c.json");
        assertEquals(0, cli.run("plan", "new", "--out", file.toString(), "--part", "hub", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "30", "--zone", "UTC", "--start", "2027-03-01T06:00",
                "--span-shifts", "4"), cli.err());
        StudyPlan p = PlanFiles.read(file);
        assertEquals(2, p.characteristics().size());
        assertTrue(p.characteristic("R2").orElseThrow().limits().lower().isEmpty());

        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected\nD1,bore,mm,12.0,11.98,twelve,1.33,1.8\n");
        Path bad = dir.resolve("bad.json");
        assertEquals(2, cli.run("plan", "new", "--out", bad.toString(), "--part", "hub", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "30", "--zone", "UTC", "--start", "2027-03-01T06:00"));
        assertTrue(cli.err().contains("chars.csv, row 2, column usl"), cli.err());
        assertFalse(Files.exists(bad));
    }

    @Test
    void badInputGivesOneLineExitTwoAndNoFile() {
        Path file = dir.resolve("bad.json");
        String[][] cases = {
            newPlan(file, "--start", "2027-03-06T10:00"),                       // a Saturday: outside every shift
            newPlan(file, "--until", "2027-02-27"),                             // until before the start
            newPlan(file, "--subgroups", "2000", "--span-shifts", "1"),         // slots closer than 5 parts apart
            newPlan(file, "--lsl", "25.02", "--usl", "24.98"),                  // limits reversed
            newPlan(file, "--shifts", "06:00-14:00,13:00-21:00"),               // overlapping shifts
            newPlan(file, "--zone", "Mars/Olympus"),
            newPlan(file, "--spacing", "sometimes"),
        };
        for (String[] args : cases) {
            assertEquals(2, cli.run(args), String.join(" ", args));
            String e = cli.err().trim();
            assertTrue(e.startsWith("proofrun: ") && !e.contains("\n") && !e.contains("Exception"), e);
            assertFalse(Files.exists(file), "no file for " + e);
        }
    }

    @Test
    void aCharacteristicExpectedNoBetterThanRequiredIsNamed() throws Exception {
        // R2 is expected at Cpk 1.2 against a required 1.33 (c1 <= c0): no study size can show it
        Path csv = dir.resolve("weak.csv");
        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected\n"
                + "D1,bore,mm,12.0,11.98,12.02,1.33,1.8\nR2,runout,mm,,,0.05,1.33,1.2\n");
        String before = Files.readString(csv);
        Path file = dir.resolve("weak.json");
        assertEquals(2, cli.run("plan", "new", "--out", file.toString(), "--part", "hub", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--zone", "UTC", "--start", "2027-03-01T06:00"));
        assertEquals("proofrun: " + csv + ": characteristic R2: expected Cpk 1.200 is not above the required 1.330:"
                + " no study size can show this; the process must improve first", cli.err().strip());
        assertEquals("", cli.out());
        assertFalse(Files.exists(file));
        assertEquals(before, Files.readString(csv), "the user's file is untouched");

        // one characteristic from the options: its id, no file
        assertEquals(2, cli.run("plan", "new", "--out", file.toString(), "--part", "gear shaft", "--characteristic",
                "journal diameter", "--characteristic-id", "J1", "--unit", "mm", "--lsl", "24.98", "--usl", "25.02",
                "--target", "1.33", "--expected", "1.33", "--subgroup-size", "5", "--zone", "UTC",
                "--start", "2027-03-01T06:00"));
        assertTrue(cli.err().strip().startsWith("proofrun: characteristic J1: expected Cpk 1.330 is not above"),
                cli.err());
        assertFalse(Files.exists(file));
    }

    @Test
    void anExistingFileIsNotReplacedWithoutForce() throws Exception {
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(newPlan(file)));
        byte[] before = Files.readAllBytes(file);
        assertEquals(2, cli.run(newPlan(file, "--rate", "70")));
        assertTrue(Files.readAllBytes(file).length == before.length && Arrays.equals(before, Files.readAllBytes(file)));
        assertEquals(0, cli.run("plan", "issue", file.toString()));
        assertEquals(2, cli.run(newPlan(file, "--force")));
        assertTrue(cli.err().contains("issued revision"), cli.err());
    }

    @Test
    void aResolutionWithoutAGaugeNameIsKeptAndACoarseOneIsWarned() throws Exception {
        // tolerance 0.04: a step of 0.005 is coarser than a tenth (0.004), the rule of ten (common practice)
        Path f = dir.resolve("res.json");
        assertEquals(0, cli.run(newPlan(f, "--resolution", "0.005")), cli.err());
        assertTrue(cli.out().contains("warning: C1: gauge resolution 0.005 is coarser than a tenth of the tolerance"),
                cli.out());
        StudyPlan plan = PlanFiles.read(f);
        assertEquals(0.005, plan.characteristics().get(0).gauge().orElseThrow().resolution(), 0);
        Path fine = dir.resolve("fine.json");
        assertEquals(0, cli.run(newPlan(fine, "--resolution", "0.001")), cli.err());
        assertFalse(cli.out().contains("warning"), cli.out());
        assertEquals(0.001, PlanFiles.read(fine).characteristics().get(0).gauge().orElseThrow().resolution(), 0);
    }
}
