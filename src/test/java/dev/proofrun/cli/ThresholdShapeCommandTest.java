package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.stats.ShapeFamily;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The threshold shapes on the command line: {@code plan new --shape lognormal3 --threshold 9.95}, the CSV column,
 * the plan file, {@code plan show}, {@code grade} (text and JSON name the model and threshold; a reading at or below
 * it is a finding), bad input refused in one line with exit 2 and nothing written, and {@code size --shape lognormal3}.
 * Invented part: a pin that seats against a stop at 9.95 mm, upper limit 10.10 mm.
 */
class ThresholdShapeCommandTest {

    @TempDir
    Path dir;

    private final LastRun cli = new LastRun();

    private static final UpperLimitPlan PLAN =
            new UpperLimitPlan("PR-2027-0091", "locating pin", "seat height", "10.10", "2027-03-01T06:00");

    private String[] single(Path file, String... extra) {
        return PLAN.args(file, extra);
    }

    @Test
    void aThresholdShapeIsWrittenShownAndRead() throws Exception {
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(single(file, "--shape", "lognormal3", "--threshold", "9.95")), cli.err());
        String json = Files.readString(file);
        assertTrue(json.contains("\"shape\" : \"lognormal3\",\n      \"threshold\" : 9.95,")
                || json.contains("\"shape\": \"lognormal3\",\n      \"threshold\": 9.95,"), json);
        assertEquals(ShapeFamily.LOGNORMAL3, PlanFiles.read(file).characteristics().get(0).shape());
        assertEquals(OptionalDouble.of(9.95), PlanFiles.read(file).characteristics().get(0).threshold());
        assertEquals(0, cli.run("plan", "show", file.toString()), cli.err());
        assertTrue(cli.out().contains("lognormal3, threshold 9.95"), cli.out());
    }

    @Test
    void otherShapesHaveNoThresholdInTheFile() throws Exception {
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run(single(file, "--shape", "lognormal")), cli.err());
        assertFalse(Files.readString(file).contains("threshold"));
    }

    @Test
    void badThresholdsAreRefusedInOneLineAndNothingIsWritten() {
        String[][] cases = {
            {"--shape", "lognormal3"},
            {"--shape", "weibull", "--threshold", "9.95"},
            {"--threshold", "9.95"},
            {"--shape", "weibull3", "--threshold", "10.10"},
            {"--shape", "weibull3", "--threshold", "NaN"},
        };
        String[] words = {"needs a threshold", "only taken by the shapes lognormal3 and weibull3, not weibull",
            "not normal", "must lie below the upper limit 10.1", "must be a number"};
        for (int i = 0; i < cases.length; i++) {
            Path file = dir.resolve("bad" + i + ".json");
            CommandChecks.assertRefusedInOneLine(cli, single(file, cases[i]), words[i], i == 0 ? "--shape" : "--threshold", file);
        }
    }

    @Test
    void theCharacteristicsCsvHasAThresholdColumn() throws Exception {
        Path csv = dir.resolve("chars.csv");
        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected,shape,threshold\n"
                + "D1,bore,mm,10,9.98,10.02,1.33,1.8,,\n"
                + "H2,seat height,mm,,9.90,10.10,1.33,1.8,weibull3,9.95\n", StandardCharsets.UTF_8);
        Path file = dir.resolve("p.json");
        assertEquals(0, cli.run("plan", "new", "--out", file.toString(), "--part", "pin", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin", "--start", "2027-03-01T06:00"), cli.err());
        assertEquals(List.of(OptionalDouble.empty(), OptionalDouble.of(9.95)),
                PlanFiles.read(file).characteristics().stream().map(c -> c.threshold()).toList());

        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected,shape,threshold\n"
                + "H2,seat height,mm,,,10.10,1.33,1.8,lognormal,9.95\n", StandardCharsets.UTF_8);
        Path bad = dir.resolve("q.json");
        assertEquals(2, cli.run("plan", "new", "--out", bad.toString(), "--part", "pin", "--characteristics", csv.toString(),
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin", "--start", "2027-03-01T06:00"));
        String e = cli.err().trim();
        assertTrue(e.contains("chars.csv") && e.contains("row 2") && e.contains("threshold") && e.contains("not lognormal"), e);
        assertEquals(1, e.lines().count(), e);
        assertFalse(Files.exists(bad));
    }

    /** Readings 9.95 + 0.02·exp(0.4·Z) in the fill-in layout (invented seat heights; Ppu about 3). */
    private Path returned(Path plan, long seed, String replaceFirst) throws Exception {
        return SkewedReturn.write(cli, plan, dir, seed, 9.95, 1, replaceFirst);
    }

    @Test
    void gradeNamesTheModelAndThreshold() throws Exception {
        Path plan = dir.resolve("p.json");
        assertEquals(0, cli.run(single(plan, "--shape", "lognormal3", "--threshold", "9.95", "--lsl", "9.90")), cli.err());
        Path data = returned(plan, 21L, null);
        assertEquals(0, cli.run("grade", plan.toString(), data.toString()), cli.err());
        assertTrue(cli.out().contains("C1 seat height: Demonstrated"), cli.out());
        assertTrue(cli.out().contains("under the lognormal3 model"), cli.out());
        assertTrue(cli.out().contains("fitted lognormal3 (threshold 9.95) model"), cli.out());
        assertTrue(cli.out().contains("lower limit 9.9 lies at or below the declared threshold 9.95"), cli.out());
        assertTrue(cli.out().contains("threshold 9.95 as the real stop"), cli.out());
        JsonNode j = CommandChecks.firstGradedJson(cli, plan, data);
        assertEquals("lognormal3", j.get("model").asText());
        assertEquals(9.95, j.get("threshold").asDouble(), 0);
        assertEquals("iso-22514-2-percentile", j.get("method").asText());

        String text = CommandChecks.reportText(cli, plan, data, dir.resolve("report.pdf"));
        assertTrue(text.contains("lognormal3"), text);
        assertTrue(text.contains("threshold 9.95"), text);
        assertTrue(text.contains("ln(reading \u2212 threshold)"), text);
    }

    @Test
    void aReadingAtTheThresholdIsAFinding() throws Exception {
        Path plan = dir.resolve("p.json");
        assertEquals(0, cli.run(single(plan, "--shape", "weibull3", "--threshold", "9.95")), cli.err());
        Path data = returned(plan, 22L, "9.95");
        byte[] before = Files.readAllBytes(data);
        assertEquals(0, cli.run("grade", plan.toString(), data.toString()), cli.err());
        assertTrue(cli.out().contains("C1 seat height: Not valid"), cli.out());
        assertTrue(cli.out().contains("a reading at or below the declared threshold cannot come from the planned shape (weibull3,"
                + " threshold 9.95): 9.95 in subgroup"), cli.out());
        assertTrue(cli.out().contains(", reading 2."), cli.out());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(data)));
    }

    @Test
    void sizeAcceptsTheThresholdShapesAndPlansThemAsTheTwoParameterOnes() {
        assertEquals(0, cli.run("size", "--shape", "lognormal", "--skewness", "1", "--spec", "upper", "--target", "1.33",
                "--expected", "1.67", "--subgroup-size", "5"), cli.err());
        String two = cli.out();
        assertEquals(0, cli.run("size", "--shape", "lognormal3", "--skewness", "1", "--spec", "upper", "--target", "1.33",
                "--expected", "1.67", "--subgroup-size", "5"), cli.err());
        assertTrue(cli.out().contains("note: lognormal3 is planned exactly as lognormal"), cli.out());
        // the same table: only the note differs
        assertEquals(two, cli.out().replaceAll("note: lognormal3 is planned exactly as lognormal[^\n]*\n", ""));
    }
}
