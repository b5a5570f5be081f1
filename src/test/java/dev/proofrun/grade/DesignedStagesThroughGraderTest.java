package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.Spending;
import dev.proofrun.design.StagedDesign;
import dev.proofrun.design.StagedDesigner;
import dev.proofrun.design.Stages;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The staged designer's looks (what {@code plan new --stages} writes), graded look by look through the grader's
 * own staged path ({@link Grader#look}, {@link CharacteristicGrader} with every gate, the bound at the look's
 * confidence and the look's futility boundary): at the requirement (true Cpk = c₀) the whole study passes at
 * most α plus two standard errors, centred and off centre (Cp 2.0); at the expected Cpk it passes at least the
 * promised power less 0.02 and two standard errors. Fixed seeds.
 */
class DesignedStagesThroughGraderTest {

    private static final double LSL = 9.9;
    private static final double USL = 10.1;
    private static final double C0 = 1.33;
    private static final double C1 = 1.67;
    private static final double ALPHA = 0.05;

    /** The default suite: two designs of subgroups of 5, 600 studies at c₀ and 300 at c₁ each. */
    @ParameterizedTest(name = "{1} {0} looks of {2}")
    @CsvSource({
        "2, OBRIEN_FLEMING, 5, 600, 300, 61",
        "3, KIM_DEMETS_2,   5, 600, 300, 71",
    })
    void stagedDesignsKeepTheRiskAndThePower(int looks, Spending spending, int n, int atTarget, int atExpected,
            long seed) {
        check(spending, looks, n, atTarget, atExpected, seed);
    }

    @ParameterizedTest(name = "{1} {0} looks of {2}")
    @CsvSource({
        "2, KIM_DEMETS_2, 5, 2000, 800, 72",
        "3, KIM_DEMETS_2, 5, 2000, 800, 73",
        "2, KIM_DEMETS_2, 1, 2000, 800, 74",
        "3, KIM_DEMETS_2, 1, 2000, 800, 75",
    })
    @Tag("long")
    void kimDemetsLooksKeepTheRiskAndThePower(int looks, Spending spending, int n, int atTarget, int atExpected,
            long seed) {
        check(spending, looks, n, atTarget, atExpected, seed);
    }

    @ParameterizedTest(name = "{1} {0} looks of {2}")
    @CsvSource({
        "2, POCOCK,         5, 2000, 800, 62",
        "3, OBRIEN_FLEMING, 5, 2000, 800, 63",
        "3, POCOCK,         5, 2000, 800, 64",
        "2, OBRIEN_FLEMING, 1, 2000, 800, 65",
        "4, POCOCK,         5, 2000, 800, 66",
    })
    @Tag("long")
    void everyDesignKeepsTheRiskAndThePower(int looks, Spending spending, int n, int atTarget, int atExpected,
            long seed) {
        check(spending, looks, n, atTarget, atExpected, seed);
    }

    private static void check(Spending spending, int looks, int n, int atTarget, int atExpected, long seed) {
        DesignRequest request = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, new Requirement(IndexKind.CPK, C0, 1 - ALPHA),
                Expectation.centred(C1)).withPower(0.9).withSubgroupSizes(List.of(n));
        StagedDesign design = StagedDesigner.design(request, n, looks, spending);
        Stages stages = design.stages();
        int k = stages.last().subgroups();
        GradingPlan plan = TestPlans.plan(n, k, new PlannedCharacteristic("D1", "bore diameter", "mm",
                SpecLimits.twoSided(LSL, USL), null, 0, Requirement.of(IndexKind.CPK, C0, 1 - ALPHA))).withStages(stages);
        double mid = (LSL + USL) / 2;
        double sdCentred = (USL - LSL) / (6 * C0);
        double sdOff = (USL - LSL) / (6 * 2.0); // Cp 2.0
        double meanOff = USL - 3 * C0 * sdOff;  // Cpk 1.33
        double se = Math.sqrt(ALPHA * (1 - ALPHA) / atTarget);
        double centred = StagedStudies.run(plan, mid, sdCentred, atTarget, seed).passed();
        double off = StagedStudies.run(plan, meanOff, sdOff, atTarget, seed + 1000).passed();
        double power = StagedStudies.run(plan, mid, (USL - LSL) / (6 * C1), atExpected, seed + 2000).passed();
        double floor = design.power() - 0.02 - 2 * Math.sqrt(design.power() * (1 - design.power()) / atExpected);
        System.out.printf(Locale.ROOT, "designed-stages %s %d looks at %s of %d: at c0 centred %.4f, off centre %.4f"
                + " (limit %.4f, %d studies); at c1 %.4f (promised %.4f, floor %.4f, %d studies)%n", spending.token(),
                looks, stages.looks().stream().map(l -> String.valueOf(l.subgroups())).toList(), n, centred, off,
                ALPHA + 2 * se, atTarget, power, design.power(), floor, atExpected);
        assertTrue(centred <= ALPHA + 2 * se, "false passes centred " + centred);
        assertTrue(off <= ALPHA + 2 * se, "false passes off centre " + off);
        assertTrue(power >= floor, "power " + power + " below the promise " + design.power());
    }
}
