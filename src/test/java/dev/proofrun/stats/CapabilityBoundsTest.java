package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Confidence bounds against SciPy 1.17.1 and a textbook worked example. */
class CapabilityBoundsTest {

    /** The chi-square bound is a closed form over SciPy's quantile: agreement to rounding. */
    private static final double CHI_SQUARE_TOLERANCE = 1e-12;
    /** Noncentral-t bounds: both sides solve sf = α to ~1e-12; the ncp root is found to 1e-10. */
    private static final double NONCENTRAL_TOLERANCE = 1e-9;
    /** Bissell is a closed form; SciPy's norm.ppf and ours agree to rounding. */
    private static final double CLOSED_FORM_TOLERANCE = 1e-12;

    @Test
    void cpBoundsAreTheChiSquareFormula() {
        // SciPy 1.17.1: 1.33*np.sqrt(scipy.stats.chi2.ppf(0.05, 29)/29) with chi2.ppf(0.05, 29) = 17.70836618282458
        assertEquals(1.03930230146028, CapabilityBounds.lowerCp(1.33, 29, 0.95), CHI_SQUARE_TOLERANCE);
        // SciPy 1.17.1: 1.33*np.sqrt(scipy.stats.chi2.ppf(0.95, 29)/29) with chi2.ppf(0.95, 29) = 42.55696780429269
        assertEquals(1.6111574373403152, CapabilityBounds.upperCp(1.33, 29, 0.95), CHI_SQUARE_TOLERANCE);
    }

    @Test
    void cpIntervalSplitsAlphaAndAcceptsEffectiveDegreesOfFreedom() {
        CapabilityBounds.Interval interval = CapabilityBounds.cpInterval(1.5, 49.5, 0.95);
        // SciPy 1.17.1: scipy.stats.chi2.ppf(0.025, 49.5) = 31.95588940664331, chi2.ppf(0.975, 49.5) = 70.82155622182042
        assertEquals(1.5 * Math.sqrt(31.95588940664331 / 49.5), interval.lower(), CHI_SQUARE_TOLERANCE);
        assertEquals(1.5 * Math.sqrt(70.82155622182042 / 49.5), interval.upper(), CHI_SQUARE_TOLERANCE);
        assertEquals(0.95, interval.confidence());
    }

    /**
     * Reference: the root of scipy.stats.nct.sf(3*sqrt(n)*c, nu, d) = 1 - confidence (lower) or
     * = confidence (upper) in d, by scipy.optimize.brentq(xtol=1e-14, rtol=1e-15), divided by 3*sqrt(n);
     * SciPy 1.17.1.
     */
    @ParameterizedTest
    @CsvSource({
        // c,    n,  nu,   confidence, lower,               upper
        "1.33,  30,  29,   0.95, 1.0215572538965203,  1.6274660121318947",
        "1.0,   50,  49,   0.95, 0.8143645097005036,  1.1802760100242196",
        "1.67, 100,  99,   0.99, 1.3853198548914036,  1.9578256360327164",
        "0.8,   10,   9,   0.90, 0.5079880510875378,  1.0560162008626575",
        "-0.2,  25,  24,   0.95, -0.3175129165625792, -0.07872216293939299",
        "1.33, 125, 92.3,  0.95, 1.1601900296828664,  1.4963861027883811",
    })
    void oneSidedBoundsAreTheNoncentralTRoots(double c, int n, double nu, double confidence, double lower, double upper) {
        assertEquals(lower, CapabilityBounds.lowerOneSided(c, n, nu, confidence), NONCENTRAL_TOLERANCE);
        assertEquals(upper, CapabilityBounds.upperOneSided(c, n, nu, confidence), NONCENTRAL_TOLERANCE);
    }

    @Test
    void bissellMatchesTheTextbookIntervalAndTheFormula() {
        CapabilityBounds.Interval interval = CapabilityBounds.cpkInterval(1.33, 1.5, 20, 19, 0.95, BoundMethod.BISSELL);
        // Montgomery, Introduction to Statistical Quality Control: approximate 95 % interval for Cpk^ = 1.33
        // from n = 20 is about 0.88 to 1.78 (from memory; checked by the formula below).
        assertEquals(0.88, interval.lower(), 0.005);
        assertEquals(1.78, interval.upper(), 0.005);
        // SciPy 1.17.1: 1.33 -/+ scipy.stats.norm.ppf(0.975)*np.sqrt(1/(9*20) + 1.33**2/(2*19)),
        // norm.ppf(0.975) = 1.959963984540054
        assertEquals(0.8826060505594018, interval.lower(), CLOSED_FORM_TOLERANCE);
        assertEquals(1.7773939494405984, interval.upper(), CLOSED_FORM_TOLERANCE);
    }

    @Test
    void exactCpkFallsBackToTheOneSidedBoundWithoutCpOrWithTheMeanOutside() {
        assertEquals(CapabilityBounds.lowerOneSided(1.33, 30, 29, 0.95),
                CapabilityBounds.lowerCpk(1.33, Double.NaN, 30, 29, 0.95, BoundMethod.EXACT), 0.0);
        assertEquals(CapabilityBounds.lowerOneSided(-0.2, 25, 24, 0.95),
                CapabilityBounds.lowerCpk(-0.2, 1.0, 25, 24, 0.95, BoundMethod.EXACT), 0.0);
    }

    @Test
    void exactCpkBoundSolvesItsDefiningEquation() {
        double cpkHat = 1.33;
        double cpHat = 1.6;
        double lower = CapabilityBounds.lowerCpk(cpkHat, cpHat, 50, 49, 0.95, BoundMethod.EXACT);
        double upper = CapabilityBounds.upperCpk(cpkHat, cpHat, 50, 49, 0.95, BoundMethod.EXACT);
        double keep = cpkHat / cpHat;
        assertEquals(0.05, IndexDistribution.cpkAtLeast(cpkHat, lower, lower / keep, 50, 49), 1e-9);
        assertEquals(0.95, IndexDistribution.cpkAtLeast(cpkHat, upper, upper / keep, 50, 49), 1e-9);
        assertTrue(lower < cpkHat && cpkHat < upper);
    }

    @Test
    void rejectsBadInput() {
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCp(1.33, 29, 0.5));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCp(1.33, 29, 1.0));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCp(1.33, 29, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCp(1.33, 0, 0.95));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCp(-1, 29, 0.95));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerOneSided(1.33, 1, 29, 0.95));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerOneSided(Double.NaN, 30, 29, 0.95));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCpk(1.8, 1.5, 30, 29, 0.95, BoundMethod.EXACT));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCpk(1.3, 1.5, 30, 29, 0.95, null));
        assertThrows(IllegalArgumentException.class, () -> CapabilityBounds.lowerCpk(1.3, 1.5, 30, Double.POSITIVE_INFINITY, 0.95, BoundMethod.BISSELL));
    }
}
