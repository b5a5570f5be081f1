package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.Look;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * At the requirement (true Cpk = c₀ = 1.33, 95 %), staged studies graded look by look through the grader's own
 * code ({@link CharacteristicGrader}: every gate, the bound at the look's confidence, {@link LookDecision}) pass
 * at most α = 0.05 of the time, plus two standard errors, over all their looks together.
 *
 * <p>The looks are hand-made, equally spaced, with look j's confidence 1 − Δα<sub>j</sub>, Δα<sub>j</sub> the α
 * the spending function spends between the looks' information fractions (a Bonferroni split: the chance of a
 * false pass at any look is at most ΣΔα<sub>j</sub> = α whatever the correlation of looks that share readings).
 * Look 1 also stops for futility below an estimate of 1.0, which can only lower the chance. Each simulated study
 * is graded at look 1 with its first subgroups and, when that says continue, at the next look with all readings
 * so far. Fixed seeds; the standard error of a share near 0.05 over S studies is √(0.05·0.95/S).
 */
class StagedBoundarySimulationTest {

    private static final double LSL = 9.9;
    private static final double USL = 10.1;
    private static final double ALPHA = 0.05;

    @Test
    void twoObrienFlemingLooksPassAtMostAlphaAtTheRequirement() {
        check(Spending.OBRIEN_FLEMING, 2, 5, 30, 500, 41L);
    }

    @ParameterizedTest(name = "{0} {1} looks of {2}")
    @CsvSource({
        "POCOCK,         2, 5, 30,  2000, 42",
        "OBRIEN_FLEMING, 3, 5, 30,  2000, 43",
        "POCOCK,         3, 5, 30,  2000, 44",
        "OBRIEN_FLEMING, 2, 1, 100, 2000, 45",
        "POCOCK,         3, 1, 100, 2000, 46",
    })
    @Tag("long")
    void everySplitKeepsAlphaAtTheRequirement(Spending spending, int looks, int n, int k, int studies, long seed) {
        check(spending, looks, n, k, studies, seed);
    }

    /** Equally spaced looks with the Bonferroni split of the spending; futility below 1.0 at every look but the last. */
    static Stages split(Spending spending, int looks, int k) {
        List<Look> list = new ArrayList<>();
        double before = 0;
        for (int j = 1; j <= looks; j++) {
            int at = (int) Math.round(k * (double) j / looks);
            double spent = j == looks ? ALPHA : spending.spent(ALPHA, at / (double) k);
            list.add(new Look(at, 1 - (spent - before), j == looks ? Double.NaN : 1.0));
            before = spent;
        }
        return new Stages(spending, list);
    }

    private static void check(Spending spending, int looks, int n, int k, int studies, long seed) {
        Stages stages = split(spending, looks, k);
        double sd = (USL - LSL) / (6 * 1.33);
        GradingPlan plan = TestPlans.plan(n, k, new PlannedCharacteristic("D1", "bore diameter", "mm",
                SpecLimits.twoSided(LSL, USL), null, 0, Requirement.of(IndexKind.CPK, 1.33, 1 - ALPHA))).withStages(stages);
        StagedStudies.Outcome o = StagedStudies.run(plan, 10.0, sd, studies, seed);
        int[] passedAt = o.passedAt();
        int[] stoppedAt = o.stoppedAt();
        int passed = java.util.Arrays.stream(passedAt).sum();
        double share = passed / (double) studies;
        double se = Math.sqrt(ALPHA * (1 - ALPHA) / studies);
        System.out.printf(Locale.ROOT, "staged-at-c0 %s %d looks %dx%d: passed %.4f (by look %s, stopped by look %s)"
                + " over %d studies, alpha %.2f + 2 SE %.4f%n", spending.token(), looks, k, n, share,
                java.util.Arrays.toString(passedAt), java.util.Arrays.toString(stoppedAt), studies, ALPHA, 2 * se);
        assertTrue(share <= ALPHA + 2 * se, "false passes " + share);
    }
}
