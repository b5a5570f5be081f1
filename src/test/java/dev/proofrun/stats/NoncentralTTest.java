package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.hipparchus.distribution.continuous.TDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The noncentral t against mpmath 1.3.0 and Hipparchus' central t. */
class NoncentralTTest {

    /** The accuracy promised in the class Javadoc. */
    private static final double ABSOLUTE = 1e-9;

    /**
     * mpmath 1.3.0, mp.dps = 30: mp.quad of Phi(t*sqrt(x/df) - ncp) * chi2_pdf(x, df) over x, split at the
     * chi-square mode and the normal transition (the script noncentral-t-reference.py in src/test/resources).
     */
    @ParameterizedTest
    @CsvSource({
        "2.1,  24,    1.5, 0.709942749507964619294963635288",
        "300,  10000, 300, 0.49837622347204757380964802864",
        "5,    2,     3,   0.689490596212052528471904099754",
        "310,  3,     300, 0.4219305424722141073167774693070682703003",
        "-1,   5,     0,   0.1816087338245613128000742599987684447992",
    })
    void matchesMpmath(double t, double df, double ncp, double expected) {
        assertEquals(expected, NoncentralT.cdf(t, df, ncp), ABSOLUTE);
        assertEquals(1 - expected, NoncentralT.sf(t, df, ncp), ABSOLUTE);
    }

    @ParameterizedTest
    @CsvSource({"-3.5, 2", "-1, 2.5", "0.3, 7", "2.2, 29", "4, 99.5", "-0.7, 9999"})
    void zeroNoncentralityIsTheCentralT(double t, double df) {
        // Hipparchus 4.0.2 TDistribution(df).cumulativeProbability(t), an independent algorithm (incomplete beta)
        assertEquals(new TDistribution(df).cumulativeProbability(t), NoncentralT.cdf(t, df, 0), ABSOLUTE);
    }

    @Test
    void ncpForInvertsTheCdf() {
        for (double p : new double[] {0.001, 0.05, 0.5, 0.95, 0.9999}) {
            double ncp = NoncentralT.ncpFor(5.0, 29, p);
            assertEquals(p, NoncentralT.cdf(5.0, 29, ncp), 1e-10);
        }
    }

    @Test
    void rejectsBadInput() {
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.cdf(Double.NaN, 5, 1));
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.cdf(1, 0, 1));
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.sf(1, 5, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> NoncentralT.ncpFor(1, 5, 1));
    }
}
