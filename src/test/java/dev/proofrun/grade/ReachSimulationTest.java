package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The reach rule ({@link Reach}) only makes verdicts worse, so it cannot raise the pass rate at the boundary;
 * this shows it also never fires on a study of a real process, so the pass rate at the expected index is what
 * the plan promised. Seeded simulated studies (invented data; 25 subgroups of 5, limits 9.9–10.1, Cpk ≥ 1.33 at
 * 95 %) graded through the real grader: 8 at the boundary (true Cpk 1.33, σ = 0.1 / 3.99), 8 at an expected
 * Cpk of 2.0 (σ = 0.1 / 6), 8 skewed (lognormal, relative sd 0.2 around the lower limit's side) — none has a
 * reading out of reach or a reason that says so. For a normal process the reach lies 1,000 tolerance widths
 * (8,000 σ at Cpk 1.33) beyond the limits, so even 24 studies are more than enough: the chance is 0 in double
 * arithmetic.
 */
class ReachSimulationTest {

    @TempDir
    Path dir;

    @Test
    void neverFiresOnSimulatedStudies() {
        GradingPlan plan = TestPlans.plan(5, 25, TestPlans.bore());
        Path f = dir.resolve("returned.csv");
        int graded = 0;
        for (long seed = 1; seed <= 24; seed++) {
            SimulatedReturn.Process p = seed <= 8 ? SimulatedReturn.Process.stable(10.0, 0.1 / 3.99)
                    : seed <= 16 ? SimulatedReturn.Process.stable(10.0, 0.1 / 6) : SimulatedReturn.Process.skewed(9.95, 0.2);
            SimulatedReturn.writeCsv(plan, Map.of("D1", p), seed, f);
            GradeResult r = Grader.grade(plan, f, "returned.csv");
            for (Problem problem : r.problems()) {
                assertFalse(List.of(GradeMessage.OUT_OF_REACH, GradeMessage.NOT_FINITE).contains(problem.key()), problem.toString());
            }
            CharacteristicGrade g = r.characteristics().get(0);
            assertFalse(g.reasons().stream().anyMatch(x -> x.text().contains("too far beyond the limits to compute with")),
                    g.reasons().toString());
            graded++;
        }
        assertEquals(24, graded);
    }
}
