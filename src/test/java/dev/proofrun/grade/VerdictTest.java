package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Each verdict from a seeded simulated study (invented data; 25 subgroups of 5, limits 9.9–10.1, Cpk ≥ 1.33
 * at 95 %). The true process is chosen far enough from the boundary of each verdict that the seed is not
 * what decides it: demonstrated at true Cpk 2.2, inconclusive at true Cpk 1.45 (the 95 % bound from 125
 * readings is about 0.19 below the estimate), not demonstrated at true Cpk 0.83, not valid with a mean
 * step of 3 σ after half of the study.
 */
class VerdictTest {

    @TempDir
    Path dir;

    private CharacteristicGrade run(SimulatedReturn.Process p, long seed) {
        GradingPlan plan = TestPlans.plan(5, 25, TestPlans.bore());
        Path f = dir.resolve("returned.csv");
        SimulatedReturn.writeCsv(plan, Map.of("D1", p), seed, f);
        GradeResult r = Grader.grade(plan, f, "returned.csv");
        assertTrue(r.problems().isEmpty(), () -> r.problems().toString());
        return r.characteristics().get(0);
    }

    @Test
    void demonstrated() {
        CharacteristicGrade g = run(SimulatedReturn.Process.stable(10.0, 0.015), 1L);
        assertEquals(Verdict.DEMONSTRATED, g.verdict(), g.reasons().toString());
        assertTrue(g.judged().lower() >= 1.33);
        assertTrue(g.stability().stable());
    }

    @Test
    void inconclusiveSaysHowManyMoreSubgroups() {
        CharacteristicGrade g = run(SimulatedReturn.Process.stable(10.0, 0.023), 2L);
        assertEquals(Verdict.INCONCLUSIVE, g.verdict(), g.reasons().toString());
        assertTrue(g.judged().estimate() >= 1.33 && g.judged().lower() < 1.33);
        assertTrue(g.additionalSubgroups().isPresent());
        assertTrue(g.additionalSubgroups().getAsInt() > 0);
        assertTrue(g.reasons().stream().anyMatch(r -> r.text().startsWith("About " + g.additionalSubgroups().getAsInt()
                + " more subgroups")), g.reasons().toString());
        // the figure is a planning figure: re-grading more data is a new look, and the sound way on is named
        assertTrue(g.reasons().stream().anyMatch(r -> r.text().contains("second look at the same question")));
        assertTrue(g.reasons().get(g.reasons().size() - 1).text().contains("Proschan & Hunsberger 1995"));
    }

    @Test
    void notDemonstratedSaysWhetherEvenTheUpperBoundIsBelow() {
        CharacteristicGrade g = run(SimulatedReturn.Process.stable(10.0, 0.04), 3L);
        assertEquals(Verdict.NOT_DEMONSTRATED, g.verdict(), g.reasons().toString());
        assertTrue(g.judged().upper() < 1.33);
        assertTrue(g.reasons().stream().anyMatch(r -> r.text().startsWith("Even the upper bound")));
    }

    @Test
    void notValidWhenTheMeanSteps() {
        CharacteristicGrade g = run(SimulatedReturn.Process.stepping(10.0, 0.012, 0.5, 0.036), 4L);
        assertEquals(Verdict.NOT_VALID, g.verdict(), g.reasons().toString());
        assertFalse(g.stability().stable());
        assertTrue(g.stability().locationSignalPoints() > g.stability().expectedLocationByChance());
        assertEquals(Step.STABILITY, g.reasons().stream().filter(Reason::decisive).findFirst().get().step());
    }

    @Test
    void largeStudyGradesTheShapeBesideTheChartsWithTheReasonsInOrder() {
        // 12,000 subgroups of 5 = 60,000 readings: above CharacteristicGrader.PARALLEL_READINGS, so the shape step
        // runs on its own thread; the reasons must still come in the order of the steps, each step present
        int k = 12_000;
        assertTrue(5L * k >= CharacteristicGrader.PARALLEL_READINGS);
        GradingPlan plan = TestPlans.plan(5, k, TestPlans.bore());
        Path f = dir.resolve("large.csv");
        SimulatedReturn.writeCsv(plan, Map.of("D1", SimulatedReturn.Process.stable(10.0, 0.015)), 5L, f);
        CharacteristicGrade g = Grader.grade(plan, f, "large.csv").characteristics().get(0);
        assertEquals(Verdict.DEMONSTRATED, g.verdict(), g.reasons().toString());
        for (int i = 1; i < g.reasons().size(); i++) {
            assertTrue(g.reasons().get(i - 1).step().compareTo(g.reasons().get(i).step()) <= 0, g.reasons().toString());
        }
        for (Step step : Step.values()) {
            assertTrue(g.reasons().stream().anyMatch(r -> r.step() == step), step + " missing: " + g.reasons());
        }
        // the same file graded again gives the same sentences (each step seeded on its own)
        CharacteristicGrade again = Grader.grade(plan, f, "large.csv").characteristics().get(0);
        assertEquals(g.reasons(), again.reasons());
    }
}
