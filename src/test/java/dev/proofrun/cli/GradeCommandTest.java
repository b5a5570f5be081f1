package dev.proofrun.cli;

import static dev.proofrun.cli.CommandRun.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `proofrun demo` then `proofrun grade`: exit codes, JSON keys, the caution, one-line errors. */
class GradeCommandTest {

    @TempDir
    static Path dir;
    static Path plan;
    static Path data;

    @BeforeAll
    static void demo() {
        CommandRun r = run("demo", "--out", dir.toString());
        assertEquals(0, r.code(), r.err());
        plan = dir.resolve("demo-valve-body.json");
        data = dir.resolve(DemoCommand.RETURNED);
    }

    @Test
    void demoGradesToAMixOfVerdictsWithTheCaution() {
        CommandRun r = run("grade", plan.toString(), data.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("D1 bore diameter: Demonstrated"), r.out());
        assertTrue(r.out().contains("R4 surface roughness Ra: Inconclusive"), r.out());
        assertTrue(r.out().contains("F7 seat push-out force: Not valid"), r.out());
        assertTrue(r.out().contains("Part verdict: Not valid"));
        assertTrue(r.out().contains("Caution: a statistical statement under assumptions"));
    }

    @Test
    void requireDemonstratedExitsOne() {
        assertEquals(1, run("grade", plan.toString(), data.toString(), "--require-demonstrated").code());
    }

    @Test
    void jsonHasTheIssuesKeys() throws Exception {
        CommandRun r = run("grade", plan.toString(), data.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertEquals("PR-2027-0311", root.at("/plan/id").asText());
        assertTrue(root.at("/plan/revision").asText().matches("[0-9a-f]{12}"));
        assertTrue(root.get("problems").isArray());
        assertEquals("not-valid", root.get("verdict").asText());
        JsonNode c = root.get("characteristics").get(0);
        // what the verdict rests on leads, in this order
        assertEquals(List.of("id", "name", "index", "method", "model", "estimate", "lower", "upper", "required",
                "confidence", "verdict"), iterate(c.fieldNames()).subList(0, 11));
        for (String key : List.of("readings", "subgroups", "subgroupSize", "normalTheory", "control", "stabilityRatio",
                "normality", "reasons", "additionalSubgroups")) {
            assertTrue(c.has(key), "missing key " + key);
        }
        // the normal-theory figures keep estimate's keys and meanings, under their own name
        for (String key : List.of("mean", "sigmaWithin", "sigmaOverall", "cp", "cpu", "cpl", "cpk", "pp", "ppu", "ppl",
                "ppk", "cpm", "lower", "ppm")) {
            assertTrue(c.get("normalTheory").has(key), "missing normalTheory." + key);
            if (!key.equals("lower")) {
                assertFalse(c.has(key), "normal-theory key at the top level: " + key);
            }
        }
        assertFalse(c.get("lower").isObject(), "the top-level lower is the verdict's bound, a number");
        JsonNode r4json = root.get("characteristics").get(1);
        assertEquals("Cpk", r4json.get("index").asText());
        // the demo plans R4 (roughness) lognormal: the percentile index carries its verdict, normal theory does not
        assertEquals("iso-22514-2-percentile", r4json.get("method").asText());
        assertEquals("lognormal", r4json.get("model").asText());
        assertNotEquals(r4json.at("/normalTheory/cpk").asDouble(), r4json.get("estimate").asDouble(), 1e-6);
        assertFalse(r4json.at("/normalTheory/carriesVerdict").asBoolean());
        assertTrue(c.at("/normalTheory/carriesVerdict").asBoolean(), "D1 is planned normal");
        for (String key : List.of("/normalTheory/lower/cp", "/normalTheory/lower/cpk", "/normalTheory/lower/pp",
                "/normalTheory/lower/ppk", "/control/location/center",
                "/control/location/ucl", "/control/location/lcl", "/control/spread/ucl", "/control/signals",
                "/normality/andersonDarling", "/normality/pValue", "/normality/model")) {
            assertFalse(c.at(key).isMissingNode(), "missing " + key);
        }
        JsonNode r4 = root.get("characteristics").get(1);
        assertEquals("inconclusive", r4.get("verdict").asText());
        assertTrue(r4.get("additionalSubgroups").asInt() > 0);
        assertTrue(r4.at("/normalTheory/cp").isNull(), "one-sided: no Cp");
        JsonNode f7 = root.get("characteristics").get(2);
        assertTrue(f7.at("/control/signals").size() > 0);
        assertTrue(f7.at("/control/signals/0/rule").asText().matches("[a-z-]+"));
        // the chance stays numeric; the demo's step goes beyond every simulated stable study, so its P is the floor
        // 1/(S + 1) (S = 2000 simulated studies of 25 subgroups of 5) and the text says "below 0.0005"
        assertEquals(1.0 / 2001, f7.at("/control/chance/floor").asDouble(), 1e-15);
        assertEquals(1.0 / 2001, f7.at("/control/chance/location/p").asDouble(), 1e-15);
        assertTrue(f7.at("/control/chance/location/points").asInt() > 0);
        assertTrue(f7.at("/reasons/1").asText().contains("chance of as many or more: below 0.0005 and "),
                f7.at("/reasons/1").asText());
        assertEquals(1.0, c.at("/control/chance/location/p").asDouble(), 0.0); // D1 is quiet
    }

    @Test
    void unusableInputIsOneLineAndExitTwo() throws Exception {
        Path other = dir.resolve("other.csv");
        String text = Files.readString(data, StandardCharsets.UTF_8).replaceFirst("@[0-9a-f]{12}", "@000000000000");
        Files.writeString(other, text, StandardCharsets.UTF_8);
        CommandRun r = run("grade", plan.toString(), other.toString());
        assertEquals(2, r.code());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("row 2, column plan"), r.err());
        CommandRun missing = run("grade", plan.toString(), dir.resolve("nope.csv").toString());
        assertEquals(2, missing.code());
        assertEquals(2, run("demo", "--out", dir.toString()).code());
    }

    @Test
    void aDraftPlanIsRefusedWithOneLineAndNothingPrinted() throws Exception {
        Path draft = dir.resolve("draft-plan.json");
        dev.proofrun.plan.PlanFiles.write(draft, dev.proofrun.plan.DemoPlan.draft());
        CommandRun r = run("grade", draft.toString(), data.toString());
        assertEquals(2, r.code());
        assertEquals("", r.out());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("the plan is a draft; grade against the issued plan"), r.err());
    }

    /**
     * The revision of the plan is checked while the returned file is read; a plan changed after issue is still
     * refused with that one line, before any refusal of the returned file and before anything is printed.
     */
    @Test
    void aPlanChangedAfterIssueIsRefusedBeforeTheReturnedFile() throws Exception {
        Path edited = dir.resolve("edited-plan.json");
        String text = Files.readString(plan, StandardCharsets.UTF_8);
        String changed = text.replaceFirst("\"name\": \"[^\"]*\"", "\"name\": \"another part name\"");
        assertTrue(!changed.equals(text));
        Files.writeString(edited, changed, StandardCharsets.UTF_8);
        for (Path returned : new Path[] {data, dir.resolve("nope.csv"), dir.resolve("wrong.ods")}) {
            CommandRun r = run("grade", edited.toString(), returned.toString());
            assertEquals(2, r.code(), r.err());
            assertEquals("", r.out());
            assertEquals(1, r.err().strip().lines().count(), r.err());
            assertTrue(r.err().contains("the plan was changed after it was issued as revision"), r.err());
            assertTrue(r.err().contains(edited.toString()), r.err());
        }
    }

    @Test
    void constantReadingsAreGradedInWordsWithExitZero() throws Exception {
        // the demo's return with every D1 reading set to 22.001: no spread at all
        StringBuilder sb = new StringBuilder();
        for (String line : Files.readAllLines(data, StandardCharsets.UTF_8)) {
            String[] f = line.split(",", -1);
            if (f.length > 11 && f[2].equals("D1")) {
                for (int c = 7; c <= 11; c++) {
                    f[c] = "22.001";
                }
                line = String.join(",", f);
            }
            sb.append(line).append('\n');
        }
        Path constant = dir.resolve("constant.csv");
        Files.writeString(constant, sb.toString(), StandardCharsets.UTF_8);
        CommandRun text = run("grade", plan.toString(), constant.toString());
        assertEquals(0, text.code(), text.err());
        assertTrue(text.out().contains("No spread in the readings: all 125 readings are 22.001."), text.out());
        assertFalse(text.out().contains("Infinity") || text.err().contains("Exception"), text.out() + text.err());
        CommandRun json = run("grade", plan.toString(), constant.toString(), "--json", "--report",
                dir.resolve("constant.pdf").toString());
        assertEquals(0, json.code(), json.err());
        JsonNode d1 = new ObjectMapper().readTree(json.out()).get("characteristics").get(0);
        assertEquals("not-valid", d1.get("verdict").asText());
        assertTrue(d1.get("estimate").isNull(), d1.toString());
    }

    private static List<String> iterate(java.util.Iterator<String> it) {
        List<String> out = new java.util.ArrayList<>();
        it.forEachRemaining(out::add);
        return out;
    }
}
