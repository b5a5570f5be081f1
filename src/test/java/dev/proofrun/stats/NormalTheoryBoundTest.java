package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The one bound engine of normal theory: its choice of formula, its inverse, and the confidence it accepts. */
class NormalTheoryBoundTest {

    private static final double TIGHT = 1e-12;
    private static final double ROOT = 1e-9;

    @Test
    void theFormOfAnIndexFollowsItsSideAndTheLimits() {
        assertEquals(NormalTheoryBound.Form.SPREAD, NormalTheoryBound.Form.of(IndexKind.fromToken("cp"), true));
        assertEquals(NormalTheoryBound.Form.ONE_SIDED, NormalTheoryBound.Form.of(IndexKind.fromToken("cpu"), true));
        assertEquals(NormalTheoryBound.Form.TWO_SIDED, NormalTheoryBound.Form.of(IndexKind.fromToken("ppk"), true));
        assertEquals(NormalTheoryBound.Form.ONE_SIDED, NormalTheoryBound.Form.of(IndexKind.fromToken("cpk"), false));
    }

    @Test
    void eachFormUsesItsFormula() {
        double c = 0.95;
        assertEquals(CapabilityBounds.lowerCp(1.5, 29, c),
                new NormalTheoryBound(NormalTheoryBound.Form.SPREAD, 1.5, 1.5, 30, 29, BoundMethod.BISSELL).lower(c), 0);
        assertEquals(CapabilityBounds.upperOneSided(1.5, 30, 29, c),
                new NormalTheoryBound(NormalTheoryBound.Form.ONE_SIDED, 1.5, Double.NaN, 30, 29, BoundMethod.EXACT).upper(c), 0);
        assertEquals(CapabilityBounds.lowerCpk(1.4, 1.7, 30, 29, c, BoundMethod.EXACT),
                new NormalTheoryBound(NormalTheoryBound.Form.TWO_SIDED, 1.4, 1.7, 30, 29, BoundMethod.EXACT).lower(c), 0);
        assertEquals(CapabilityBounds.lowerCpk(1.4, 1.7, 30, 29, c, BoundMethod.BISSELL),
                new NormalTheoryBound(NormalTheoryBound.Form.TWO_SIDED, 1.4, 1.7, 30, 29, BoundMethod.BISSELL).lower(c), 0);
        NormalTheoryBound small = new NormalTheoryBound(NormalTheoryBound.Form.TWO_SIDED, 1.4, 1.7, 30, 29, BoundMethod.EXACT);
        assertEquals(CapabilityBounds.lowerCpk(1.4, 1.7, 120, 119, c, BoundMethod.EXACT), small.withStudy(120, 119).lower(c), 0);
    }

    @Test
    void aLookMayAskForAConfidenceAboveWhatAPersonMayState() {
        // SciPy 1.17.1: 1.33*math.sqrt(scipy.stats.chi2.ppf(0.00005, 29)/29) = 0.7063746748588232
        assertEquals(0.7063746748588232, new NormalTheoryBound(NormalTheoryBound.Form.SPREAD, 1.33, Double.NaN, 30, 29,
                BoundMethod.EXACT).lower(0.99995), TIGHT);
        // SciPy 1.17.1: d = brentq(lambda d: scipy.stats.nct.sf(3*sqrt(30)*1.5, 29, d) - 0.00005, -5, 3*sqrt(30)*1.5,
        // xtol=1e-14); d/(3*sqrt(30)) = 0.7526062384371762
        assertEquals(0.7526062384371762, new NormalTheoryBound(NormalTheoryBound.Form.ONE_SIDED, 1.5, Double.NaN, 30, 29,
                BoundMethod.EXACT).lower(0.99995), 1e-8);
        assertFalse(Confidence.isStatable(0.99995));
        assertTrue(Confidence.isComputable(0.99995));
        NormalTheoryBound b = new NormalTheoryBound(NormalTheoryBound.Form.SPREAD, 1.33, Double.NaN, 30, 29, BoundMethod.EXACT);
        assertThrows(IllegalArgumentException.class, () -> b.lower(1.0));
        assertThrows(IllegalArgumentException.class, () -> b.lower(0.5));
        assertThrows(IllegalArgumentException.class, () -> b.upper(Double.NaN));
    }

    @Test
    void thePassingEstimateIsTheInverseOfTheBound() {
        // SciPy 1.17.1: 1.33*math.sqrt(49/scipy.stats.chi2.ppf(0.05, 49)) = 1.5982907839991862
        OptionalDouble cp = NormalTheoryBound.passingEstimate(NormalTheoryBound.Form.SPREAD, BoundMethod.EXACT, 1.33, 50, 49, 0.95);
        assertEquals(1.5982907839991862, cp.getAsDouble(), TIGHT);
        assertEquals(1.33, CapabilityBounds.lowerCp(cp.getAsDouble(), 49, 0.95), ROOT);
        // SciPy 1.17.1: z = scipy.stats.norm.ppf(0.95); A = 1 - z*z/98; C = 1.33**2 - z*z/450;
        // (1.33 + sqrt(1.33**2 - A*C))/A = 1.6082401568421392
        OptionalDouble bissell = NormalTheoryBound.passingEstimate(NormalTheoryBound.Form.TWO_SIDED, BoundMethod.BISSELL,
                1.33, 50, 49, 0.95);
        assertEquals(1.6082401568421392, bissell.getAsDouble(), TIGHT);
        assertEquals(1.33, new NormalTheoryBound(NormalTheoryBound.Form.TWO_SIDED, bissell.getAsDouble(), Double.NaN, 50, 49,
                BoundMethod.BISSELL).lower(0.95), ROOT);
        assertTrue(NormalTheoryBound.passingEstimate(NormalTheoryBound.Form.TWO_SIDED, BoundMethod.EXACT, 1.33, 50, 49, 0.95).isEmpty());
        assertTrue(NormalTheoryBound.passingEstimate(NormalTheoryBound.Form.ONE_SIDED, BoundMethod.BISSELL, 1.33, 50, 49, 0.95).isEmpty());
        // ν ≤ z²/2: no estimate passes Bissell's bound
        assertEquals(Double.POSITIVE_INFINITY, NormalTheoryBound.bissellPassing(1.33, 2, 1, 0.05));
    }

    @Test
    void thePivotalEngineGivesThePivotalBounds() {
        ShapeFit fit = ShapeFitter.fit(ShapeFamily.LOGNORMAL, new double[] {0.021, 0.018, 0.025, 0.019, 0.030, 0.022,
            0.017, 0.027, 0.020, 0.024, 0.023, 0.019}).fit(); // invented flatness readings, mm
        SpecLimits upper = SpecLimits.upperOnly(0.08);
        IndexKind ppk = IndexKind.fromToken("ppk");
        BoundEngine e = PercentileEstimate.of(fit, ppk, upper, 12, PivotalBound.DEFAULT_SEED);
        double[] b = PivotalBound.bounds(fit, ppk, upper, 12, 0.95, PivotalBound.DEFAULT_SEED);
        assertEquals(b[0], e.lower(0.95), 0);
        assertEquals(b[1], e.upper(0.95), 0);
        assertEquals(PercentileIndex.of(ppk, upper, fit), e.estimate(), 0);
        assertTrue(e.lower(0.95) < e.estimate() && e.estimate() < e.upper(0.95));
        assertThrows(IllegalArgumentException.class, () -> e.lower(1.0));
    }
}
