package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * Constants against values computed with mpmath 1.3.0 (mp.dps = 30 unless noted), by formulas
 * independent of the ones in {@link ChartConstants}:
 * d2(n) = 2*quad(lambda x: x*n*npdf(x)*ncdf(x)**(n-1), [-inf, 0, 2, inf]) (twice the mean maximum);
 * c4(n) = sqrt(2/(n-1))*gamma(n/2)/gamma((n-1)/2);
 * d3(n) = sqrt(2*E[max^2] - 2*E[min*max] - d2^2) from the order-statistic densities (mp.dps = 15,
 * limits +-10), not from the tail integrals the class uses.
 */
class ChartConstantsTest {

    /** The integrals are good to about 1e-12; the reference values carry 15+ digits. */
    private static final double INTEGRAL_TOL = 1e-11;
    /** c4 is closed form. */
    private static final double CLOSED_FORM_TOL = 1e-14;

    // mpmath 1.3.0, see the class comment (n, d2, c4)
    private static final double[][] D2_C4 = {
        {2, 1.12837916709551257, 0.797884560802865356},
        {3, 1.69256875064326886, 0.886226925452758014},
        {4, 2.05875074600792826, 0.921317731923561278},
        {5, 2.32592894728103923, 0.939985602986625188},
        {6, 2.5344127212229426, 0.951532861948144594},
        {7, 2.7043567512138088, 0.959368788699832958},
        {8, 2.84720061209055551, 0.965030456147371914},
        {9, 2.97002632441847401, 0.969310699713954077},
        {10, 3.07750546167034571, 0.972659274121588243},
        {15, 3.47182688988207487, 0.982316177162650563},
        {20, 3.73495011959664097, 0.986934267524655291},
        {25, 3.93062921950711316, 0.989640375585703084},
        {30, 4.08552168834302195, 0.991418053292672919},
        {40, 4.32155435635003992, 0.993610942831885812},
        {41, 4.34136436950693598, 0.99377013712462888},
        {42, 4.3606312150388379, 0.993921591875846709},
        {50, 4.49814725877970063, 0.994911304669732824},
    };

    @Test
    void meanRangeAndC4AgreeWithMpmath() {
        for (double[] row : D2_C4) {
            int n = (int) row[0];
            assertEquals(row[1], ChartConstants.d2(n), INTEGRAL_TOL, "d2(" + n + ")");
            assertEquals(row[2], ChartConstants.c4(n), CLOSED_FORM_TOL, "c4(" + n + ")");
        }
    }

    @Test
    void closedFormsForTwoReadings() {
        // d2(2) = 2/sqrt(pi); d3(2) = sqrt(2 - 4/pi) (the range of two is |X1 - X2|, a half-normal times sqrt 2)
        assertEquals(2 / Math.sqrt(Math.PI), ChartConstants.d2(2), INTEGRAL_TOL);
        assertEquals(Math.sqrt(2 - 4 / Math.PI), ChartConstants.d3(2), INTEGRAL_TOL);
        // c4(2) = sqrt(2/pi)
        assertEquals(Math.sqrt(2 / Math.PI), ChartConstants.c4(2), CLOSED_FORM_TOL);
    }

    @Test
    void rangeDeviationAgreesWithMpmath() {
        // mpmath 1.3.0 order-statistic form (class comment): n = 3 -> 0.888368004045204
        assertEquals(0.888368004045204, ChartConstants.d3(3), INTEGRAL_TOL);
    }

    @Test
    void c4AtRealAndLargeArguments() {
        // mpmath 1.3.0: c4 = sqrt(2/(m-1))*gamma(m/2)/gamma((m-1)/2) and (1-c4**2)/c4**2, mp.dps = 30
        assertEquals(0.99377013712462888, ChartConstants.c4Continuous(41), CLOSED_FORM_TOL);
        assertEquals(0.993921591875846709, ChartConstants.c4Continuous(42), CLOSED_FORM_TOL);
        assertEquals(0.997503163955105087, ChartConstants.c4Continuous(101), CLOSED_FORM_TOL);
        assertEquals(0.99999975000003125, ChartConstants.c4Continuous(1000001), CLOSED_FORM_TOL);
        assertEquals(0.854095938254104379, ChartConstants.c4Continuous(2.5), CLOSED_FORM_TOL);
        assertEquals(0.960948734496286187, ChartConstants.c4Continuous(7.25), CLOSED_FORM_TOL);
        // relative accuracy of the small CV^2 is what the effective degrees of freedom need
        assertEquals(5.000001249999375e-7, ChartConstants.chiCv2(1000001), 1e-12 * 5e-7);
        assertEquals(0.0125771340669426214, ChartConstants.chiCv2(41), 1e-13 * 0.0126);
        assertEquals(0.01226856257672128, ChartConstants.chiCv2(42), 1e-13 * 0.0123);
        assertEquals(0.00501243711840822323, ChartConstants.chiCv2(101), 1e-13 * 0.005);
        assertEquals(0.370839743133390876, ChartConstants.chiCv2(2.5), 1e-13);
    }

    @Test
    void chartFactorsFollowTheirDefinitions() {
        for (int n = 2; n <= ChartConstants.MAX_SIZE; n++) {
            double d2 = ChartConstants.d2(n);
            double d3 = ChartConstants.d3(n);
            double c4 = ChartConstants.c4(n);
            assertEquals(3 / (d2 * Math.sqrt(n)), ChartConstants.a2(n), 1e-15);
            assertEquals(3 / (c4 * Math.sqrt(n)), ChartConstants.a3(n), 1e-15);
            assertEquals(Math.max(0, 1 - 3 * d3 / d2), ChartConstants.d3Chart(n), 1e-15);
            assertEquals(1 + 3 * d3 / d2, ChartConstants.d4Chart(n), 1e-15);
            double spread = 3 * Math.sqrt(1 - c4 * c4) / c4;
            assertEquals(Math.max(0, 1 - spread), ChartConstants.b3(n), 1e-12);
            assertEquals(1 + spread, ChartConstants.b4(n), 1e-12);
        }
    }

    @Test
    void sizesOutsideTheTableAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> ChartConstants.d2(1));
        assertThrows(IllegalArgumentException.class, () -> ChartConstants.d3(51));
        assertThrows(IllegalArgumentException.class, () -> ChartConstants.c4(1));
        assertThrows(IllegalArgumentException.class, () -> ChartConstants.c4Continuous(1.0));
        assertThrows(IllegalArgumentException.class, () -> ChartConstants.c4Continuous(Double.NaN));
        assertEquals(ChartConstants.c4(1000), ChartConstants.c4Continuous(1000), 0);
    }
}
