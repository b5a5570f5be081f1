package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The skewness of the planned shapes (SciPy 1.17.1) and the planner's power at the boundary. */
class PercentilePowerTest {

    @Test
    void skewnessOfTheShapesAgainstSciPy() {
        // SciPy 1.17.1: scipy.stats.lognorm.stats(0.25, moments='s') = 0.7782516357974832, (0.5) = 1.7501896550697178
        assertEquals(0.7782516357974832, ShapeSkewness.of(ShapeFamily.LOGNORMAL, 0.25), 1e-12);
        assertEquals(1.7501896550697178, ShapeSkewness.of(ShapeFamily.LOGNORMAL, 0.5), 1e-12);
        // scipy.stats.weibull_min.stats(k, moments='s') for k = 1.5, 1.2, 3:
        // 1.0719865728909583, 1.5211310149801753, 0.16810284222938532
        assertEquals(1.0719865728909583, ShapeSkewness.of(ShapeFamily.WEIBULL, 1.5), 1e-10);
        assertEquals(1.5211310149801753, ShapeSkewness.of(ShapeFamily.WEIBULL, 1.2), 1e-10);
        assertEquals(0.16810284222938532, ShapeSkewness.of(ShapeFamily.WEIBULL, 3), 1e-10);
        assertEquals(0.25, ShapeSkewness.parameter(ShapeFamily.LOGNORMAL, 0.7782516357974832), 1e-10);
        assertEquals(1.5, ShapeSkewness.parameter(ShapeFamily.WEIBULL, 1.0719865728909583), 1e-9);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ShapeSkewness.parameter(ShapeFamily.LOGNORMAL, -0.2));
        assertTrue(e.getMessage().startsWith("a lognormal shape has a skewness between"), e.getMessage());
    }

    @Test
    void atTheRequirementThePowerIsAlpha() {
        // the true index at c0: the planner's chance of demonstrating is the bound's customer's risk, 0.05
        // within 3 Monte-Carlo SE of 4,000 studies (3 * sqrt(0.05 * 0.95 / 4000) = 0.0103)
        double tol = 3 * Math.sqrt(0.05 * 0.95 / PivotalBound.DRAWS);
        assertEquals(0.05, PercentilePower.power(ShapeFamily.LOGNORMAL, 0.25, IndexKind.Side.UPPER, 1.33, 1.33, 0.95, 125), tol);
        assertEquals(0.05, PercentilePower.power(ShapeFamily.WEIBULL, 1.5, IndexKind.Side.UPPER, 1.33, 1.33, 0.95, 125), tol);
        assertEquals(0.05, PercentilePower.power(ShapeFamily.LOGNORMAL, 0.1, IndexKind.Side.LOWER, 1.33, 1.33, 0.95, 125), tol);
    }

    @Test
    void aLowerLimitAtOrBelowZeroCannotBePlanned() {
        // Weibull k = 1.5: X50 = 0.783, X0.135 = 0.012, so an index of 1.67 puts the lower limit below zero
        assertThrows(IllegalArgumentException.class,
                () -> PercentilePower.power(ShapeFamily.WEIBULL, 1.5, IndexKind.Side.LOWER, 1.33, 1.67, 0.95, 125));
    }
}
