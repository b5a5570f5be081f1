package dev.proofrun.app.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The tick step of the design curves' x axis: the smallest 1, 2 or 5 × 10^m not below the raw step. */
class CurvePlotTest {

    @Test
    void tickStepsAreOneTwoOrFiveTimesAPowerOfTen() {
        assertEquals(10, CurvePlot.niceStep(10), 0);
        assertEquals(20, CurvePlot.niceStep(10.5), 1e-12);
        assertEquals(50, CurvePlot.niceStep(21), 1e-12);
        assertEquals(100, CurvePlot.niceStep(51), 1e-12);
        assertEquals(0.2, CurvePlot.niceStep(0.17), 1e-12);
        assertEquals(0.05, CurvePlot.niceStep(0.041), 1e-12);
        assertEquals(1, CurvePlot.niceStep(0), 0);
        assertEquals(1, CurvePlot.niceStep(Double.NaN), 0);
    }
}
