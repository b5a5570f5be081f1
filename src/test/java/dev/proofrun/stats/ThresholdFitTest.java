package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Fits of the threshold shapes with θ held at its declared value, against SciPy 1.10.1 (Debian 12 python3-scipy):
 * {@code scipy.stats.lognorm.fit(x, floc=9.95)} and {@code scipy.stats.weibull_min.fit(x, floc=9.95)}, quantiles by
 * {@code .ppf(p, s_or_c, loc=9.95, scale=…)}, and the Weibull score's root by {@code scipy.optimize.brentq}; the script is src/test/resources/dev/proofrun/stats/threshold-fit-reference.py.
 * Invented readings: seat heights of a pin against a stop at 9.95 mm.
 */
class ThresholdFitTest {

    static final double[] X = {9.9712, 9.9655, 9.9831, 9.9598, 9.9704, 9.9923, 9.9667, 9.9750, 9.9581, 9.9689, 10.0046, 9.9736};
    static final double THETA = 9.95;
    static final SpecLimits UPPER = SpecLimits.upperOnly(10.10);

    @Test
    void lognormal3MatchesScipyWithTheLocationFixed() {
        ShapeFit fit = ShapeFitter.fit(ShapeFamily.LOGNORMAL3, THETA, X).fit();
        assertEquals(ShapeFamily.LOGNORMAL, fit.family());
        assertEquals(THETA, fit.threshold(), 0);
        // SciPy 1.10.1: lognorm.fit(x, floc=9.95) -> s = 0.52436641937068595, scale = 0.021051514359617711 (closed form:
        // relative 1e-9 allows for x − 9.95 rounding of readings given to 4 decimals)
        assertEquals(0.52436641937068595, fit.scale(), 1e-9 * 0.52);
        assertEquals(Math.log(0.021051514359617711), fit.location(), 1e-9 * 3.9);
        // lognorm.ppf(p, s, loc=9.95, scale=scale) at p = norm.cdf(-3), 0.5, norm.cdf(3)
        assertEquals(9.954366113440525, fit.quantile(PercentileIndex.LOW), 1e-9);
        assertEquals(9.971051514359617, fit.quantile(0.5), 1e-9);
        assertEquals(10.051501315270434, fit.quantile(PercentileIndex.HIGH), 1e-9);
        // (10.10 − X50)/(X99.865 − X50)
        assertEquals(1.6028440615201718, PercentileIndex.of(IndexKind.PPU, UPPER, fit), 1e-7);
        // lognorm.sf(10.10, …) = 9.025818989352647e-05
        assertEquals(9.025818989352647e-05, fit.survival(10.10), 1e-6 * 9.0e-05);
    }

    @Test
    void weibull3MatchesScipyWithTheLocationFixed() {
        ShapeFit fit = ShapeFitter.fit(ShapeFamily.WEIBULL3, THETA, X).fit();
        assertEquals(ShapeFamily.WEIBULL, fit.family());
        // SciPy 1.10.1: weibull_min.fit(x, floc=9.95) -> c = 2.0104256393061917, scale = 0.027345464557351373; SciPy's
        // optimizer stops about 1.5e-5 (relative) short of the maximum, hence 3e-5 here
        assertEquals(2.0104256393061917, fit.first(), 3e-5 * 2.01);
        assertEquals(0.027345464557351373, fit.second(), 3e-5 * 0.027);
        // the root of the profile score by scipy.optimize.brentq(…, xtol=1e-15, rtol=1e-15): k = 2.0103959652232004,
        // scale (mean (x − θ)^k)^(1/k) = 0.027345773836955793 — the same maximum to 1e-12
        assertEquals(2.0103959652232004, fit.first(), 1e-12 * 2.01);
        assertEquals(0.027345773836955793, fit.second(), 1e-12);
        // weibull_min.ppf(p, k, loc=9.95, scale) at p = norm.cdf(-3), 0.5, norm.cdf(3), with the brentq k and scale
        assertEquals(9.951022365868631, fit.quantile(PercentileIndex.LOW), 1e-9);
        assertEquals(9.972788435063679, fit.quantile(0.5), 1e-9);
        assertEquals(10.019951325934521, fit.quantile(PercentileIndex.HIGH), 1e-9);
        assertEquals(2.6972809042748427, PercentileIndex.of(IndexKind.PPU, UPPER, fit), 1e-7);
    }

    @Test
    void theFitIsTheTwoParameterFitOfTheShiftedReadings() {
        double[] shifted = new double[X.length];
        for (int i = 0; i < X.length; i++) {
            shifted[i] = X[i] - THETA;
        }
        for (ShapeFamily f : new ShapeFamily[] {ShapeFamily.LOGNORMAL3, ShapeFamily.WEIBULL3}) {
            ShapeFit three = ShapeFitter.fit(f, THETA, X).fit();
            ShapeFit two = ShapeFitter.fit(f.base(), shifted).fit();
            assertEquals(two.location(), three.location(), 0);
            assertEquals(two.scale(), three.scale(), 0);
            assertEquals(THETA + two.quantile(0.99865), three.quantile(0.99865), 1e-12);
            assertEquals(two.cdf(0.02), three.cdf(THETA + 0.02), 1e-12);
            assertEquals(two.logDensity(0.02), three.logDensity(THETA + 0.02), 1e-9);
            assertEquals(two.normalScore(0.02), three.normalScore(THETA + 0.02), 1e-9);
            // the pivotal bound sees the same pivots: shifting readings and limit together leaves it unchanged
            double[] b3 = PivotalBound.bounds(three, IndexKind.PPU, UPPER, X.length, 0.95, PivotalBound.DEFAULT_SEED);
            double[] b2 = PivotalBound.bounds(two, IndexKind.PPU, SpecLimits.upperOnly(10.10 - THETA), X.length, 0.95,
                    PivotalBound.DEFAULT_SEED);
            assertEquals(b2[0], b3[0], 1e-9);
            assertEquals(b2[1], b3[1], 1e-9);
            assertTrue(b3[0] < PercentileIndex.of(IndexKind.PPU, UPPER, three));
        }
    }

    @Test
    void aReadingAtOrBelowTheThresholdIsNoFitAndNamed() {
        double[] x = X.clone();
        x[4] = THETA;
        ShapeFitter.Outcome o = ShapeFitter.fit(ShapeFamily.WEIBULL3, THETA, x);
        assertFalse(o.fitted());
        assertEquals(ShapeFitter.Failure.AT_OR_BELOW_BOUND, o.failure());
        assertEquals(4, o.index());
        ShapeFit fit = ShapeFitter.fit(ShapeFamily.LOGNORMAL3, THETA, X).fit();
        assertEquals(0, fit.cdf(THETA), 0);
        assertEquals(Double.NEGATIVE_INFINITY, fit.logDensity(9.9), 0);
        assertTrue(fit.describe().endsWith("of ln(x - threshold), threshold = 9.95"), fit.describe());
        // a threshold fitted within a floor's set shows seven significant digits, not the double's seventeen
        assertTrue(fit.withThreshold(9.955627584768).describe().endsWith("threshold = 9.955628"),
                fit.withThreshold(9.955627584768).describe());
    }
}
