package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ChartRisksTest {

    private static final double TIGHT = 1e-12;

    @Test
    void pointRatesMatchTheNormalDistribution() {
        // SciPy 1.17.1: 2*scipy.stats.norm.cdf(-3)
        assertEquals(0.0026997960632601866, ChartRisks.pointFalseAlarm(), TIGHT);
        // SciPy 1.17.1: norm.cdf(-3+1*2) + norm.cdf(-3-1*2)   (n = 4, delta = 1)
        assertEquals(0.15865554058302894, ChartRisks.pointDetection(4, 1.0), TIGHT);
    }

    @Test
    void studyFalseAlarmCompoundsOverSubgroups() {
        // SciPy 1.17.1: p = 2*norm.cdf(-3); 1-(1-p)**25 ; 1-(1-p)**100
        assertEquals(0.06535282807193832, ChartRisks.falseAlarm(25), TIGHT);
        assertEquals(0.23688360375122075, ChartRisks.falseAlarm(100), TIGHT);
    }

    @Test
    void detectionShiftsTheSecondHalf() {
        // SciPy 1.17.1: 1-(1-p)**12*(1-p1)**13 with p1 = norm.cdf(-1)+norm.cdf(-5): k = 25, n = 4, delta = 1
        assertEquals(0.8975361188486549, ChartRisks.detection(25, 4, 1.0), TIGHT);
    }
}
