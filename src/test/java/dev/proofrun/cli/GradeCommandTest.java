package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
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

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Run(code, out.toString(), err.toString());
    }

    @BeforeAll
    static void demo() {
        Run r = run("demo", "--out", dir.toString());
        assertEquals(0, r.code(), r.err());
        plan = dir.resolve("demo-valve-body.json");
        data = dir.resolve(DemoCommand.RETURNED);
    }

    @Test
    void demoGradesToAMixOfVerdictsWithTheCaution() {
        Run r = run("grade", plan.toString(), data.toString());
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
        Run r = run("grade", plan.toString(), data.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertEquals("PR-2027-0311", root.at("/plan/id").asText());
        assertTrue(root.at("/plan/revision").asText().matches("[0-9a-f]{12}"));
        assertTrue(root.get("problems").isArray());
        assertEquals("not-valid", root.get("verdict").asText());
        JsonNode c = root.get("characteristics").get(0);
        for (String key : List.of("id", "name", "readings", "subgroups", "subgroupSize", "mean", "sigmaWithin", "sigmaOverall",
                "cp", "cpu", "cpl", "cpk", "pp", "ppu", "ppl", "ppk", "cpm", "lower", "ppm", "control", "stabilityRatio",
                "normality", "verdict", "reasons", "additionalSubgroups")) {
            assertTrue(c.has(key), "missing key " + key);
        }
        for (String key : List.of("/lower/cp", "/lower/cpk", "/lower/pp", "/lower/ppk", "/control/location/center",
                "/control/location/ucl", "/control/location/lcl", "/control/spread/ucl", "/control/signals",
                "/normality/andersonDarling", "/normality/pValue", "/normality/model")) {
            assertFalse(c.at(key).isMissingNode(), "missing " + key);
        }
        JsonNode r4 = root.get("characteristics").get(1);
        assertEquals("inconclusive", r4.get("verdict").asText());
        assertTrue(r4.get("additionalSubgroups").asInt() > 0);
        assertTrue(r4.get("cp").isNull(), "one-sided: no Cp");
        JsonNode f7 = root.get("characteristics").get(2);
        assertTrue(f7.at("/control/signals").size() > 0);
        assertTrue(f7.at("/control/signals/0/rule").asText().matches("[a-z-]+"));
        // the chance stays numeric; the demo's step goes beyond every simulated stable study, so its P is the floor
        // 1/(S + 1) (S = 2000 simulated studies of 25 subgroups of 5) and the text says "P < 0.00050"
        assertEquals(1.0 / 2001, f7.at("/control/chance/floor").asDouble(), 1e-15);
        assertEquals(1.0 / 2001, f7.at("/control/chance/location/p").asDouble(), 1e-15);
        assertTrue(f7.at("/control/chance/location/points").asInt() > 0);
        assertTrue(f7.at("/reasons/1").asText().contains("P < 0.00050"), f7.at("/reasons/1").asText());
        assertEquals(1.0, c.at("/control/chance/location/p").asDouble(), 0.0); // D1 is quiet
    }

    @Test
    void unusableInputIsOneLineAndExitTwo() throws Exception {
        Path other = dir.resolve("other.csv");
        String text = Files.readString(data, StandardCharsets.UTF_8).replaceFirst("@[0-9a-f]{12}", "@000000000000");
        Files.writeString(other, text, StandardCharsets.UTF_8);
        Run r = run("grade", plan.toString(), other.toString());
        assertEquals(2, r.code());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        assertTrue(r.err().contains("row 2, column plan"), r.err());
        Run missing = run("grade", plan.toString(), dir.resolve("nope.csv").toString());
        assertEquals(2, missing.code());
        assertEquals(2, run("demo", "--out", dir.toString()).code());
    }

    @Test
    void aDraftPlanIsRefusedWithOneLineAndNothingPrinted() throws Exception {
        Path draft = dir.resolve("draft-plan.json");
        dev.proofrun.plan.PlanFiles.write(draft, dev.proofrun.plan.DemoPlan.draft());
        Run r = run("grade", draft.toString(), data.toString());
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
            Run r = run("grade", edited.toString(), returned.toString());
            assertEquals(2, r.code(), r.err());
            assertEquals("", r.out());
            assertEquals(1, r.err().strip().lines().count(), r.err());
            assertTrue(r.err().contains("the plan was changed after it was issued as revision"), r.err());
            assertTrue(r.err().contains(edited.toString()), r.err());
        }
    }
}
