package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Fits, quantiles, expected ppm and the percentile index against SciPy 1.17.1 / NumPy 2.4.6. The data were
 * drawn once with numpy.random.default_rng(20261201) (lognormal(-1.2, 0.35, 30) and 3.1*weibull(2.3, 40),
 * rounded to 3 decimals) and are pasted here; the calls are quoted beside each value.
 */
class ShapeFitterTest {

    static final double[] X = {0.265, 0.338, 0.312, 0.142, 0.130, 0.398, 0.362, 0.156, 0.229, 0.300, 0.214, 0.803,
        0.324, 0.378, 0.308, 0.246, 0.286, 0.262, 0.354, 0.248, 0.351, 0.373, 0.392, 0.229, 0.338, 0.380, 0.211,
        0.231, 0.238, 0.365};
    static final double[] W = {3.095, 2.859, 3.933, 3.439, 0.615, 1.861, 1.659, 1.476, 2.226, 3.575, 2.240, 3.790,
        4.250, 0.694, 1.935, 0.913, 2.489, 3.037, 2.586, 1.576, 2.595, 5.273, 3.771, 1.085, 0.670, 3.445, 2.980,
        1.184, 1.584, 0.661, 2.306, 4.221, 5.436, 2.084, 5.425, 4.419, 1.908, 3.274, 3.255, 4.366};

    @Test
    void lognormalMaximumLikelihood() {
        // SciPy 1.17.1: scipy.stats.lognorm.fit(X, floc=0) -> s = 0.3503807659655411, scale = 0.2868049243716759
        ShapeFit f = ShapeFitter.fit(ShapeFamily.LOGNORMAL, X).fit();
        assertEquals(Math.log(0.2868049243716759), f.location(), 1e-12);
        assertEquals(0.3503807659655411, f.scale(), 1e-12);
        // scipy.stats.lognorm.ppf(scipy.stats.norm.cdf(-3), s, 0, scale) = 0.10024928968609556, ppf(0.5) =
        // 0.2868049243716759, ppf(norm.cdf(3)) = 0.8205251618381452
        assertEquals(0.10024928968609556, f.quantile(PercentileIndex.LOW), 1e-11);
        assertEquals(0.2868049243716759, f.quantile(0.5), 1e-12);
        assertEquals(0.8205251618381452, f.quantile(PercentileIndex.HIGH), 1e-11);
        // scipy.stats.lognorm.sf(0.9, s, 0, scale) * 1e6 = 549.5343909945312
        assertEquals(549.5343909945312, PercentileIndex.expectedPpm(SpecLimits.upperOnly(0.9), f), 1e-7);
        // SciPy 1.17.1: scipy.stats.lognorm.logpdf(X, s, 0, scale).sum() = 26.36247840666302
        assertEquals(26.36247840666302, Arrays.stream(X).map(f::logDensity).sum(), 1e-8);
    }

    @Test
    void weibullMaximumLikelihood() {
        // SciPy 1.17.1: k = scipy.optimize.brentq(score, 0.1, 50, xtol=1e-14) on the score equation
        // sum(W**k*log W)/sum(W**k) - 1/k - mean(log W) = 0 -> 2.146189560010945; c = mean(W**k)**(1/k) = 3.0572585059782917
        ShapeFit f = ShapeFitter.fit(ShapeFamily.WEIBULL, W).fit();
        assertEquals(2.146189560010945, f.first(), 1e-9);
        assertEquals(3.0572585059782917, f.second(), 1e-9);
        // scipy.stats.weibull_min.fit(W, floc=0) gives c = 2.1462034459466377: its general optimizer stops
        // 1.4e-5 short of the maximum (log-likelihood -66.8293771431464, lower than at the brentq root)
        assertEquals(2.1462034459466377, f.first(), 5e-5);
        // SciPy 1.17.1: scipy.stats.weibull_min.logpdf(W, k, 0, c).sum() = -66.8293771346967 at the brentq root
        assertEquals(-66.8293771346967, Arrays.stream(W).map(f::logDensity).sum(), 1e-8);
        // scipy.stats.weibull_min.ppf(norm.cdf(-3), k, 0, c) = 0.14071983528644355, ppf(0.5) = 2.577306376627527,
        // ppf(norm.cdf(3)) = 7.369345273826994 (k, c the brentq root above)
        assertEquals(0.14071983528644355, f.quantile(PercentileIndex.LOW), 1e-8);
        assertEquals(2.577306376627527, f.quantile(0.5), 1e-8);
        assertEquals(7.369345273826994, f.quantile(PercentileIndex.HIGH), 1e-8);
        // scipy.stats.weibull_min.sf(9.0, k, 0, c) * 1e6 = 39.163431159464224
        assertEquals(39.163431159464224, PercentileIndex.expectedPpm(SpecLimits.upperOnly(9.0), f), 1e-6);
        // scipy.stats.norm.ppf(weibull_min.cdf(0.615, k, 0, c)) = -1.8591623228972525;
        // scipy.stats.norm.isf(weibull_min.sf(5.436, k, 0, c)) = 1.8508406942403959
        assertEquals(-1.8591623228972525, f.normalScore(0.615), 1e-8);
        assertEquals(1.8508406942403959, f.normalScore(5.436), 1e-8);
    }

    @Test
    void thePercentileIndexIsTheUsualOneForTheNormal() {
        // for the normal X99.865 - X50 = 3 sigma (the tail probability is Phi(3), scipy.stats.norm.cdf(3))
        ShapeFit f = new ShapeFit(ShapeFamily.NORMAL, 10, 0.5);
        SpecLimits limits = SpecLimits.twoSided(8, 13);
        assertEquals((13 - 10) / 1.5, PercentileIndex.of(IndexKind.PPU, limits, f), 1e-12);
        assertEquals((10 - 8) / 1.5, PercentileIndex.of(IndexKind.PPK, limits, f), 1e-12);
        assertEquals(5 / 3.0, PercentileIndex.of(IndexKind.PP, limits, f), 1e-12);
        // Clements' index from the lognormal quantiles above: (0.9 - X50)/(X99.865 - X50)
        ShapeFit ln = ShapeFitter.fit(ShapeFamily.LOGNORMAL, X).fit();
        assertEquals((0.9 - 0.2868049243716759) / (0.8205251618381452 - 0.2868049243716759),
                PercentileIndex.of(IndexKind.CPK, SpecLimits.upperOnly(0.9), ln), 1e-10);
    }

    @Test
    void extremeAndDegenerateReadingsGiveNoFitInsteadOfThrowing() {
        double[] huge = {1e300, 2e300, 3e300, 1.5e300, 2.5e300};
        for (ShapeFamily fam : ShapeFamily.values()) {
            ShapeFitter.Outcome o = ShapeFitter.fit(fam, huge);
            assertTrue(o.fitted(), fam.token());
            assertTrue(Double.isFinite(o.fit().quantile(PercentileIndex.HIGH)) || fam != ShapeFamily.NORMAL);
            assertEquals(ShapeFitter.Failure.NO_SPREAD, ShapeFitter.fit(fam, new double[] {4.2, 4.2, 4.2, 4.2}).failure());
            assertEquals(ShapeFitter.Failure.TOO_FEW, ShapeFitter.fit(fam, new double[] {1, 2}).failure());
            assertEquals(ShapeFitter.Failure.NOT_FINITE, ShapeFitter.fit(fam, new double[] {1, 2, Double.NaN}).failure());
        }
        ShapeFitter.Outcome zero = ShapeFitter.fit(ShapeFamily.LOGNORMAL, new double[] {0.3, 0.2, 0, 0.4});
        assertEquals(ShapeFitter.Failure.AT_OR_BELOW_BOUND, zero.failure());
        assertEquals(2, zero.index());
        assertEquals(ShapeFitter.Failure.AT_OR_BELOW_BOUND, ShapeFitter.fit(ShapeFamily.WEIBULL, new double[] {0.3, -1, 2}).failure());
        // a narrow normal process far from zero: a Weibull shape far above 50 is not a fit
        double[] narrow = new double[40];
        for (int i = 0; i < narrow.length; i++) {
            narrow[i] = 22 + 0.002 * Math.sin(i * 1.7);
        }
        assertEquals(ShapeFitter.Failure.SHAPE_TOO_LARGE, ShapeFitter.fit(ShapeFamily.WEIBULL, narrow).failure());
        assertFalse(ShapeFitter.fit(ShapeFamily.NORMAL, narrow).fit() == null);
    }

    @Test
    void unknownShapesAreRefusedWithTheNames() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ShapeFamily.fromToken("gamma"));
        assertEquals("unknown shape 'gamma' (normal, lognormal, weibull, folded-normal, lognormal3 or weibull3)", e.getMessage());
        assertEquals(ShapeFamily.WEIBULL, ShapeFamily.fromToken(" Weibull "));
    }
}
