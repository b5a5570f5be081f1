package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Look;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedDesigner;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Staged designs as the grader will run them: each simulated study is put through the grader's own code
 * ({@link CharacteristicGrader}: completeness, stability, shape, capability) at every planned look, with the readings
 * so far (the first k_j subgroups) and the requirement's confidence set to the look's ({@link Look#confidence}); it
 * stops at the first look that says demonstrated, at a look whose estimate is below the look's futility boundary,
 * at a look that is not valid (a gate voided it), or at the last look. Until the grader takes a per-look confidence
 * itself, this is what "grading at a look" means here.
 *
 * <p>At the requirement (true Cpk = c₀, off centre with Cp = 2.0 — the less favourable centring, and centred) the
 * share demonstrated may exceed α = 0.05 by at most two standard errors; at the expectation the share must reach the
 * wanted power less 0.02 and two standard errors of the share. Fixed seeds. The default suite runs one design
 * (n = 5, two looks, O'Brien–Fleming; 500 studies at c₀ off centre, 200 at c₁: a few seconds); the grid of the issue (two and three looks, both spending functions, n = 5
 * and individuals) is tagged {@code long}: {@code mvn -B test -Dlong -Dtest=StagedGradingSimulationTest}.
 */
class StagedGradingSimulationTest {

    private static final double LSL = 9.9;
    private static final double USL = 10.1;
    private static final double ALPHA = 0.05;

    @Test
    void twoLooksKeepTheRiskAndThePowerThroughTheGrader() {
        check(5, 2, Spending.OBRIEN_FLEMING, 500, 0, 200, 101L);
    }

    @Test
    @Tag("long")
    void theIssuesGridKeepsTheRiskAndThePowerThroughTheGrader() {
        long seed = 200;
        for (int n : new int[] {5, 1}) {
            for (int stages : new int[] {2, 3}) {
                for (Spending s : List.of(Spending.OBRIEN_FLEMING, Spending.POCOCK)) { // Kim–DeMets: DesignedStagesThroughGraderTest
                    check(n, stages, s, 2000, 2000, 800, seed++);
                }
            }
        }
    }

    /** Off centre at c₀ always; centred at c₀ when {@code centredStudies} &gt; 0. */
    private static void check(int n, int stages, Spending spending, int atTarget, int centredStudies, int atExpected,
            long seed) {
        DesignRequest request = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                Expectation.centred(1.67)).withSubgroupSizes(List.of(n));
        StagedDesign d = StagedDesigner.design(request, n, stages, spending);
        double offCentre = demonstrated(d, 1.33, 2.0, atTarget, seed);
        double centred = centredStudies > 0 ? demonstrated(d, 1.33, 1.33, centredStudies, seed + 1000) : Double.NaN;
        double power = demonstrated(d, 1.67, 1.67, atExpected, seed + 2000);
        double seTarget = Math.sqrt(ALPHA * (1 - ALPHA) / atTarget);
        double sePower = Math.sqrt(request.power() * (1 - request.power()) / atExpected);
        System.out.printf(Locale.ROOT, "staged %d x %d, %d looks %s (looks %s): at c0 off centre %.4f, centred %.4f"
                + " (promised %.4f, limit %.4f); at c1 %.4f (promised %.4f, floor %.4f)%n", d.maxReadings() / n, n,
                stages, spending.token(), d.stages().looks().stream().map(l -> String.valueOf(l.subgroups())).toList(),
                offCentre, centred, d.passAtTarget(), ALPHA + 2 * seTarget, power, d.power(),
                request.power() - 0.02 - 2 * sePower);
        assertTrue(offCentre <= ALPHA + 2 * seTarget, "off centre at c0: " + offCentre);
        assertTrue(!(centred > ALPHA + 2 * Math.sqrt(ALPHA * (1 - ALPHA) / centredStudies)), "centred at c0: " + centred);
        assertTrue(power >= request.power() - 0.02 - 2 * sePower, "power at c1: " + power);
    }

    /** The share of simulated staged studies the grader calls demonstrated at some look. */
    static double demonstrated(StagedDesign design, double cpk, double cp, int studies, long seed) {
        int n = design.subgroupSize();
        List<Look> looks = design.stages().looks();
        int k = design.stages().last().subgroups();
        double sd = (USL - LSL) / (6 * cp);
        double mean = (LSL + USL) / 2 + 3 * sd * (cp - cpk);
        List<GradingPlan> plans = new ArrayList<>();
        for (Look look : looks) {
            plans.add(TestPlans.plan(n, look.subgroups(), new PlannedCharacteristic("D1", "bore diameter", "mm",
                    SpecLimits.twoSided(LSL, USL), null, 0, Requirement.of(IndexKind.CPK, 1.33, look.confidence()))));
        }
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        int passed = 0;
        for (int s = 0; s < studies; s++) {
            List<double[]> subgroups = NormalReadings.subgroups(g, k, n, mean, sd);
            for (int j = 0; j < looks.size(); j++) {
                Verdict v = gradeAt(plans.get(j), subgroups.subList(0, looks.get(j).subgroups()), looks.get(j));
                if (v == Verdict.DEMONSTRATED) {
                    passed++;
                }
                if (v != null) {
                    break;
                }
            }
        }
        return passed / (double) studies;
    }

    /** The grader's verdict at a look: null when the study goes on to the next look. */
    private static Verdict gradeAt(GradingPlan plan, List<double[]> readings, Look look) {
        int k = readings.size();
        int n = readings.get(0).length;
        PlannedCharacteristic gc = plan.characteristics().get(0);
        List<String> slots = plan.slots().stream().map(PlannedSlot::id).toList();
        Completeness c = new Completeness(k, n, k, 0, 0, (long) n * k, 0, 0, plan.allowedShortfall());
        CharacteristicGrade grade = CharacteristicGrader.grade(gc, plan.design(), plan.interval(),
                new ReturnedData.Collection(c, new ArrayList<>(readings), slots));
        Verdict v = grade.verdict();
        if (v == Verdict.DEMONSTRATED || v == Verdict.NOT_VALID || !look.stopsForFutility()) {
            return v;
        }
        return grade.judged() != null && grade.judged().estimate() < look.futility() ? Verdict.NOT_DEMONSTRATED : null;
    }
}
