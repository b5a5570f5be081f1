package dev.proofrun.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The stored stability risks are the simulations they claim to be: at a grid point the stored figures are a fresh
 * run of {@link StabilityRisk#simulated} (same seeds: equal up to the printed digits); between grid points the
 * interpolated false-unstable rate stays within the simulations' own error of a fresh run at that k (about 0.006,
 * three standard errors near 1 % from 2,000 studies). Detection is not interpolated (it steps with k): a fresh run at
 * 164 and at 165 individuals differ by far more than their error, which is why it is simulated at each row's k.
 */
class StabilityRiskTableTest {

    @Test
    void aGridPointIsAFreshSimulation() {
        StabilityRiskTable t = StabilityRiskTable.get();
        assertTrue(t.grid(5).contains(25), "the table is on the class path");
        StabilityRisk.Figures fresh = StabilityRisk.simulated(ChartKind.XBAR_R, 5, 25, 1.5);
        assertEquals(fresh.falseUnstable(), t.falseUnstable(ChartKind.XBAR_R, 5, 25).getAsDouble(), 5e-6);
        assertEquals(fresh.detection(), t.detection(ChartKind.XBAR_R, 5, 25, 1.5).getAsDouble(), 5e-5);
    }

    @Test
    void betweenGridPointsTheInterpolationIsWithinTheSimulationsError() {
        check(5, 27);
        check(1, 165);
        check(3, 57);
    }

    @Test
    void detectionStepsWithKSoItIsNotInterpolated() {
        double at164 = StabilityRisk.simulated(ChartKind.INDIVIDUALS, 1, 164, 1.5).detection();
        double at165 = StabilityRisk.simulated(ChartKind.INDIVIDUALS, 1, 165, 1.5).detection();
        // 500 studies each: standard error about 0.017; the step is several of them
        assertTrue(at164 - at165 > 0.03, at164 + " / " + at165);
    }

    @Test
    void otherChartsAndShiftsAreNotStored() {
        StabilityRiskTable t = StabilityRiskTable.get();
        assertFalse(t.falseUnstable(ChartKind.XBAR_S, 5, 25).isPresent());
        assertFalse(t.detection(ChartKind.XBAR_R, 5, 25, 1.0).isPresent());
        assertFalse(t.falseUnstable(ChartKind.XBAR_R, 5, 501).isPresent(), "beyond 2,500 readings");
    }

    private static void check(int n, int k) {
        ChartKind kind = ChartKind.forSubgroupSize(n);
        StabilityRiskTable t = StabilityRiskTable.get();
        assertFalse(t.grid(n).contains(k), "off the grid");
        StabilityRisk.Figures fresh = StabilityRisk.simulated(kind, n, k, 1.5);
        double u = t.falseUnstable(kind, n, k).getAsDouble();
        System.out.printf(Locale.ROOT, "stability-table %dx%d: u stored %.4f fresh %.4f%n", k, n, u, fresh.falseUnstable());
        assertEquals(fresh.falseUnstable(), u, 0.006);
    }
}
