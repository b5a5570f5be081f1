package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.control.ChartStatistic;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The rearrangement property (DOMAIN.md, "Within versus overall"): the same readings dealt into subgroups
 * of similar values keep x̄ and s, so Ppk is unchanged, while the subgroups' ranges shrink: the mean chart
 * signals, Cpk rises far above Ppk, and the verdict is not valid. 125 invented readings N(10, 0.02²),
 * seed 61; the sorted deal makes Cpk several times Ppk, far from any threshold.
 */
class RearrangementTest {

    @TempDir
    Path dir;

    private GradeResult grade(GradingPlan plan, double[] x, String name) throws IOException {
        StringBuilder sb = new StringBuilder("plan,slot,characteristic,x1,x2,x3,x4,x5\n");
        for (int s = 0; s < 25; s++) {
            sb.append(plan.reference()).append(',').append(plan.slots().get(s).id()).append(",D1");
            for (int j = 0; j < 5; j++) {
                sb.append(',').append(SimulatedReturn.round(x[s * 5 + j], 0.001));
            }
            sb.append('\n');
        }
        Path f = dir.resolve(name);
        Files.write(f, sb.toString().getBytes(StandardCharsets.UTF_8));
        return Grader.grade(plan, f, name);
    }

    @Test
    void sortedSubgroupsKeepPpkButMakeCpkMeaninglessAndTheStudyNotValid() throws IOException {
        GradingPlan plan = TestPlans.plan(5, 25, TestPlans.bore());
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(61L);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        double[] x = new double[125];
        for (int i = 0; i < x.length; i++) {
            x[i] = 10 + 0.02 * g.sample();
        }
        CharacteristicGrade asTaken = grade(plan, x, "as-taken.csv").characteristics().get(0);
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        CharacteristicGrade dealt = grade(plan, sorted, "sorted.csv").characteristics().get(0);

        double ppk = asTaken.capability().indices().ppk().getAsDouble();
        assertEquals(ppk, dealt.capability().indices().ppk().getAsDouble(), 1e-12);
        assertTrue(asTaken.stability().stable(), asTaken.reasons().toString());
        assertFalse(dealt.stability().stable());
        assertTrue(dealt.stability().signals().stream().anyMatch(s -> s.chart() == ChartStatistic.MEAN));
        double cpk = dealt.capability().indices().cpk().getAsDouble();
        assertTrue(cpk > 3 * ppk, () -> "Cpk " + cpk + " vs Ppk " + ppk);
        assertEquals(Verdict.NOT_VALID, dealt.verdict());
        List<Reason> reasons = dealt.reasons();
        assertTrue(reasons.stream().anyMatch(r -> r.decisive() && r.step() == Step.STABILITY));
    }
}
