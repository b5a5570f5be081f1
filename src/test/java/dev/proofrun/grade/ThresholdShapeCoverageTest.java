package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The threshold shapes {@code lognormal3} and {@code weibull3} through the real grader ({@link Grader#grade}, files
 * written and read). The threshold is a declared plan value, so x − θ follows the two-parameter family and the pivotal
 * bound's coverage holds by construction; these studies check that it does. Invented processes: readings
 * 9.95 + 0.05·(lognormal or Weibull), upper limit placed so that the true percentile index is exactly the value
 * named, 25 subgroups of 5, c₀ = 1.33 at 95 %, seeds fixed.
 *
 * <p>Limit at the boundary: α + 2 SE with SE = √(α(1 − α)/S); S = 200 studies gives SE = 0.0154, limit 0.081
 * (S = 1,000 in the long run: SE = 0.0069, limit 0.064).
 */
class ThresholdShapeCoverageTest {

    static final double C0 = 1.33;
    static final double ALPHA = 0.05;
    static final double THETA = 9.95;

    @TempDir
    Path dir;

    static List<ShapeStudies.Case> boundary() {
        return List.of(
                ShapeStudies.Case.threshold(ShapeFamily.LOGNORMAL3, 0.25, THETA, C0, 5, 25),
                ShapeStudies.Case.threshold(ShapeFamily.LOGNORMAL3, 0.5, THETA, C0, 5, 25),
                ShapeStudies.Case.threshold(ShapeFamily.WEIBULL3, 1.5, THETA, C0, 5, 25));
    }

    private String atMostAlpha(List<ShapeStudies.Case> cases, int studies, long seed) {
        return ShapeStudies.assertAtMostAlpha(cases, C0, ALPHA, studies, seed, dir);
    }

    @Test
    void atTheBoundaryAtMostAlphaPlusTwoStandardErrors() {
        System.out.print(atMostAlpha(boundary(), 200, 1_000L));
    }

    @Test
    @Tag("long")
    void atTheBoundaryThousandStudies() {
        System.out.print(atMostAlpha(boundary(), 1_000, 50_000L));
        // at the expected index 1.67 (figures for the decision record; the promise is the two-parameter shape's,
        // held by PromisedShapePowerTest, and the verdicts equal the two-parameter ones draw for draw)
        for (ShapeStudies.Case c : List.of(
                ShapeStudies.Case.threshold(ShapeFamily.LOGNORMAL3, 0.25, THETA, 1.67, 5, 25),
                ShapeStudies.Case.threshold(ShapeFamily.LOGNORMAL3, 0.5, THETA, 1.67, 5, 25),
                ShapeStudies.Case.threshold(ShapeFamily.WEIBULL3, 1.5, THETA, 1.67, 5, 25))) {
            System.out.println(c.label() + ": " + ShapeStudies.run(c, C0, 1_000, 50_000L, dir));
        }
    }

    @Test
    void aKnownThresholdGradesAsTheTwoParameterShapeOnTheShiftedReadings() {
        // the index is shift-invariant and θ is not estimated: the same draws graded as lognormal3 from 9.95 and as
        // the two-parameter lognormal (readings 0.05·L) get the same verdicts, at the boundary and at index 1.67
        for (double index : new double[] {C0, 1.67}) {
            for (ShapeFamily f : new ShapeFamily[] {ShapeFamily.LOGNORMAL3, ShapeFamily.WEIBULL3}) {
                double p = f == ShapeFamily.WEIBULL3 ? 1.5 : 0.5;
                ShapeStudies.Case three = ShapeStudies.Case.threshold(f, p, THETA, index, 5, 25);
                ShapeStudies.Case two = new ShapeStudies.Case(f, p, index, 5, 25, false, 0, 0);
                Map<Verdict, Integer> a = ShapeStudies.run(three, C0, 60, 3_000L, dir);
                Map<Verdict, Integer> b = ShapeStudies.run(two, C0, 60, 3_000L, dir);
                assertEquals(b, a, f.token() + " at " + index);
            }
        }
    }

    @Test
    void aThresholdDeclaredAboveTheRealOneIsCaughtOrStaysAtMostAlpha() {
        // the process sits on 9.95 (scale 0.05); the plan declares 9.955: the fit sees a more skewed model, the index
        // is understated (measured: lognormal3 σ 0.5 2 of 200 demonstrated, weibull3 197 of 200 not valid, seed 5,000)
        List<ShapeStudies.Case> above = List.of(
                new ShapeStudies.Case(ShapeFamily.LOGNORMAL3, 0.5, C0, 5, 25, false, THETA, 9.955),
                new ShapeStudies.Case(ShapeFamily.WEIBULL3, 1.5, C0, 5, 25, false, THETA, 9.955));
        System.out.print(atMostAlpha(above, 200, 5_000L));
        // declared 9.97, above some readings: each such reading is a finding — not valid, never demonstrated
        ShapeStudies.Case high = new ShapeStudies.Case(ShapeFamily.LOGNORMAL3, 0.5, C0, 5, 25, false, THETA, 9.97);
        Map<Verdict, Integer> v = ShapeStudies.run(high, C0, 50, 6_000L, dir);
        assertEquals(Map.of(Verdict.NOT_VALID, 50), v, v.toString());
    }

    @Test
    void aThresholdDeclaredBelowTheRealOneIsNotCaughtAndTheGradeSaysSo() {
        // NOT a property we can promise: declared 9.945 for a process on 9.95 (a tenth of the scale below), the fit
        // on x − θ is less skewed than the process and its upper tail too light; measured at seed 5,000, 200 studies:
        // lognormal3 σ 0.5 26 demonstrated (0.13), weibull3 k 1.5 44 (0.22), against the limit 0.081; declared 9.90
        // lognormal3 σ 0.5: 109 (0.545). This test holds that the hazard is still there (so that a future check for
        // it shows up here) and that every such grade carries the caution.
        ShapeStudies.Case low = new ShapeStudies.Case(ShapeFamily.WEIBULL3, 1.5, C0, 5, 25, false, THETA, 9.945);
        Map<Verdict, Integer> v = ShapeStudies.run(low, C0, 200, 5_000L, dir);
        assertTrue(v.getOrDefault(Verdict.DEMONSTRATED, 0) / 200.0 > ShapeStudies.limit(ALPHA, 200), v.toString());
        GradingPlan plan = low.plan(C0);
        Path f = dir.resolve("one.csv");
        ShapeStudies.write(plan, low, 5_000L, f);
        CharacteristicGrade g = Grader.grade(plan, f, "one.csv").characteristics().get(0);
        assertTrue(g.reasons().stream().anyMatch(r -> r.text().contains("threshold 9.945 as the real stop")
                && r.text().contains("declared below the real one makes the index look better")), g.reasons().toString());
    }
}
