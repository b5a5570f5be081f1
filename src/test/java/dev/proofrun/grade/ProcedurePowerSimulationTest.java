package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.OcPoint;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.StudyDesigner;
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
 * The power {@code size} promises is what the grader does: studies of the recommended design, drawn from a normal,
 * stable process as expected, are put through the grader's own code ({@link CharacteristicGrader}, every step:
 * completeness, stability, shape, capability), and the share graded <em>demonstrated</em> is compared with the
 * promised power of the whole procedure. At the requirement (true index = c₀) the share may not exceed the
 * promised customer's risk by more than two standard errors.
 *
 * <p>Tolerance: 0.03, as the issue asks; with 1,000 studies the standard error of the share near 0.9 is 0.0095,
 * so 0.03 is about three standard errors. Fixed seeds, so the figures are reproducible. The full grid (three
 * designs, 1,000 studies each, and the boundary) takes a minute and is tagged {@code long}; one design with 400
 * studies runs in the default suite (tolerance 0.045, three standard errors of 0.015).
 */
class ProcedurePowerSimulationTest {

    private static final double LSL = 9.9;
    private static final double USL = 10.1;

    @Test
    void theRecommendedCentredDesignIsGradedDemonstratedAsOftenAsPromised() {
        check(Expectation.centred(1.67), 5, 400, 0.045, 11L);
    }

    @Test
    @Tag("long")
    void everyDesignOfTheIssueIsGradedDemonstratedAsOftenAsPromised() {
        check(Expectation.centred(1.67), 5, 1000, 0.03, 21L);
        check(Expectation.centred(1.67), 1, 1000, 0.03, 22L);
        check(Expectation.offCentre(1.67, 2.0), 5, 1000, 0.03, 23L);
    }

    @Test
    @Tag("long")
    void withLostSubgroupsThePromiseCountsTheAllowance() {
        DesignRequest r = request(Expectation.centred(1.67), 5).withLossRate(0.05);
        DesignRow row = StudyDesigner.design(r).recommended();
        double realised = demonstrated(row, 1.67, 1.67, 1000, 24L, 0.05);
        System.out.printf(Locale.ROOT, "procedure-power %dx%d loss rate 0.05: promised %.4f realised %.4f%n",
                row.subgroups(), row.subgroupSize(), row.power(), realised);
        assertEquals(row.power(), realised, 0.03, row.toString());
    }

    @Test
    @Tag("long")
    void atTheRequirementTheGraderPassesAtMostTheCustomersRisk() {
        DesignRequest r = request(Expectation.centred(1.67), 5);
        DesignRow row = StudyDesigner.design(r).recommended();
        int studies = 1000;
        double realised = demonstrated(row, 1.33, 1.33, studies, 31L);
        DesignTable t = StudyDesigner.design(r);
        double promised = t.operatingCharacteristic().stream().filter(p -> p.trueIndex() == 1.33)
                .mapToDouble(OcPoint::probability).findFirst().orElseThrow();
        double se = Math.sqrt(0.05 * 0.95 / studies);
        System.out.printf(Locale.ROOT, "procedure-power at c0 %dx%d: promised %.4f realised %.4f%n",
                row.subgroups(), row.subgroupSize(), promised, realised);
        assertTrue(promised <= 0.05, "promised risk " + promised);
        assertTrue(realised <= 0.05 + 2 * se, "realised " + realised);
    }

    private static DesignRequest request(Expectation e, int n) {
        return DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95), e)
                .withSubgroupSizes(List.of(n));
    }

    private static void check(Expectation e, int n, int studies, double tolerance, long seed) {
        DesignRow row = StudyDesigner.design(request(e, n)).recommended();
        double realised = demonstrated(row, e.index(), e.potentialOrIndex(), studies, seed);
        System.out.printf(Locale.ROOT, "procedure-power %dx%d Cpk %.2f Cp %.2f: promised %.4f (bound alone %.4f)"
                + " realised %.4f over %d studies%n", row.subgroups(), row.subgroupSize(), e.index(),
                e.potentialOrIndex(), row.power(), row.boundPower(), realised, studies);
        assertEquals(row.power(), realised, tolerance, row.toString());
    }

    /** The share of simulated studies the grader calls demonstrated; truth Cpk and Cp, mean above the midpoint. */
    static double demonstrated(DesignRow row, double cpk, double cp, int studies, long seed) {
        return demonstrated(row, cpk, cp, studies, seed, 0);
    }

    /** As above, each planned subgroup lost with probability lossRate (missing from the returned data). */
    static double demonstrated(DesignRow row, double cpk, double cp, int studies, long seed, double lossRate) {
        int n = row.subgroupSize();
        int k = row.subgroups();
        double sd = (USL - LSL) / (6 * cp);
        double mean = (LSL + USL) / 2 + 3 * sd * (cp - cpk);
        GradingPlan plan = TestPlans.plan(n, k, new PlannedCharacteristic("D1", "bore diameter", "mm",
                SpecLimits.twoSided(LSL, USL), null, 0, Requirement.of(IndexKind.CPK, 1.33, 0.95)));
        PlannedCharacteristic gc = plan.characteristics().get(0);
        List<String> planned = plan.slots().stream().map(PlannedSlot::id).toList();
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        int passed = 0;
        for (int s = 0; s < studies; s++) {
            List<double[]> subgroups = new ArrayList<>(k);
            List<String> slots = new ArrayList<>(k);
            for (int i = 0; i < k; i++) {
                if (lossRate > 0 && rng.nextDouble() < lossRate) {
                    continue;
                }
                slots.add(planned.get(i));
                subgroups.add(NormalReadings.subgroup(g, n, mean, sd));
            }
            int kept = subgroups.size();
            Completeness c = new Completeness(k, n, kept, 0, k - kept, (long) n * kept, 0, 0, plan.allowedShortfall());
            CharacteristicGrade grade = CharacteristicGrader.grade(gc, plan.design(), plan.interval(),
                    new ReturnedData.Collection(c, subgroups, slots));
            if (grade.verdict() == Verdict.DEMONSTRATED) {
                passed++;
            }
        }
        return passed / (double) studies;
    }
}
