package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.SimulatedReturn;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.stats.PivotalBound;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code grade} of a characteristic planned lognormal: the method named in text and JSON, a reading at zero. */
class GradeShapeCommandTest {

    @TempDir
    Path dir;

    private final LastRun cli = new LastRun();

    /** The lognormal face flatness, planned and issued. */
    private Path issuedPlan() {
        return issued("plan.json", new UpperLimitPlan("PR-2027-0078", "pump lid", "face flatness", "0.08", "2027-03-01T06:00"),
                "lognormal");
    }

    /** {@code plan new} of one characteristic planned with {@code shape}, written to {@code name} and issued. */
    private Path issued(String name, UpperLimitPlan planned, String shape) {
        Path plan = dir.resolve(name);
        assertEquals(0, cli.run(planned.args(plan, "--shape", shape)), cli.err());
        assertEquals(0, cli.run("plan", "issue", plan.toString()), cli.err());
        return plan;
    }

    @Test
    void aLognormalCharacteristicIsGradedByThePercentileMethod() throws Exception {
        Path plan = issuedPlan();
        Path data = dir.resolve("returned.csv");
        // invented: median 0.02 mm, sigma of ln x 0.2 -> Ppu = (0.08 - 0.02)/(0.02 e^0.6 - 0.02) = 3.7
        SimulatedReturn.writeCsv(GradingPlans.of(PlanFiles.read(plan)), Map.of("C1", SimulatedReturn.Process.skewed(0.02, 0.2)),
                11L, data);
        assertEquals(0, cli.run("grade", plan.toString(), data.toString()), cli.err());
        assertTrue(cli.out().contains("C1 face flatness: Demonstrated"), cli.out());
        assertTrue(cli.out().contains("Cpk under the lognormal model by the ISO 22514-2 percentile method, generalized pivotal bounds"), cli.out());
        assertTrue(cli.out().contains("seed " + PivotalBound.DEFAULT_SEED), cli.out());

        JsonNode j = CommandChecks.firstGradedJson(cli, plan, data);
        assertEquals("iso-22514-2-percentile", j.get("method").asText());
        assertEquals("lognormal", j.get("model").asText());
        assertEquals(PivotalBound.DEFAULT_SEED, j.get("seed").asLong());
        assertTrue(j.get("lower").asDouble() < j.get("estimate").asDouble());
        assertTrue(j.get("expectedPpm").asDouble() >= 0);
    }

    @Test
    void aFoldedNormalCharacteristicNamesItsBound() throws Exception {
        Path plan = issued("folded.json", new UpperLimitPlan("PR-2027-0079", "pump lid", "bore position", "0.2",
                "2027-03-01T06:00"), "folded-normal");
        Path data = dir.resolve("returned.csv");
        // invented: readings about 0.05 mm apart from zero, sd 0.01 (mean/sigma 5): Ppu about (0.2 - 0.05)/0.03 = 5
        SimulatedReturn.writeCsv(GradingPlans.of(PlanFiles.read(plan)), Map.of("C1", SimulatedReturn.Process.stable(0.05, 0.01)),
                13L, data);
        assertEquals(0, cli.run("grade", plan.toString(), data.toString()), cli.err());
        assertTrue(cli.out().contains("C1 bore position: Demonstrated"), cli.out());
        assertTrue(cli.out().contains("under the folded-normal model by the ISO 22514-2 percentile method, bounds at the least favourable mean/sigma"), cli.out());
        JsonNode j = CommandChecks.firstGradedJson(cli, plan, data);
        assertEquals("iso-22514-2-percentile", j.get("method").asText());
        assertEquals("folded-normal", j.get("model").asText());
        assertTrue(j.get("lower").asDouble() < j.get("estimate").asDouble());
    }

    @Test
    void aReadingAtZeroIsAFindingNotACrash() throws Exception {
        Path plan = issuedPlan();
        Path data = dir.resolve("returned.csv");
        SimulatedReturn.writeCsv(GradingPlans.of(PlanFiles.read(plan)), Map.of("C1", SimulatedReturn.Process.skewed(0.02, 0.2)),
                12L, data);
        List<String> lines = Files.readAllLines(data);
        String[] cells = lines.get(3).split(",", -1);
        cells[8] = "0";
        lines.set(3, String.join(",", cells));
        Files.write(data, lines);
        byte[] before = Files.readAllBytes(data);
        assertEquals(0, cli.run("grade", plan.toString(), data.toString()), cli.err());
        assertTrue(cli.out().contains("C1 face flatness: Not valid"), cli.out());
        assertTrue(cli.out().contains("a reading at or below zero cannot come from the planned shape (lognormal): 0.0 in subgroup "
                + cells[1] + ", reading 2"), cli.out());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(data)));
    }
}
