package dev.proofrun.paper;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The one tick rule ({@link PlotArea#step}) of the report and the screen: the 1, 2 or 5 × 10^m step nearest the
 * raw step span / count (the usual "nice numbers" choice; common practice). Expected values worked by hand from
 * the rule.
 */
class TickStepTest {

    @Test
    void stepsAreTheNearestOneTwoOrFiveTimesAPowerOfTen() {
        assertEquals(10, PlotArea.step(10, 1), 0);
        assertEquals(10, PlotArea.step(10.5, 1), 1e-12); // mantissa 1.05 < 1.5
        assertEquals(20, PlotArea.step(21, 1), 1e-12); // 2.1 < 3
        assertEquals(50, PlotArea.step(51, 1), 1e-12); // 5.1 < 7
        assertEquals(0.2, PlotArea.step(0.17, 1), 1e-12); // 1.7
        assertEquals(0.05, PlotArea.step(0.041, 1), 1e-12); // 4.1
        assertEquals(0.1, PlotArea.step(0.075, 1), 1e-12); // 7.5 ≥ 7
        assertEquals(0.1, PlotArea.step(0.7, 5), 1e-12); // the report's bound axis: 0.14, mantissa 1.4
        assertEquals(1, PlotArea.step(0, 5), 0);
        assertEquals(1, PlotArea.step(Double.NaN, 5), 0);
    }

    @Test
    void theReportKeepsItsTicks() {
        // the report's bound block asks for 5 ticks over 1.30..2.00: every 0.1, eight of them
        List<Double> ticks = PlotArea.ticks(1.30, 2.00, 5);
        assertEquals(8, ticks.size());
        assertEquals(1.3, ticks.get(0), 1e-12);
        assertEquals(2.0, ticks.get(7), 1e-9);
    }
}
