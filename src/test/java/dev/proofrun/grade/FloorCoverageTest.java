package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Threshold shapes planned with a floor (the stop is known, the real start of the readings is not) through the real
 * grader ({@link Grader#grade}, files written and read; {@link ShapeStudies}). Invented processes: readings
 * 9.95 + 0.05·(lognormal of median 1 or Weibull of scale 1), upper limit placed for the true percentile index,
 * 25 subgroups of 5, c₀ = 1.33 at 95 %, floor at the real start, 0.005 below it and 0.05 below it.
 *
 * <p>Limit at the boundary: α + 2 SE with SE = √(α(1 − α)/S): S = 100 studies, SE 0.0218, limit 0.094 (the default
 * run); S = 400 in the long run, SE 0.0109, limit 0.072.
 */
class FloorCoverageTest {

    static final double C0 = 1.33;
    static final double ALPHA = 0.05;
    static final double THETA = 9.95;

    @TempDir
    Path dir;

    static List<ShapeStudies.Case> cases(double index, double[] floors) {
        List<ShapeStudies.Case> out = new java.util.ArrayList<>();
        for (double floor : floors) {
            out.add(ShapeStudies.Case.floor(ShapeFamily.LOGNORMAL3, 0.25, THETA, floor, index, 5, 25));
            out.add(ShapeStudies.Case.floor(ShapeFamily.LOGNORMAL3, 0.5, THETA, floor, index, 5, 25));
            out.add(ShapeStudies.Case.floor(ShapeFamily.WEIBULL3, 1.5, THETA, floor, index, 5, 25));
        }
        return out;
    }

    private String atMostAlpha(List<ShapeStudies.Case> cases, int studies, long seed) {
        return ShapeStudies.assertAtMostAlpha(cases, C0, ALPHA, studies, seed, dir);
    }

    /** The floor at the real start, 0.005 below it (a tenth of the scale) and 0.05 below it (one scale). */
    static final double[] FLOORS = {THETA, 9.945, 9.90};

    @Test
    void atTheBoundaryAtMostAlphaPlusTwoStandardErrors() {
        System.out.print(atMostAlpha(cases(C0, FLOORS), 100, 1_000L));
    }

    @Test
    @Tag("long")
    void atTheBoundaryFourHundredStudiesAndThePowerAtOneSixSevenAndTwo() {
        System.out.print(atMostAlpha(cases(C0, FLOORS), 400, 50_000L));
        // the power (figures for the decision record; what it costs not to know the threshold)
        for (double index : new double[] {1.67, 2.0}) {
            for (ShapeStudies.Case c : cases(index, new double[] {THETA, 9.90})) {
                Map<Verdict, Integer> v = ShapeStudies.run(c, C0, 400, 50_000L, dir);
                System.out.println(c.label() + ": demonstrated " + v.getOrDefault(Verdict.DEMONSTRATED, 0) / 400.0 + " " + v);
            }
        }
    }

    @Test
    void aFloorAboveTheRealStartErrsOnTheSafeSide() {
        // the floor 0.005 and 0.01 above the real start 9.95 (scale 0.05): every threshold kept is above the real one,
        // which reads the readings as more skewed and lowers the bound; readings at or below the floor are findings
        System.out.print(atMostAlpha(cases(C0, new double[] {9.955, 9.96}), 100, 2_000L));
    }

    @Test
    void readingsNoThresholdAboveTheFloorFitsAreNotValidAndTheReasonSaysWhy() {
        // left-skewed readings 10.2 − 0.05·exp(0.5·Z) (invented): ln(x − θ) is left-skewed at the floor and more so above
        org.apache.commons.rng.UniformRandomProvider rng = org.apache.commons.rng.simple.RandomSource.XO_RO_SHI_RO_128_PP.create(11L);
        var z = org.apache.commons.rng.sampling.distribution.ZigguratSampler.NormalizedGaussian.of(rng);
        List<double[]> subgroups = new java.util.ArrayList<>();
        List<String> slots = new java.util.ArrayList<>();
        for (int g = 0; g < 25; g++) {
            double[] x = new double[5];
            for (int j = 0; j < 5; j++) {
                x[j] = 10.2 - 0.05 * Math.exp(0.5 * z.sample());
            }
            subgroups.add(x);
            slots.add("S" + (g + 1));
        }
        List<Reason> reasons = new java.util.ArrayList<>();
        Shape s = ShapeJudge.judgeFloor(subgroups, slots, 0, ShapeFamily.LOGNORMAL3, 9.95, 0.01,
                dev.proofrun.stats.SpecLimits.upperOnly(10.3), reasons);
        assertTrue(!s.modelFits() && s.thresholds().empty(), reasons.toString());
        assertTrue(reasons.stream().anyMatch(r -> r.text().contains("no threshold from the floor 9.95 up to the smallest reading")
                && r.text().contains("Re-plan the characteristic")), reasons.toString());
    }

    @Test
    void moreReadingsThanTheFloorIsSimulatedForAreNotValidWithTheReason() {
        List<double[]> subgroups = new java.util.ArrayList<>();
        List<String> slots = new java.util.ArrayList<>();
        for (int g = 0; g < 1001; g++) { // 5,005 readings (invented, evenly spread above 10)
            double[] x = new double[5];
            for (int j = 0; j < 5; j++) {
                x[j] = 10 + 0.001 * ((g * 5 + j) % 97) + 0.0001 * j;
            }
            subgroups.add(x);
            slots.add("S" + (g + 1));
        }
        List<Reason> reasons = new java.util.ArrayList<>();
        Shape s = ShapeJudge.judgeFloor(subgroups, slots, 0, ShapeFamily.WEIBULL3, 9.95, 0.01,
                dev.proofrun.stats.SpecLimits.upperOnly(10.3), reasons);
        assertTrue(!s.modelFits(), reasons.toString());
        assertTrue(reasons.stream().anyMatch(r -> r.decisive() && r.text().contains("not graded for 5005 readings")
                && r.text().contains("at most 5000 readings")), reasons.toString());
    }

    @Test
    void theExactThresholdsCautionPointsToTheFloor() {
        ShapeStudies.Case c = ShapeStudies.Case.threshold(ShapeFamily.LOGNORMAL3, 0.5, THETA, C0, 5, 25);
        GradingPlan plan = c.plan(C0);
        Path f = dir.resolve("one.csv");
        ShapeStudies.write(plan, c, 5_000L, f);
        CharacteristicGrade g = Grader.grade(plan, f, "one.csv").characteristics().get(0);
        assertTrue(g.reasons().stream().anyMatch(r -> r.text().contains("declare the stop as a floor instead (plan new --floor)")),
                g.reasons().toString());
    }
}
