package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import org.junit.jupiter.api.Test;

class SizeCommandTest {

    @Test
    void jsonHasTheListedShape() throws Exception {
        CommandRun r = run("size", "--target", "1.33", "--expected", "1.67", "--expected-cp", "2.0", "--json",
                "--subgroup-size", "4", "--subgroup-size", "5");
        assertEquals(0, r.code(), r.err());
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertEquals(List.of("designs", "recommended", "operatingCharacteristic", "warnings"),
                iterate(root.fieldNames()));
        JsonNode d = root.get("designs").get(0);
        assertEquals(List.of("subgroupSize", "subgroups", "readings", "power", "boundPower", "criticalEstimate",
                "degreesOfFreedom",
                "limitedBy", "falseAlarm", "detection", "shift", "anySignalFalseAlarm", "anySignalDetection"),
                iterate(d.fieldNames()));
        // the grader's stability chances are numbers, not objects; the power is the whole procedure's, so it
        // lies below the bound's alone (the gates cost something)
        assertTrue(d.get("falseAlarm").isNumber() && d.get("detection").isNumber(), d.toString());
        assertTrue(d.get("power").asDouble() < d.get("boundPower").asDouble(), d.toString());
        assertEquals(4, d.get("subgroupSize").asInt());
        assertTrue(root.get("recommended").has("reason"));
        JsonNode oc = root.get("operatingCharacteristic").get(0);
        assertEquals(List.of("trueIndex", "probability"), iterate(oc.fieldNames()));
    }

    @Test
    void theTextNamesTheRisksAtTheRequirementAndTheExpectation() {
        CommandRun r = run("size", "--target", "1.33", "--expected", "1.67", "--expected-cp", "2.0", "--subgroup-size", "5");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("true Cpk  probability"), r.out());
        // the probability printed at the expectation is the recommended row's power (captured as group 1)
        assertTrue(r.out().matches("(?s).*\\n\\s+1\\.330\\s+0\\.0\\d\\d  the requirement: the customer's risk\\n.*"), r.out());
        assertTrue(r.out().matches("(?s).*\\n\\*\\s+5\\s+\\d+\\s+\\d+\\s+(0\\.\\d{3}) .*\\n\\s+1\\.670\\s+\\1  the expected process: "
                + "the power\\n.*"), r.out());
    }

    @Test
    void limitsMeanAndSdWork() {
        CommandRun r = run("size", "--target", "1.33", "--lsl", "9.90", "--usl", "10.10", "--mean", "10.01", "--sd", "0.018",
                "--subgroup-size", "5");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Recommended"), r.out());
    }

    @Test
    void refusalsExitTwoWithOneLine() {
        CommandRun r = run("size", "--target", "1.33", "--expected", "1.2");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("the process must improve first"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertEquals("", r.out());
        CommandRun c = run("size", "--target", "1.33", "--expected", "1.67", "--confidence", "0.9999");
        assertEquals(2, c.code());
        assertTrue(c.err().contains("confidence"), c.err());
    }

    @Test
    void pilotReadingsGiveTheExpectationWithAWarning(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        // Invented demo readings: a bore of 10.00 +- 0.10 mm, 30 pilot parts, about 10.01 +- 0.018.
        StringBuilder csv = new StringBuilder("value\n");
        double[] offsets = {-0.021, 0.004, 0.017, -0.008, 0.026, -0.015, 0.009, 0.001, -0.030, 0.012};
        for (int i = 0; i < 30; i++) {
            csv.append(String.format(java.util.Locale.ROOT, "%.3f%n", 10.01 + offsets[i % 10] + 0.001 * (i % 3)));
        }
        java.nio.file.Path file = dir.resolve("pilot.csv");
        java.nio.file.Files.writeString(file, csv);
        byte[] before = java.nio.file.Files.readAllBytes(file);
        CommandRun r = run("size", "--target", "1.0", "--lsl", "9.90", "--usl", "10.10", "--pilot", file.toString(),
                "--subgroup-size", "5", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode warnings = new ObjectMapper().readTree(r.out()).get("warnings");
        assertTrue(warnings.get(0).asText().contains("pilot's own uncertainty is not in the power"), warnings.toString());
        assertTrue(java.util.Arrays.equals(before, java.nio.file.Files.readAllBytes(file)));
        CommandRun missing = run("size", "--target", "1.33", "--lsl", "9.90", "--usl", "10.10", "--pilot",
                dir.resolve("none.csv").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("none.csv"), missing.err());
    }

    private static List<String> iterate(java.util.Iterator<String> it) {
        List<String> list = new java.util.ArrayList<>();
        it.forEachRemaining(list::add);
        return list;
    }
}
