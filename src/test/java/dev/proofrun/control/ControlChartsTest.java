package dev.proofrun.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Limits from the data against an independent computation: SciPy 1.17.1 / NumPy 2.4.6, with d2, d3 by
 * scipy.integrate.quad / dblquad over the normal distribution and c4 from scipy.special.gamma, then the
 * textbook formulas (x̿ ± 3R̄/(d2√n), D3/D4 from d3/d2, ...). The script is quoted per case. The published
 * factors (ASTM E2587, Montgomery ISQC Appendix VI) are checked at their printed three decimals — from memory.
 */
class ControlChartsTest {

    private static final double TIGHT = 1e-9;
    private static final double PRINTED = 5e-4;

    private static final double[][] RING = {
        {10.02, 10.05, 9.98, 10.01, 10.03}, {10.00, 9.97, 10.04, 10.02, 9.99}, {10.06, 10.01, 10.03, 10.00, 10.04},
        {9.96, 10.00, 9.99, 10.02, 9.98}, {10.03, 10.05, 10.02, 10.07, 10.01}, {9.99, 10.02, 10.00, 9.97, 10.03},
        {10.01, 10.04, 9.98, 10.02, 10.00}, {10.02, 9.99, 10.03, 10.05, 10.01}};

    private static List<double[]> rows(double[][] a) {
        List<double[]> out = new ArrayList<>();
        for (double[] r : a) {
            out.add(r.clone());
        }
        return out;
    }

    @Test
    void meanAndRangeLimits() {
        ChartPair p = ControlCharts.of(ChartKind.XBAR_R, rows(RING), EnumSet.allOf(RunRule.class));
        // SciPy 1.17.1: xbb = A.mean(); Rb = (A.max(1)-A.min(1)).mean(); ucl = xbb + 3*Rb/d2(5)/sqrt(5)
        assertEquals(10.0135, p.location().center(), TIGHT);
        assertEquals(10.0495512083803, p.location().ucl(), TIGHT);
        assertEquals(9.97744879161968, p.location().lcl(), TIGHT);
        // range chart: Rb, Rb + 3*d3(5)*Rb/d2(5), max(0, ...)
        assertEquals(0.0625, p.spread().center(), TIGHT);
        assertEquals(0.132156196568493, p.spread().ucl(), TIGHT);
        assertEquals(0.0, p.spread().lcl(), 0.0);
        // ASTM E2587 factors for n = 5 (from memory): A2 = 0.577, D4 = 2.114, D3 = 0
        assertEquals(0.577, (p.location().ucl() - p.location().center()) / p.spread().center(), PRINTED);
        assertEquals(2.114, p.spread().ucl() / p.spread().center(), PRINTED);
        assertTrue(p.location().signals().isEmpty());
    }

    @Test
    void meanAndStandardDeviationLimits() {
        double[][] b = {{50.0, 50.6, 49.5, 48.2, 49.1, 48.0, 50.1, 52.7, 49.0, 48.8, 51.0, 50.7},
            {50.2, 48.1, 49.9, 51.4, 47.3, 49.1, 46.2, 47.4, 46.3, 49.5, 47.5, 50.5},
            {50.3, 49.6, 45.0, 48.9, 49.9, 50.2, 46.9, 49.0, 48.0, 48.4, 52.1, 48.4},
            {49.9, 51.8, 48.8, 49.8, 50.2, 50.1, 47.5, 50.2, 52.7, 46.9, 51.7, 50.2},
            {48.7, 54.0, 51.5, 47.6, 50.1, 51.2, 49.6, 51.4, 49.9, 51.3, 52.9, 48.6},
            {50.4, 49.1, 50.3, 47.6, 48.8, 49.6, 51.8, 52.3, 47.4, 48.4, 51.3, 46.0}};
        ChartPair p = ControlCharts.of(ChartKind.XBAR_S, rows(b), EnumSet.allOf(RunRule.class));
        // SciPy 1.17.1: sb = B.std(1, ddof=1).mean(); sig = sb/c4(12); B.mean() +- 3*sig/sqrt(12)
        assertEquals(49.5472222222222, p.location().center(), TIGHT);
        assertEquals(51.0648674654851, p.location().ucl(), TIGHT);
        assertEquals(48.0295769789594, p.location().lcl(), TIGHT);
        // s chart: sb +- 3*sig*sqrt(1 - c4^2)
        assertEquals(1.71310020914673, p.spread().center(), TIGHT);
        assertEquals(2.82059922656069, p.spread().ucl(), TIGHT);
        assertEquals(0.60560119173277, p.spread().lcl(), TIGHT);
        // ASTM E2587 factors for n = 12 (from memory): A3 = 0.886, B3 = 0.354, B4 = 1.646
        assertEquals(0.886, (p.location().ucl() - p.location().center()) / p.spread().center(), PRINTED);
        assertEquals(0.354, p.spread().lcl() / p.spread().center(), PRINTED);
        assertEquals(1.646, p.spread().ucl() / p.spread().center(), PRINTED);
    }

    @Test
    void individualsAndMovingRangeLimits() {
        double[] x = {4.1, 4.4, 3.9, 4.6, 4.2, 4.0, 4.5, 4.3, 3.8, 4.4};
        List<double[]> g = new ArrayList<>();
        for (double v : x) {
            g.add(new double[] {v});
        }
        ChartPair p = ControlCharts.of(ChartKind.INDIVIDUALS, g, EnumSet.allOf(RunRule.class));
        // SciPy 1.17.1: mrb = abs(diff(x)).mean(); sg = mrb/d2(2); x.mean() +- 3*sg
        assertEquals(4.22, p.location().center(), TIGHT);
        assertEquals(5.37209500308859, p.location().ucl(), TIGHT);
        assertEquals(3.06790499691141, p.location().lcl(), TIGHT);
        assertEquals(0.433333333333333, p.spread().center(), TIGHT);
        assertEquals(1.41549716502507, p.spread().ucl(), TIGHT);
        // E2 = 3/d2(2) = 2.660 and D4(2) = 3.267 (ASTM E2587, from memory); the table's 2.660 is 3/1.128,
        // d2 rounded first, so it differs from 3/d2(2) = 2.6587 by 1.3e-3: tolerance 2e-3 for that one
        assertEquals(2.660, (p.location().ucl() - p.location().center()) / p.spread().center(), 2e-3);
        assertEquals(3.267, p.spread().ucl() / p.spread().center(), PRINTED);
        assertEquals(9, p.spread().points().length);
        assertEquals(1, p.spread().subgroupOf(0));
    }

    @Test
    void aShiftedSubgroupSignalsAtItsIndex() {
        double[][] a = new double[RING.length + 1][];
        System.arraycopy(RING, 0, a, 0, RING.length);
        a[RING.length] = new double[] {10.06, 10.11, 10.08, 10.07, 10.08};
        ChartPair p = ControlCharts.of(ChartKind.XBAR_R, rows(a), EnumSet.of(RunRule.BEYOND_LIMITS));
        assertEquals(List.of(new RuleFiring(RunRule.BEYOND_LIMITS, 8)), p.location().signals());
    }

    @Test
    void unequalSizesUseEachSubgroupsOwnLimits() {
        List<double[]> g = rows(RING);
        g.set(3, new double[] {9.96, 10.00, 9.99});
        ChartPair p = ControlCharts.of(ChartKind.XBAR_R, g, EnumSet.allOf(RunRule.class));
        // own limit of the short subgroup is wider by sqrt(5/3)
        double wide = p.location().pointUcl()[3] - p.location().center();
        double normal = p.location().pointUcl()[0] - p.location().center();
        assertEquals(Math.sqrt(5.0 / 3.0), wide / normal, 1e-12);
        assertEquals(normal, p.location().ucl() - p.location().center(), 1e-15);
    }

    @Test
    void refusesWhatDoesNotSuitTheChart() {
        assertThrows(IllegalArgumentException.class,
                () -> ControlCharts.of(ChartKind.XBAR_R, List.of(new double[] {1, 2}), EnumSet.noneOf(RunRule.class)));
        assertThrows(IllegalArgumentException.class,
                () -> ControlCharts.of(ChartKind.XBAR_R, List.of(new double[] {1, 2}, new double[] {3}), EnumSet.noneOf(RunRule.class)));
        assertThrows(IllegalArgumentException.class,
                () -> ControlCharts.of(ChartKind.INDIVIDUALS, List.of(new double[] {1, 2}, new double[] {3}), EnumSet.noneOf(RunRule.class)));
    }

    @Test
    void zeroSpreadPutsOffCentrePointsBeyondTheLimits() {
        List<double[]> g = List.of(new double[] {1, 1}, new double[] {1, 1}, new double[] {2, 2});
        ChartPair p = ControlCharts.of(ChartKind.XBAR_R, g, EnumSet.of(RunRule.BEYOND_LIMITS));
        assertEquals(3, p.location().signals().size());
    }
}
