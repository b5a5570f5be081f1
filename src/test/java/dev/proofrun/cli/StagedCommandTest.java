package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedDesigner;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.grade.GradingPlan;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.SimulatedReturn;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code plan new --stages S [--spending ...]}, {@code plan show} and {@code grade} on a staged plan; bad stage
 * options refused in one line with exit 2 and nothing written. Invented plan: a journal diameter 24.98–25.02 mm,
 * Cpk ≥ 1.33 at 95 %, 30 subgroups of 5.
 */
class StagedCommandTest {

    @TempDir
    Path dir;

    private final LastRun cli = new LastRun();

    private int newPlan(Path file, String... extra) {
        List<String> a = new ArrayList<>(List.of("plan", "new", "--out", file.toString(), "--id", "PR-2027-0077",
                "--part", "gear shaft", "--characteristic", "journal diameter", "--unit", "mm",
                "--lsl", "24.98", "--usl", "25.02", "--target", "1.33", "--expected", "1.8",
                "--subgroup-size", "5", "--subgroups", "30", "--zone", "Europe/Berlin", "--rate", "80",
                "--span-days", "5", "--start", "2027-03-01T06:00"));
        a.addAll(List.of(extra));
        return cli.run(a.toArray(new String[0]));
    }

    @Test
    void planNewWritesTheStagedDesignersLooksAtTheGivenK() throws Exception {
        Path p = dir.resolve("staged.json");
        assertEquals(0, newPlan(p, "--stages", "3", "--spending", "pocock"), cli.err());
        assertTrue(cli.out().contains("stages: 3 looks at 10, 20, 30 subgroups"), cli.out());
        assertTrue(cli.out().contains("calibrated on the looks' joint distribution"), cli.out());
        assertTrue(cli.out().contains("stages: C1 power"), cli.out());
        Stages st = PlanFiles.read(p).stages().orElseThrow();
        assertEquals(Spending.POCOCK, st.spending());
        // the plan holds the staged designer's looks for this characteristic at the given k, nothing else
        StagedDesign designed = StagedDesigner.at(DesignRequest.of(SpecLimits.Sides.TWO_SIDED,
                new Requirement(IndexKind.CPK, 1.33, 0.95), Expectation.centred(1.8)).withPower(0.9)
                .withSubgroupSizes(List.of(5)), 5, 30, 3, Spending.POCOCK);
        assertEquals(designed.stages(), st);
        for (Look l : st.looks()) {
            assertTrue(l.confidence() > 0.95 && l.confidence() < 1, "each look is stricter than the plan's 95 %");
        }
        assertTrue(st.looks().get(0).stopsForFutility());
        assertFalse(st.last().stopsForFutility());
        assertEquals(0, cli.run("plan", "show", p.toString()));
        assertTrue(cli.out().contains("stages   3 looks, pocock spending"), cli.out());
        assertTrue(cli.out().contains("look 1 after slot S10 (stage 1: slots S01 to S10"), cli.out());
        assertEquals(0, cli.run("plan", "show", p.toString(), "--json"));
        JsonNode json = new ObjectMapper().readTree(cli.out());
        assertEquals(3, json.path("stages").path("looks").size());
    }

    @Test
    void planNewKeepsTheKimDemetsToken() throws Exception {
        Path p = dir.resolve("kim-demets.json");
        assertEquals(0, newPlan(p, "--stages", "2", "--spending", "kim-demets-2"), cli.err());
        assertTrue(Files.readString(p).contains("\"spending\": \"kim-demets-2\""));
        assertEquals(Spending.KIM_DEMETS_2, PlanFiles.read(p).stages().orElseThrow().spending());
        assertEquals(0, cli.run("plan", "show", p.toString()));
        assertTrue(cli.out().contains("stages   2 looks, kim-demets-2 spending"), cli.out());
    }

    @Test
    void oneStageWritesTheSamePlanAsBefore() throws Exception {
        Path a = dir.resolve("a.json");
        Path b = dir.resolve("b.json");
        assertEquals(0, newPlan(a, "--seed", "7"));
        assertEquals(0, newPlan(b, "--seed", "7", "--stages", "1"));
        assertEquals(Files.readString(a), Files.readString(b));
        assertFalse(Files.readString(a).contains("\"stages\""));
    }

    @Test
    void badStageOptionsAreRefusedInOneLineAndWriteNothing() {
        Path p = dir.resolve("refused.json");
        String[][] cases = {{"--stages", "5"}, {"--stages", "0"}, {"--stages", "2", "--spending", "linear"},
            {"--stages", "4", "--subgroups", "18"}, {"--spending", "pocock"}};
        String[] words = {"1 to 4 stages, not 5", "1 to 4 stages, not 0", "unknown spending function 'linear'",
            "at least 5 subgroups apart", "give --stages 2 to 4"};
        for (int i = 0; i < cases.length; i++) {
            List<String> extra = new ArrayList<>(List.of(cases[i]));
            if (extra.contains("--subgroups")) { // replaces the default 30
                int at = extra.indexOf("--subgroups");
                extra.remove(at + 1);
                extra.remove(at);
                List<String> a = new ArrayList<>(List.of("plan", "new", "--out", p.toString(), "--id", "PR-2027-0077",
                        "--part", "gear shaft", "--characteristic", "journal diameter", "--unit", "mm",
                        "--lsl", "24.98", "--usl", "25.02", "--target", "1.33", "--expected", "1.8",
                        "--subgroup-size", "5", "--subgroups", "18", "--start", "2027-03-01T06:00"));
                a.addAll(extra);
                assertEquals(2, cli.run(a.toArray(new String[0])), String.join(" ", cases[i]));
            } else {
                assertEquals(2, newPlan(p, cases[i]), String.join(" ", cases[i]));
            }
            String e = cli.err().trim();
            assertTrue(e.contains(words[i]), e);
            assertFalse(e.contains("\n") || e.contains("Exception"), e);
            assertFalse(Files.exists(p), "nothing written");
        }
    }

    @Test
    void gradeNamesTheLookAndContinueExitsOneWithRequireDemonstrated() throws Exception {
        Path p = dir.resolve("staged.json");
        assertEquals(0, newPlan(p, "--stages", "2", "--spending", "obrien-fleming"), cli.err());
        assertEquals(0, cli.run("plan", "issue", p.toString()));
        StudyPlan plan = PlanFiles.read(p);
        GradingPlan gp = GradingPlans.of(plan);
        Path returned = dir.resolve("returned.csv");
        // an invented process at Cpk 1.5, centred: stage 1 alone settles nothing at its 99.4 % bound
        SimulatedReturn.writeCsv(gp, Map.of("C1", SimulatedReturn.Process.stable(25.0, 0.02 / 4.5)), 3L, returned);
        List<String> lines = Files.readAllLines(returned);
        List<String> stageOne = new ArrayList<>(lines.subList(0, 16));
        for (String line : lines.subList(16, lines.size())) { // the rows of stage 2 come back blank
            String[] c = line.split(",", -1);
            for (int j = 4; j < c.length; j++) {
                c[j] = "";
            }
            stageOne.add(String.join(",", c));
        }
        Files.write(returned, stageOne);
        assertEquals(1, cli.run("grade", p.toString(), returned.toString(), "--require-demonstrated"), cli.err());
        String text = cli.out();
        assertTrue(text.contains("Part verdict: Continue"), text);
        assertTrue(text.contains("Graded at look 1 of 2 (after slot S15, 15 subgroups planned so far): continue,"
                + " collect stage 2, slots S16 to S30"), text);
        assertFalse(text.contains("did not come back"), "stage 2's blank rows are not missing");
        assertEquals(0, cli.run("grade", p.toString(), returned.toString(), "--json"));
        JsonNode json = new ObjectMapper().readTree(cli.out());
        assertEquals("continue", json.path("verdict").asText());
        JsonNode look = json.path("characteristics").get(0).path("look");
        assertEquals(1, look.path("number").asInt());
        assertEquals(2, look.path("of").asInt());
        assertEquals(15, look.path("subgroups").asInt());
        assertEquals(1.33, look.path("efficacy").asDouble());
        assertEquals(plan.stages().orElseThrow().looks().get(0).futility(), look.path("futility").asDouble(), 1e-12,
                "the designer's futility boundary of look 1");
        assertTrue(look.path("confidence").asDouble() > 0.95);
        assertEquals("S16", look.path("next").path("from").asText());
        Path report = dir.resolve("grade.pdf");
        assertEquals(0, cli.run("grade", p.toString(), returned.toString(), "--report", report.toString()));
        try (org.apache.pdfbox.pdmodel.PDDocument doc = org.apache.pdfbox.Loader.loadPDF(report.toFile())) {
            String pdf = new org.apache.pdfbox.text.PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertTrue(pdf.contains("Graded at look 1 of 2 (after slot S15, 15 subgroups planned so far): continue,"), pdf);
            assertTrue(pdf.contains("collect the next stage"), "the verdict's gloss");
            assertTrue(pdf.contains("Capability at look 1 of 2"), "the decisive reason");
        }
    }
}
