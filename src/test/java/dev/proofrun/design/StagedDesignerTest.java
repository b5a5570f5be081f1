package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.util.List;
import java.util.concurrent.CancellationException;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;

/**
 * The staged designer: the spending adds up look by look, the looks' confidences, one look is the single stage
 * unchanged, and one staged design's figures hang together. The grader's own verdicts on simulated staged studies
 * are in {@code grade.StagedGradingSimulationTest}.
 */
class StagedDesignerTest {

    private static final DesignRequest DEMO = DesignRequest.of(SpecLimits.Sides.TWO_SIDED,
            Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.offCentre(1.67, 1.8))
            .withSubgroupSizes(List.of(5));

    /** The designer keeps its last designs, so the tests share this one. */
    private static StagedDesign threeLooks() {
        return StagedDesigner.design(DEMO, 5, 3, Spending.OBRIEN_FLEMING);
    }

    @Test
    void nearThePowersCeilingTheSearchStillFindsTheSmallestK() {
        // three Pocock looks at power 0.92: K = 30 falls short by so much that no single-stage K makes it up (the
        // gates hold the single stage below 0.99), the case whose search once ran on for half an hour
        DesignRequest asked = DEMO.withPower(0.92);
        StagedDesign d = StagedDesigner.design(asked, 5, 3, Spending.POCOCK);
        int k = d.stages().last().subgroups();
        assertTrue(d.power() >= 0.92, d.toString());
        assertTrue(StagedDesigner.at(asked, 5, k - 1, 3, Spending.POCOCK).power() < 0.92, "K - 1 = " + (k - 1));
        assertTrue(k > 30 && k < 60, "K = " + k);
    }

    @Test
    void aCancelledJobStopsTheSimulationAndKeepsNothing() {
        // the wizard cancels a job by interrupting its worker; the designer then stops instead of finishing
        Thread.currentThread().interrupt();
        try {
            assertThrows(CancellationException.class, () -> StagedDesigner.at(DEMO, 5, 31, 2, Spending.POCOCK));
        } finally {
            Thread.interrupted();
        }
        StagedDesign whole = StagedDesigner.at(DEMO, 5, 31, 2, Spending.POCOCK);
        assertEquals(31, whole.stages().last().subgroups());
        assertEquals(StagedDesigner.PATHS, whole.paths());
    }

    @Test
    void aDesignAskedAgainIsTheOneKeptAndAnotherRequestIsNot() {
        StagedDesign d = threeLooks();
        assertSame(d, StagedDesigner.design(DEMO, 5, 3, Spending.OBRIEN_FLEMING));
        StagedDesign lessPower = StagedDesigner.design(DEMO.withPower(0.8), 5, 3, Spending.OBRIEN_FLEMING);
        assertNotSame(d, lessPower);
        assertTrue(lessPower.stages().last().subgroups() < d.stages().last().subgroups(), lessPower.toString());
        assertSame(StagedDesigner.at(DEMO, 5, 30, 3, Spending.OBRIEN_FLEMING),
                StagedDesigner.at(DEMO, 5, 30, 3, Spending.OBRIEN_FLEMING));
    }

    @Test
    void theSpendingAddsUpLookByLook() {
        // independent uniform p-values, 20,000 studies, 3 looks: each look stops the share the function allows
        int paths = 20_000;
        int[] looks = {10, 20, 30};
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(5L);
        double[][] p = new double[3][paths];
        for (double[] look : p) {
            for (int i = 0; i < paths; i++) {
                look[i] = rng.nextDouble();
            }
        }
        for (Spending s : Spending.values()) {
            double[] levels = StagedDesigner.calibrate(0.05, s, looks, List.<double[][]>of(p), 0.15);
            boolean[] out = new boolean[paths];
            int stopped = 0;
            for (int j = 0; j < 3; j++) {
                for (int i = 0; i < paths; i++) {
                    if (!out[i] && p[j][i] <= levels[j]) {
                        out[i] = true;
                        stopped++;
                    }
                }
                long allowed = (long) Math.floor(s.spent(0.05, looks[j] / 30.0) * paths + 1e-9);
                assertTrue(stopped <= allowed && stopped >= allowed - 1, s + " look " + (j + 1) + ": " + stopped
                        + " of " + allowed);
            }
            assertEquals(Math.floor(0.05 * paths), stopped, 1.0);
        }
    }

    @Test
    void obrienFlemingSpendsLittleEarly() {
        double[] a = threeLooks().stages().looks().stream().mapToDouble(l -> 1 - l.confidence()).toArray();
        assertTrue(a[0] < a[1] && a[1] < a[2], java.util.Arrays.toString(a));
        // every look's bound is stricter than the single stage's (the risk is shared among the looks)
        for (double alpha : a) {
            assertTrue(alpha < 0.05, java.util.Arrays.toString(a));
        }
    }

    @Test
    void lookPlacementAndItsLimit() {
        assertArrayEquals(new int[] {9, 19, 28}, StagedDesigner.looks(28, 3));
        assertArrayEquals(new int[] {14, 28}, StagedDesigner.looks(28, 2));
        UserException e = assertThrows(UserException.class, () -> StagedDesigner.looks(12, 3));
        assertEquals(StagedMessage.LOOKS_TOO_CLOSE, e.key());
        assertEquals(StagedMessage.BAD_STAGES, assertThrows(UserException.class,
                () -> StagedDesigner.design(DEMO, 5, 5, Spending.POCOCK)).key());
        assertEquals(StagedMessage.STAGES_WITHOUT_LOSSES, assertThrows(UserException.class,
                () -> StagedDesigner.design(DEMO.withLossRate(0.05), 5, 2, Spending.POCOCK)).key());
    }

    @Test
    void oneLookIsTheSingleStageUnchanged() {
        DesignRow row = StudyDesigner.design(DEMO).recommended();
        StagedDesign one = StagedDesigner.design(DEMO, 5, 1, Spending.OBRIEN_FLEMING);
        assertEquals(row, one.singleStage());
        assertEquals(1, one.stages().count());
        assertEquals(new Look(row.subgroups(), 0.95, Double.NaN), one.stages().last());
        assertEquals(row.power(), one.power(), 0.0);
        assertEquals(row.readings(), one.maxReadings());
        assertEquals(row.readings(), one.expectedReadingsAtExpected(), 0.0);
        assertTrue(!one.recommended());
    }

    @Test
    void aStagedDesignsFiguresHangTogether() {
        StagedDesign d = threeLooks();
        assertEquals(3, d.looks().size());
        assertTrue(d.power() >= DEMO.power(), "power " + d.power());
        assertTrue(d.boundPower() > d.power(), "the gates cost something");
        assertTrue(d.passAtTarget() <= 0.05, "at c0 " + d.passAtTarget());
        assertTrue(d.maxReadings() >= d.singleStage().readings());
        double atTarget = 0;
        double atExpected = 0;
        for (int j = 0; j < 3; j++) {
            StagedLook l = d.looks().get(j);
            atTarget += l.stopAtTarget();
            atExpected += l.stopAtExpected();
            if (j < 2) {
                assertTrue(l.futility() < l.efficacy(), l.toString());
                assertTrue(d.looks().get(j + 1).efficacy() < l.efficacy(), "the boundary falls as readings come in");
            } else {
                assertTrue(Double.isNaN(l.futility()));
            }
        }
        assertEquals(1, atTarget, 1e-9);
        assertEquals(1, atExpected, 1e-9);
        assertTrue(d.expectedReadingsAtExpected() < d.maxReadings());
        System.out.printf(java.util.Locale.ROOT, "staged demo D1, 3 looks O'Brien-Fleming: %s; power %.4f; E[N] at c1"
                + " %.1f vs single %d (saving %.3f, extra %.3f)%n", d.stages().looks(), d.power(),
                d.expectedReadingsAtExpected(), d.singleStage().readings(), d.saving(), d.extra());
    }
}
