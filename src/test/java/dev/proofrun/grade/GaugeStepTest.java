package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ReadingGrid;
import dev.proofrun.stats.SpecLimits;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;

/**
 * The gauge's step in grading: found in the readings when the plan records none, used by the shape step, and a
 * finding of its own when too coarse. Invented hardness characteristic: 58–64 HRC, readings to 0.1 HRC.
 */
class GaugeStepTest {

    private static final double LSL = 58;
    private static final double USL = 64;

    @Test
    void theGridIsFoundInTheReadings() {
        assertEquals(0.1, ReadingGrid.step(new double[] {61.2, 60.9, 61.0, 61.5}), 1e-12);
        assertEquals(0.5, ReadingGrid.step(new double[] {61.5, 60.0, 62.5}), 1e-12);
        assertEquals(0.002, ReadingGrid.step(new double[] {22.002, 22.006, 22.004}), 1e-12);
        assertEquals(0, ReadingGrid.step(new double[] {61.23456789, 61.0}), 0);
        assertEquals(0, ReadingGrid.step(new double[] {61.0, 61.0}), 0);
    }

    /**
     * Normal readings, true Cpk 1.79 (σ = 3/(3·1.79) HRC), rounded to 0.1 HRC, plan without a recorded resolution:
     * graded as often demonstrated as the same readings unrounded (150 studies of 100 × 5; the two shares differ by
     * the rounding alone, tolerance 0.04, about three standard errors of a share near 0.9 for paired studies), and
     * almost never not valid.
     */
    @Test
    void roundedHardnessIsGradedAsTheUnroundedReadingsAre() {
        int studies = 150;
        int n = 5;
        int k = 100;
        double sd = (USL - 61) / (3 * 1.79);
        GradingPlan plan = TestPlans.plan(n, k, new PlannedCharacteristic("H1", "hardness", "HRC",
                SpecLimits.twoSided(LSL, USL), null, 0, Requirement.of(IndexKind.CPK, 1.33, 0.95)));
        List<String> slots = plan.slots().stream().map(PlannedSlot::id).toList();
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(61L);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        int roundedPassed = 0;
        int rawPassed = 0;
        int roundedNotValid = 0;
        String reasons = "";
        for (int s = 0; s < studies; s++) {
            List<double[]> raw = new ArrayList<>();
            List<double[]> rounded = new ArrayList<>();
            for (int i = 0; i < k; i++) {
                double[] x = new double[n];
                double[] r = new double[n];
                for (int j = 0; j < n; j++) {
                    x[j] = 61 + sd * g.sample();
                    r[j] = Math.round(x[j] * 10) / 10.0;
                }
                raw.add(x);
                rounded.add(r);
            }
            CharacteristicGrade gr = grade(plan, rounded, slots);
            roundedPassed += gr.verdict() == Verdict.DEMONSTRATED ? 1 : 0;
            roundedNotValid += gr.verdict() == Verdict.NOT_VALID ? 1 : 0;
            rawPassed += grade(plan, raw, slots).verdict() == Verdict.DEMONSTRATED ? 1 : 0;
            if (s == 0) {
                reasons = gr.reasons().toString();
            }
        }
        System.out.printf(Locale.ROOT, "gauge-step HRC 0.1: demonstrated rounded %.3f raw %.3f, not valid %.3f%n",
                roundedPassed / (double) studies, rawPassed / (double) studies, roundedNotValid / (double) studies);
        assertTrue(reasons.contains("Gauge: step 0.1, found in the readings"), reasons);
        assertEquals(rawPassed / (double) studies, roundedPassed / (double) studies, 0.04);
        assertTrue(roundedNotValid <= 0.03 * studies, "not valid " + roundedNotValid);
    }

    @Test
    void aStepCoarserThanTheSpreadIsItsOwnFinding() {
        // σ = 0.05 HRC read to 0.1 HRC: the readings take two or three values
        GradingPlan plan = TestPlans.plan(5, 25, new PlannedCharacteristic("H1", "hardness", "HRC",
                SpecLimits.twoSided(LSL, USL), null, 0, Requirement.of(IndexKind.CPK, 1.33, 0.95)));
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(62L);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        List<double[]> rounded = new ArrayList<>();
        for (int i = 0; i < 25; i++) {
            double[] r = new double[5];
            for (int j = 0; j < 5; j++) {
                r[j] = Math.round((61.02 + 0.05 * g.sample()) * 10) / 10.0;
            }
            rounded.add(r);
        }
        CharacteristicGrade gr = grade(plan, rounded, plan.slots().stream().map(PlannedSlot::id).toList());
        assertEquals(Verdict.NOT_VALID, gr.verdict());
        String text = gr.reasons().toString();
        assertTrue(text.contains("Gauge: the step is too coarse for this spread: step 0.1, found in the readings"), text);
        assertTrue(!text.contains("normality rejected"), text);
    }

    private static CharacteristicGrade grade(GradingPlan plan, List<double[]> subgroups, List<String> slots) {
        int n = subgroups.get(0).length;
        int k = subgroups.size();
        Completeness c = new Completeness(k, n, k, 0, 0, (long) n * k, 0, 0, plan.allowedShortfall());
        return CharacteristicGrader.grade(plan.characteristics().get(0), plan.design(), plan.interval(),
                new ReturnedData.Collection(c, subgroups, slots));
    }
}
