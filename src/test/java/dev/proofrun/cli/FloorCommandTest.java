package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.proofrun.plan.PlanFiles;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A threshold shape planned with a floor on the command line: {@code plan new --floor}, the CSV column, the plan
 * file, {@code plan show}, {@code grade} (text and JSON name the floor, the thresholds kept and where the bound was
 * reached; a reading at or below the floor is a finding), bad input refused in one line with exit 2 and nothing
 * written, {@code size --floor} refused with its reason. Invented part: a sleeve pressed against a shoulder at
 * 9.95 mm whose seated height starts somewhere above it, upper limit 10.10 mm.
 */
class FloorCommandTest {

    @TempDir
    Path dir;

    private final LastRun cli = new LastRun();

    private static final UpperLimitPlan PLAN =
            new UpperLimitPlan("PR-2027-0142", "pressed sleeve", "seated height", "10.10", "2027-05-03T06:00");

    private String[] single(Path file, String... extra) {
        return PLAN.args(file, extra);
    }

    @Test
    void aFloorIsWrittenShownAndRead() throws Exception {
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(single(file, "--shape", "lognormal3", "--floor", "9.95")), cli.err());
        assertTrue(cli.out().contains("no power is promised for a floor"), cli.out());
        assertFalse(cli.out().contains("the wanted power of"), "the design line never calls a floor's power the wanted one");
        Path sized = dir.resolve("sized.json");
        assertEquals(0, cli.run("plan", "new", "--out", sized.toString(), "--part", "pressed sleeve", "--characteristic",
                "seated height", "--unit", "mm", "--usl", "10.10", "--target", "1.33", "--expected", "1.8", "--shape",
                "lognormal3", "--floor", "9.95", "--subgroup-size", "5", "--start", "2027-05-03T06:00"), cli.err());
        assertTrue(cli.out().contains("sized as the normal model would for a power of 0.90, but no power is promised: every"
                + " characteristic is planned with a floor."), cli.out());
        String json = Files.readString(file);
        assertTrue(json.contains("\"floor\"") && !json.contains("\"threshold\""), json);
        assertEquals(OptionalDouble.of(9.95), PlanFiles.read(file).characteristics().get(0).floor());
        assertEquals(OptionalDouble.empty(), PlanFiles.read(file).characteristics().get(0).threshold());
        assertEquals(0, cli.run("plan", "show", file.toString()), cli.err());
        assertTrue(cli.out().contains("lognormal3, floor 9.95"), cli.out());
    }

    @Test
    void badFloorsAreRefusedInOneLineAndNothingIsWritten() {
        String[][] cases = {
            {"--shape", "lognormal3", "--threshold", "9.95", "--floor", "9.9"},
            {"--shape", "weibull", "--floor", "9.95"},
            {"--shape", "weibull3", "--floor", "10.10"},
            {"--shape", "weibull3", "--floor", "NaN"},
        };
        String[] words = {"give a threshold or a floor, not both", "a floor is only taken by the shapes lognormal3 and weibull3, not weibull",
            "the floor 10.1 must lie below the upper limit 10.1", "the floor must be a number"};
        for (int i = 0; i < cases.length; i++) {
            Path file = dir.resolve("bad" + i + ".json");
            CommandChecks.assertRefusedInOneLine(cli, single(file, cases[i]), words[i], "--floor", file);
        }
    }

    @Test
    void theCharacteristicsCsvHasAFloorColumn() throws Exception {
        Path csv = dir.resolve("chars.csv");
        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected,shape,threshold,floor\n"
                + "D1,bore,mm,10,9.98,10.02,1.33,1.8,,,\n"
                + "H2,seated height,mm,,,10.10,1.33,1.8,weibull3,,9.95\n", StandardCharsets.UTF_8);
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run("plan", "new", "--out", file.toString(), "--part", "sleeve", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin", "--start", "2027-05-03T06:00"), cli.err());
        assertEquals(List.of(OptionalDouble.empty(), OptionalDouble.of(9.95)),
                PlanFiles.read(file).characteristics().stream().map(c -> c.floor()).toList());
        // sized by the designer, the design line promises the power to D1 only
        Path sized = dir.resolve("sized.json");
        assertEquals(0, cli.run("plan", "new", "--out", sized.toString(), "--part", "sleeve", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--zone", "Europe/Berlin", "--start", "2027-05-03T06:00"), cli.err());
        assertTrue(cli.out().contains("the fewest readings that give every characteristic without a floor the wanted power of"
                + " 0.90 (none is promised for H2, planned with a floor)"), cli.out());

        assertEquals(0, cli.run("size", "--characteristics", csv.toString(), "--subgroup-size", "5"), cli.err());
        assertTrue(cli.out().contains("H2 is planned weibull3, floor 9.95, but its power here is the normal model's, and no"
                + " power is promised for a floor"), cli.out());

        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected,shape,threshold,floor\n"
                + "H2,seated height,mm,,,10.10,1.33,1.8,weibull3,9.95,9.95\n", StandardCharsets.UTF_8);
        Path bad = dir.resolve("q.json");
        assertEquals(2, cli.run("plan", "new", "--out", bad.toString(), "--part", "sleeve", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin", "--start", "2027-05-03T06:00"));
        String e = cli.err().trim();
        assertTrue(e.contains("chars.csv") && e.contains("row 2") && e.contains("floor") && e.contains("not both"), e);
        assertEquals(1, e.lines().count(), e);
        assertFalse(Files.exists(bad));
    }

    /** Readings 9.96 + 0.02·exp(0.4·Z): the real start 9.96 lies 0.01 above the floor (Ppu about 3). */
    private Path returned(Path plan, long seed, String replaceFirst) throws Exception {
        return SkewedReturn.write(cli, plan, dir, seed, 9.96, 2, replaceFirst);
    }

    @Test
    void gradeNamesTheFloorTheThresholdsKeptAndWhereTheBoundWasReached() throws Exception {
        Path plan = dir.resolve("p.json");
        assertEquals(0, cli.run(single(plan, "--shape", "lognormal3", "--floor", "9.95")), cli.err());
        Path data = returned(plan, 31L, null);
        assertEquals(0, cli.run("grade", plan.toString(), data.toString()), cli.err());
        String out = cli.out();
        assertTrue(out.contains("C1 seated height: "), out);
        assertTrue(out.contains("the lognormal3 model with a floor: the threshold is not known, only that it lies at or above"
                + " the floor 9.95. The readings leave thresholds from 9.95000 to "), out);
        assertTrue(out.contains("the lower bound is the least over the thresholds from 9.95000 to "), out);
        assertTrue(out.contains("fitted lognormal3 (floor 9.95; fitted at the threshold "), out);
        assertTrue(out.contains("takes 9.95 as a floor of the process's threshold"), out);
        assertFalse(out.contains("as the real stop"), out);
        JsonNode j = CommandChecks.firstGradedJson(cli, plan, data);
        assertEquals("lognormal3", j.get("model").asText());
        assertEquals(9.95, j.get("floor").asDouble(), 0);
        double from = j.get("thresholdsFrom").asDouble();
        double to = j.get("thresholdsTo").asDouble();
        double at = j.get("boundLimitedAt").asDouble();
        assertEquals(9.95, from, 0);
        double smallest = Files.readAllLines(data).stream().skip(1).flatMap(l -> java.util.Arrays.stream(l.split(",")).skip(7).limit(5))
                .mapToDouble(Double::parseDouble).min().getAsDouble();
        assertTrue(from <= at && at <= to && to < smallest, smallest + " " + j);
        assertTrue(j.get("lower").asDouble() < j.get("estimate").asDouble(), j.toString());

        String text = CommandChecks.reportText(cli, plan, data, dir.resolve("report.pdf"));
        assertTrue(text.contains("lognormal3 (floor 9.95; fitted at the threshold"), text);
        assertTrue(text.contains("the lower bound is the least over the thresholds"), text);
        assertTrue(text.contains("as a floor of the process's threshold"), text);
    }

    @Test
    void aReadingAtTheFloorIsAFinding() throws Exception {
        Path plan = dir.resolve("p.json");
        assertEquals(0, cli.run(single(plan, "--shape", "weibull3", "--floor", "9.95")), cli.err());
        Path data = returned(plan, 32L, "9.94");
        byte[] before = Files.readAllBytes(data);
        assertEquals(0, cli.run("grade", plan.toString(), data.toString()), cli.err());
        assertTrue(cli.out().contains("C1 seated height: Not valid"), cli.out());
        assertTrue(cli.out().contains("a reading at or below the declared floor cannot come from the planned shape (weibull3,"
                + " floor 9.95): 9.94 in subgroup"), cli.out());
        assertTrue(cli.out().contains(", reading 3."), cli.out());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(data)));
    }

    @Test
    void sizeRefusesAFloorAndSaysWhy() {
        assertEquals(2, cli.run("size", "--shape", "lognormal3", "--floor", "9.95", "--skewness", "1", "--spec", "upper",
                "--target", "1.33", "--expected", "1.67", "--subgroup-size", "5"));
        String e = cli.err().trim();
        assertEquals(1, e.lines().count(), e);
        assertTrue(e.contains("size does not plan a threshold shape with a floor") && e.contains("Size without --floor"), e);
        assertTrue(cli.out().isEmpty(), cli.out());
    }
}
