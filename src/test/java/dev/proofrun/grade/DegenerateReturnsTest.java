package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.control.ChartKind;
import dev.proofrun.control.ChartStatistic;
import dev.proofrun.control.RunRule;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntFunction;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Degenerate returns are findings in words, never a crash; signals are said as patterns. */
class DegenerateReturnsTest {

    @TempDir
    Path dir;

    private static CharacteristicGrade grade(List<double[]> subgroups) {
        int n = subgroups.get(0).length;
        int k = subgroups.size();
        GradingPlan plan = TestPlans.plan(n, k, new PlannedCharacteristic("D1", "bore diameter", "mm",
                dev.proofrun.stats.SpecLimits.twoSided(9.9, 10.1), null, 0,
                dev.proofrun.design.Requirement.of(dev.proofrun.stats.IndexKind.CPK, 1.33, 0.95)));
        List<String> slots = plan.slots().stream().map(PlannedSlot::id).toList();
        Completeness c = new Completeness(k, n, k, 0, 0, (long) n * k, 0, 0, plan.allowedShortfall());
        return CharacteristicGrader.grade(plan.characteristics().get(0), plan.design(), plan.interval(),
                new ReturnedData.Collection(c, subgroups, slots));
    }

    private static String text(CharacteristicGrade g) {
        StringBuilder sb = new StringBuilder();
        g.reasons().forEach(r -> sb.append(r.text()).append('\n'));
        return sb.toString();
    }

    /** Grades the {@code k} subgroups {@code subgroup(0..k-1)}, checks the verdict is not valid and returns the reasons. */
    private static String notValidReasons(int k, IntFunction<double[]> subgroup) {
        List<double[]> groups = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            groups.add(subgroup.apply(i));
        }
        CharacteristicGrade g = grade(groups);
        assertEquals(Verdict.NOT_VALID, g.verdict());
        return text(g);
    }

    @Test
    void constantReadingsAreAFindingNotACrash() {
        String t = notValidReasons(25, i -> new double[] {10.001, 10.001, 10.001, 10.001, 10.001});
        assertTrue(t.contains("No spread in the readings: all 125 readings are 10.001."), t);
        assertFalse(t.contains("Infinity"), t);
    }

    @Test
    void constantIndividualsAreAFindingToo() {
        String t = notValidReasons(30, i -> new double[] {10.0});
        assertTrue(t.contains("No spread in the readings: all 30 readings are 10."), t);
    }

    @Test
    void equalReadingsWithinEverySubgroupAreAFinding() {
        String t = notValidReasons(25, i -> {
            double v = 10.0 + 0.001 * (i % 3);
            return new double[] {v, v, v, v, v};
        });
        assertTrue(t.contains("No spread within the subgroups: the 5 readings of each subgroup are equal"), t);
        assertFalse(t.contains("Infinity"), t);
    }

    @Test
    void aRunIsOnePatternAndOnePointIsSingular() {
        List<SlotSignal> s = new ArrayList<>();
        for (int g = 9; g <= 16; g++) {
            s.add(new SlotSignal(ChartStatistic.MEAN, RunRule.RUN_ONE_SIDE, g, String.format("S%02d", g)));
        }
        s.add(new SlotSignal(ChartStatistic.MEAN, RunRule.BEYOND_LIMITS, 3, "S03"));
        assertEquals("beyond-limits at S03; run-one-side at S09–S16 (8 points)", SignalPatterns.describe(s));
        assertEquals(2, SignalPatterns.count(s));
        assertEquals("1 signalled point", SignalPatterns.points(1));
        assertEquals("2 signalled points", SignalPatterns.points(2));
        // through the grader: a study whose only signal is one point beyond the limits says it in the singular
        List<double[]> groups = new ArrayList<>();
        org.apache.commons.rng.UniformRandomProvider rng =
                org.apache.commons.rng.simple.RandomSource.XO_RO_SHI_RO_128_PP.create(5L);
        for (int i = 0; i < 25; i++) {
            double[] x = new double[5];
            for (int j = 0; j < 5; j++) {
                x[j] = 10 + 0.01 * (rng.nextDouble() - 0.5) + (i == 12 ? 0.02 : 0);
            }
            groups.add(x);
        }
        List<Reason> reasons = new ArrayList<>();
        Stability st = StabilityJudge.judge(ChartKind.XBAR_R, groups, TestPlans.plan(5, 25, TestPlans.bore()).slots()
                .stream().map(PlannedSlot::id).toList(), reasons);
        assertEquals(1, st.locationSignalPoints(), reasons.toString());
        assertTrue(reasons.get(0).text().contains(": 1 signalled point on the mean chart"), reasons.toString());
    }
}
