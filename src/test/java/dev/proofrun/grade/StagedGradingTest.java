package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A staged plan's return is graded at the furthest look it completes, through the whole grader (file, gates,
 * capability): demonstrated at the look, stopped for futility, or continue with the next stage's slots; slots of
 * later stages left blank are not missing; a return that stops between two looks is graded at the earlier one and
 * says so. Invented plan: the bore of {@link TestPlans}, Cpk ≥ 1.33 at 95 %, 30 subgroups of 5 with hand-made
 * looks at 15 and 30 subgroups (confidences an invented Bonferroni-style split of α = 0.05: 0.01 then 0.04;
 * futility at look 1 below an estimate of 1.20). Process means and sigmas are set for a true Cpk; fixed seeds.
 */
class StagedGradingTest {

    @TempDir
    Path dir;

    static Stages looks() {
        return new Stages(Spending.POCOCK, List.of(new Look(15, 0.99, 1.20), new Look(30, 0.96, Double.NaN)));
    }

    static GradingPlan plan() {
        return TestPlans.plan(5, 30, TestPlans.bore()).withStages(looks());
    }

    /** A centred process on 9.9..10.1 with this Cpk. */
    static SimulatedReturn.Process cpk(double c) {
        return SimulatedReturn.Process.stable(10.0, 0.1 / (3 * c));
    }

    /** A returned fill-in file with readings in the first {@code upTo} slots, the rest of the rows left blank. */
    private GradeResult graded(SimulatedReturn.Process p, long seed, int upTo) throws IOException {
        GradingPlan plan = plan();
        Path file = dir.resolve("returned-" + seed + "-" + upTo + ".csv");
        SimulatedReturn.writeCsv(plan, Map.of("D1", p), seed, file);
        List<String> lines = Files.readAllLines(file);
        List<String> out = new ArrayList<>(List.of(lines.get(0)));
        for (int i = 1; i < lines.size(); i++) {
            String[] cells = lines.get(i).split(",", -1);
            if (i > upTo) { // one characteristic: row i is slot i
                for (int c = 7; c < 12; c++) {
                    cells[c] = "";
                }
                cells[4] = "";
            }
            out.add(String.join(",", cells));
        }
        Files.write(file, out);
        return Grader.grade(plan, file, file.getFileName().toString());
    }

    private static boolean says(CharacteristicGrade g, String words) {
        return g.reasons().stream().anyMatch(r -> r.text().contains(words));
    }

    @Test
    void aClearlyCapableProcessIsDemonstratedAtTheFirstLookAndTheLaterSlotsAreNotMissing() throws IOException {
        GradeResult r = graded(cpk(2.0), 1L, 15);
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(Verdict.DEMONSTRATED, g.verdict(), g.reasons().toString());
        assertEquals(1, r.look().orElseThrow().number());
        assertEquals(0.99, g.judged().confidence());
        assertEquals(15, g.completeness().plannedSubgroups());
        assertEquals(15, g.completeness().completeSubgroups());
        assertTrue(r.problems().stream().noneMatch(p -> p.message().contains("S16")), r.problems().toString());
        assertTrue(says(g, "Capability at look 1 of 2") && says(g, "lower 99% bound"), g.reasons().toString());
    }

    @Test
    void aProcessBetweenSaysContinueWithTheNextStagesSlots() throws IOException {
        GradeResult r = graded(cpk(1.5), 2L, 15);
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(Verdict.CONTINUE, g.verdict(), g.reasons().toString());
        assertEquals(Verdict.CONTINUE, r.verdict());
        assertFalse(r.allDemonstrated(), "--require-demonstrated exits 1 for continue");
        assertTrue(g.judged().estimate() >= 1.20 && g.judged().lower() < 1.33);
        assertTrue(says(g, "continue: collect stage 2, slots S16 to S30"), g.reasons().toString());
        assertTrue(g.additionalSubgroups().isEmpty(), "no 'more subgroups' figure in a staged study");
    }

    @Test
    void aPoorProcessStopsForFutilityAtTheFirstLook() throws IOException {
        GradeResult r = graded(cpk(1.0), 3L, 15);
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(Verdict.NOT_DEMONSTRATED, g.verdict(), g.reasons().toString());
        assertTrue(g.judged().estimate() < 1.20);
        assertTrue(says(g, "below the futility boundary 1.200") && says(g, "stops here"), g.reasons().toString());
    }

    @Test
    void theLastLookDecidesWithAllReadingsAndNamesTheEarlierLook() throws IOException {
        GradeResult r = graded(cpk(1.5), 2L, 30);
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(2, r.look().orElseThrow().number());
        assertEquals(30, g.completeness().completeSubgroups());
        assertEquals(0.96, g.judged().confidence());
        assertTrue(g.verdict() == Verdict.DEMONSTRATED || g.verdict() == Verdict.NOT_DEMONSTRATED, g.verdict().token());
        assertTrue(says(g, "graded at look 2, the furthest look the file completes"), g.reasons().toString());
    }

    @Test
    void aReturnBetweenTwoLooksIsGradedAtTheEarlierAndSaysSo() throws IOException {
        GradeResult r = graded(cpk(1.5), 2L, 22);
        CharacteristicGrade g = r.characteristics().get(0);
        GradedLook look = r.look().orElseThrow();
        assertEquals(1, look.number());
        assertEquals(7, look.beyond());
        assertEquals(15, g.completeness().completeSubgroups());
        assertTrue(says(g, "7 later slots came back too (up to S22)"), g.reasons().toString());
    }

    @Test
    void aReturnShortOfTheFirstLookCountsTheSlotsNotTakenAsMissing() throws IOException {
        GradeResult r = graded(cpk(2.0), 4L, 10);
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(1, r.look().orElseThrow().number());
        assertFalse(r.look().orElseThrow().reached());
        assertEquals(5, g.completeness().missingSubgroups());
        assertEquals(Verdict.NOT_VALID, g.verdict(), "5 of 15 lost is beyond the allowance of 1");
        assertTrue(says(g, "does not reach the end of stage 1 (slot S15)"), g.reasons().toString());
    }

    @Test
    void aPassAtTheFirstLookStandsWhenTheFileGoesOnWithWorseReadings() throws IOException {
        // stage 1 as a Cpk 2.0 process, then the mean steps by 0.05 (an invented set-up change): at look 2 the
        // readings so far are unstable, but look 1 already decided
        GradeResult r = graded(SimulatedReturn.Process.stepping(10.0, 0.1 / 6, 0.5, 0.05), 1L, 30);
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(2, r.look().orElseThrow().number());
        assertEquals(Verdict.DEMONSTRATED, g.verdict(), g.reasons().toString());
        assertEquals(1, g.look().orElseThrow().number());
        assertEquals(15, g.completeness().completeSubgroups());
        assertTrue(says(g, "Decided at look 1 of 2 (after slot S15)"), g.reasons().toString());
        assertTrue(r.problems().stream().noneMatch(p -> p.message().contains("S16")), "no problem listed twice");
    }

    @Test
    void aFutilityStopAtTheFirstLookStandsWhenLaterReadingsLookBetter() throws IOException {
        // stage 1 off centre (Cpk 0.8), then the mean steps back to the centre: the stop at look 1 is final
        GradeResult r = graded(SimulatedReturn.Process.stepping(10.06, 0.1 / 6, 0.5, -0.06), 5L, 30);
        CharacteristicGrade g = r.characteristics().get(0);
        assertEquals(Verdict.NOT_DEMONSTRATED, g.verdict(), g.reasons().toString());
        assertEquals(1, g.look().orElseThrow().number());
        assertTrue(says(g, "below the futility boundary"), g.reasons().toString());
    }
}
