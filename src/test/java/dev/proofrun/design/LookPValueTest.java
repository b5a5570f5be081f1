package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.CapabilityBounds;
import org.junit.jupiter.api.Test;

/**
 * A look's p-value is the α at which the grader's bound engine puts the lower bound exactly at c₀: checked against
 * SciPy for the closed forms and by the round trip through {@link CapabilityBounds} (the bound at 1 − p is c₀) for
 * every formula, the exact two-sided Cpk included.
 */
class LookPValueTest {

    private static final double C0 = 1.33;

    @Test
    void spreadIndexMatchesTheChiSquareTail() {
        // SciPy 1.17.1: scipy.stats.chi2.cdf(110*(1.33/1.6)**2, 110) = 0.0056037477956513045
        double p = LookPValue.of(IndexShape.SPREAD, BoundMethod.EXACT, C0, 1.6, Double.NaN, 111, 110);
        assertEquals(0.0056037477956513045, p, 1e-10);
        assertEquals(C0, CapabilityBounds.lowerCp(1.6, 110, 1 - p), 1e-8);
    }

    @Test
    void oneSidedIndexMatchesTheNoncentralTTail() {
        // SciPy 1.17.1: scipy.stats.nct.sf(3*sqrt(150)*1.55, 119.0, 3*sqrt(150)*1.33) = 0.017035728151509662
        double p = LookPValue.of(IndexShape.ONE_SIDED, BoundMethod.EXACT, C0, 1.55, Double.NaN, 150, 119);
        assertEquals(0.017035728151509662, p, 1e-8);
        assertEquals(C0, CapabilityBounds.lowerOneSided(1.55, 150, 119, 1 - p), 1e-7);
    }

    @Test
    void bissellMatchesTheNormalTail() {
        // SciPy 1.17.1: scipy.stats.norm.sf((1.6-1.33)/sqrt(1/(9*150)+1.6**2/(2*119.0))) = 0.005899713400493325
        double p = LookPValue.of(IndexShape.TWO_SIDED_MIN, BoundMethod.BISSELL, C0, 1.6, 1.9, 150, 119);
        assertEquals(0.005899713400493325, p, 1e-12);
        assertEquals(C0, CapabilityBounds.lowerCpk(1.6, 1.9, 150, 119, 1 - p, BoundMethod.BISSELL), 1e-9);
    }

    @Test
    void exactTwoSidedCpkRoundTripsThroughTheBound() {
        for (double[] c : new double[][] {{1.55, 1.55}, {1.55, 1.70}, {1.62, 2.4}, {1.45, 1.5}}) {
            double p = LookPValue.of(IndexShape.TWO_SIDED_MIN, BoundMethod.EXACT, C0, c[0], c[1], 140, 100.8);
            assertEquals(C0, CapabilityBounds.lowerCpk(c[0], c[1], 140, 100.8, 1 - p, BoundMethod.EXACT), 1e-7,
                    () -> "Cpk " + c[0] + ", Cp " + c[1]);
        }
    }

    @Test
    void anEstimateBelowTheRequirementIsNeverDemonstrated() {
        assertEquals(1, LookPValue.of(IndexShape.TWO_SIDED_MIN, BoundMethod.EXACT, C0, Math.nextDown(C0), 1.5, 140,
                100.8));
        assertEquals(1, LookPValue.of(IndexShape.SPREAD, BoundMethod.EXACT, C0, Double.NaN, Double.NaN, 140, 100.8));
    }
}
