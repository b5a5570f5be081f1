package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** {@code size --stages S --spending F}: one stage is today's output, staged JSON's shape, bad input in one line. */
class SizeStagesCommandTest {

    @Test
    void oneStageIsTodaysOutputByteForByte() {
        String[] base = {"size", "--target", "1.33", "--expected", "1.67", "--subgroup-size", "5"};
        CommandRun plain = run(base);
        List<String> args = new ArrayList<>(List.of(base));
        args.addAll(List.of("--stages", "1", "--spending", "pocock"));
        CommandRun one = run(args.toArray(String[]::new));
        assertEquals(0, plain.code(), plain.err());
        assertEquals(plain.out(), one.out());
    }

    @Test
    void stagedJsonCarriesTheLooksAndTheirFigures() throws Exception {
        CommandRun r = run("size", "--target", "1.33", "--expected", "1.67", "--expected-cp", "1.8", "--subgroup-size", "5",
                "--stages", "2", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode staged = new ObjectMapper().readTree(r.out()).get("staged");
        assertEquals(List.of("spending", "subgroupSize", "stages", "power", "boundPower", "passAtTarget",
                "expectedReadings", "maxReadings", "singleStageReadings", "saving", "extra", "recommended", "reason",
                "simulatedStudies"), iterate(staged.fieldNames()));
        assertEquals(dev.proofrun.design.Spending.DEFAULT_TOKEN, staged.get("spending").asText(), "the default spending");
        JsonNode first = staged.get("stages").get(0);
        assertEquals(List.of("subgroups", "readings", "confidence", "efficacy", "futility", "stopAtTarget",
                "stopAtExpected"), iterate(first.fieldNames()));
        assertTrue(staged.get("stages").get(1).get("futility").isNull());
        assertEquals(5 * staged.get("stages").get(1).get("subgroups").asInt(), staged.get("maxReadings").asInt());
        assertTrue(staged.get("expectedReadings").get("atExpected").asDouble() < staged.get("maxReadings").asDouble());
        assertTrue(staged.get("power").asDouble() >= 0.9);
    }

    /**
     * Issue 14's goal on the demo's first characteristic (D1: Cpk ≥ 1.33 at 95 %, expected Cpk 1.67 with Cp 1.8,
     * n = 5): three looks with Kim–DeMets ρ = 2 spending are recommended and save at least 20 % of the single stage's
     * expected readings at c₁ for at most 20 % more at most (figures in docs/decisions/staged-studies-design.md).
     */
    @Test
    void kimDemetsLooksSaveAFifthOnTheDemosFirstCharacteristic() throws Exception {
        CommandRun r = run("size", "--target", "1.33", "--expected", "1.67", "--expected-cp", "1.8", "--subgroup-size", "5",
                "--stages", "3", "--spending", "kim-demets-2", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode staged = new ObjectMapper().readTree(r.out()).get("staged");
        assertEquals("kim-demets-2", staged.get("spending").asText());
        assertTrue(staged.get("saving").asDouble() >= 0.20, staged.toString());
        assertTrue(staged.get("extra").asDouble() <= 0.20, staged.toString());
        assertTrue(staged.get("recommended").asBoolean(), staged.toString());
        assertTrue(staged.get("power").asDouble() >= 0.9, staged.toString());
    }

    @Test
    void anUnknownSpendingNamesTheKnownOnes() {
        CommandRun r = run("size", "--target", "1.33", "--expected", "1.67", "--stages", "2", "--spending", "kim-demets-3");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("'kim-demets-3'") && r.err().contains("obrien-fleming, pocock or kim-demets-2"),
                r.err());
    }

    @Test
    void badStagesAreOneLineAndExitTwo() {
        String[][] cases = {
            {"size", "--target", "1.33", "--expected", "1.67", "--stages", "5"},
            {"size", "--target", "1.33", "--expected", "1.67", "--stages", "0"},
            {"size", "--target", "1.33", "--expected", "1.67", "--stages", "2", "--spending", "haybittle"},
            {"size", "--target", "1.33", "--expected", "2.5", "--stages", "4", "--subgroup-size", "10",
                "--min-subgroups", "10", "--min-readings", "10"},
            {"size", "--target", "1.33", "--expected", "1.67", "--stages", "2", "--loss-rate", "0.05"},
            {"size", "--target", "1.33", "--expected", "1.67", "--stages", "2", "--shape", "lognormal",
                "--skewness", "1", "--spec", "upper"},
        };
        for (String[] c : cases) {
            CommandRun r = run(c);
            assertEquals(2, r.code(), String.join(" ", c) + "\n" + r.out() + r.err());
            assertEquals("", r.out(), String.join(" ", c));
            assertEquals(1, r.err().strip().lines().count(), r.err());
            assertFalse(r.err().contains("Exception"), r.err());
        }
    }

    private static List<String> iterate(java.util.Iterator<String> it) {
        List<String> out = new ArrayList<>();
        it.forEachRemaining(out::add);
        return out;
    }
}
