package dev.proofrun.grade;

import dev.proofrun.control.ChanceSignalCounts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * When no simulated stable study reaches the observed count, the chance is not "P = 1/(S + 1)" but below it:
 * the text says "below 0.0005" with the floor computed from the number of simulated studies S, while the
 * number itself (for JSON) stays the floor.
 */
class ChanceFloorTest {

    @TempDir
    Path dir;

    @Test
    void floorIsRoundedUpToTwoDigits() {
        assertEquals("0.00050", Stability.upTwoDigits(1.0 / 2001)); // 0.00049975... rounded up
        assertEquals("0.0025", Stability.upTwoDigits(1.0 / 401)); // 0.0024938...
        assertEquals("0.00050", Stability.upTwoDigits(0.0005));
        assertEquals("below 0.0005", Stability.chanceText(1.0 / 2001, true, "%.2g"));
        assertEquals("below 0.0025", Stability.chanceText(1.0 / 401, true, "%.2g"));
        assertEquals("0.00050", Stability.chanceText(1.0 / 2001, false, "%.2g"));
        assertEquals("0.708", Stability.chanceText(0.7081, false, "%.3f"));
    }

    @Test
    void pValuesReadAsWords() {
        assertEquals("= 0.81", Stability.pText(0.8123));
        assertEquals("= 0.00023", Stability.pText(0.00023));
        assertEquals("below 0.0001", Stability.pText(2.5e-18));
        assertEquals("below 0.0001", Stability.pText(Math.nextDown(1e-4)));
        assertEquals("= 0.00010", Stability.pText(1e-4));
    }

    @Test
    void aStepBeyondEverySimulatedStudyIsReportedBelowTheFloor() {
        // 25 subgroups of 5 (invented): a mean step of 3 sigma after half the study; 125 readings per study, so
        // min(MAX_STUDIES, READINGS_BUDGET / 125) = 2000 studies are simulated and the floor is 1/2001
        GradingPlan plan = TestPlans.plan(5, 25, TestPlans.bore());
        Path f = dir.resolve("step.csv");
        SimulatedReturn.writeCsv(plan, Map.of("D1", SimulatedReturn.Process.stepping(10.0, 0.012, 0.5, 0.036)), 4L, f);
        CharacteristicGrade g = Grader.grade(plan, f, "step.csv").characteristics().get(0);
        Stability st = g.stability();
        double floor = 1.0 / (Math.min(ChanceSignalCounts.MAX_STUDIES, ChanceSignalCounts.READINGS_BUDGET / 125) + 1.0);
        assertEquals(floor, st.chanceFloor(), 0.0);
        assertTrue(st.locationAtFloor(), () -> "P = " + st.locationChance());
        assertEquals(floor, st.locationChance(), 0.0); // numeric value kept (JSON)
        assertFalse(st.spreadAtFloor());
        String text = g.reasons().stream().filter(r -> r.step() == Step.STABILITY).findFirst().orElseThrow().text();
        assertTrue(text.contains("the chance of as many or more: below 0.0005 and "), text);
        assertFalse(text.contains("0.00050"), text);
    }

    @Test
    void aNormalApproximationHasNoFloor() {
        // 2000 subgroups of 5 = 10,000 readings per study: 100 studies fit the budget, fewer than
        // EMPIRICAL_STUDIES, so the chance comes from the normal approximation and has no floor
        ChanceSignalCounts c = ChanceSignalCounts.simulate(dev.proofrun.control.ChartKind.XBAR_R, 5, 2000, StabilityJudge.rules());
        assertEquals(0.0, c.floor(), 0.0);
        ChanceSignalCounts small = ChanceSignalCounts.simulate(dev.proofrun.control.ChartKind.XBAR_R, 5, 25, StabilityJudge.rules());
        assertEquals(1.0 / 2001, small.floor(), 0.0);
    }

    @Test
    void aRepeatedSimulationGivesTheSameFigures() {
        // characteristics of one plan share n and k: the second call is answered from the cache and must equal
        // what the first computed (the simulation is seeded by n and k)
        ChanceSignalCounts a = ChanceSignalCounts.simulate(dev.proofrun.control.ChartKind.XBAR_R, 4, 30, StabilityJudge.rules());
        ChanceSignalCounts b = ChanceSignalCounts.simulate(dev.proofrun.control.ChartKind.XBAR_R, 4, 30, StabilityJudge.rules());
        ChanceSignalCounts fresh = ChanceSignalCounts.run(dev.proofrun.control.ChartKind.XBAR_R, 4, 30, StabilityJudge.rules());
        assertTrue(a == b, "answered from the cache");
        assertEquals(fresh.expectedLocation(), b.expectedLocation(), 0.0);
        assertEquals(fresh.expectedSpread(), b.expectedSpread(), 0.0);
        assertEquals(fresh.locationTail(3), b.locationTail(3), 0.0);
        assertEquals(fresh.spreadTail(1), b.spreadTail(1), 0.0);
        ChanceSignalCounts s = ChanceSignalCounts.simulate(dev.proofrun.control.ChartKind.XBAR_S, 4, 30, StabilityJudge.rules());
        assertTrue(s != a, "another chart kind is another simulation");
    }

    @Test
    void aSimulationPreparedInTheBackgroundIsTheOneUsed() {
        // prepared while a file would be read; the later call waits for it and gets the same figures as a run
        // on the calling thread
        ChanceSignalCounts.prepare(dev.proofrun.control.ChartKind.XBAR_R, 3, 40, StabilityJudge.rules());
        ChanceSignalCounts waited = ChanceSignalCounts.simulate(dev.proofrun.control.ChartKind.XBAR_R, 3, 40, StabilityJudge.rules());
        ChanceSignalCounts fresh = ChanceSignalCounts.run(dev.proofrun.control.ChartKind.XBAR_R, 3, 40, StabilityJudge.rules());
        assertEquals(fresh.expectedLocation(), waited.expectedLocation(), 0.0);
        assertEquals(fresh.locationTail(2), waited.locationTail(2), 0.0);
        assertEquals(fresh.floor(), waited.floor(), 0.0);
    }
}
