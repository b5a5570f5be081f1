package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;

/**
 * {@link FoldedNormalBound}: its bounds bracket the estimate, are reproducible from the seed, and — the property
 * that matters — a study at the true index c₀ reaches c₀ in at most α + 2 SE of the studies. The coverage through
 * the grader, over the whole grid, is {@code grade.FoldedNormalCoverageTest}.
 */
class FoldedNormalBoundTest {

    private static final long SEED = PivotalBound.DEFAULT_SEED;

    private static double[] readings(double theta, int n, long seed) {
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(RandomSource.XO_RO_SHI_RO_128_PP.create(seed));
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.abs(theta + g.sample());
        }
        return x;
    }

    private static ShapeFit fit(double[] x) {
        double[] f = FoldedNormal.fit(x);
        return new ShapeFit(ShapeFamily.FOLDED_NORMAL, f[0], f[1]);
    }

    private static SpecLimits atIndex(double theta, double c) {
        double q50 = FoldedNormal.quantile(theta, 1, 0.5);
        return SpecLimits.upperOnly(q50 + c * (FoldedNormal.quantile(theta, 1, PercentileIndex.HIGH) - q50));
    }

    @Test
    void boundsBracketTheEstimateAndRepeatFromTheSeed() {
        ShapeFit fit = fit(FoldedNormalTest.Y);
        SpecLimits usl = SpecLimits.upperOnly(6.0);
        double estimate = PercentileIndex.of(IndexKind.PPU, usl, fit);
        double[] b = FoldedNormalBound.bounds(fit, IndexKind.PPU, usl, 20, 0.95, SEED);
        assertTrue(b[0] < estimate && estimate < b[1], java.util.Arrays.toString(b) + " around " + estimate);
        assertArrayEquals(b, FoldedNormalBound.bounds(fit, IndexKind.PPU, usl, 20, 0.95, SEED), 0);
        double[] wider = FoldedNormalBound.bounds(fit, IndexKind.PPU, usl, 20, 0.99, SEED);
        assertTrue(wider[0] < b[0] && wider[1] > b[1]);
        // two limits: the lower side is far (lower limit near zero), so Ppk's lower bound is the upper side's
        SpecLimits both = SpecLimits.twoSided(0.001, 6.0);
        double[] k = FoldedNormalBound.bounds(fit, IndexKind.PPK, both, 20, 0.95, SEED);
        assertTrue(k[0] <= b[0] + 1e-12, k[0] + " vs " + b[0]);
        double[] pp = FoldedNormalBound.bounds(fit, IndexKind.PP, both, 20, 0.95, SEED);
        double ppHat = PercentileIndex.of(IndexKind.PP, both, fit);
        assertTrue(pp[0] < ppHat && ppHat < pp[1]);
    }

    @Test
    void theConfidenceSetOfMeanOverSigmaFollowsTheEstimate() {
        FoldedNormalBound.Table t = FoldedNormalBound.table(50, SEED);
        boolean[] atZero = FoldedNormalBound.confidenceSet(t, 0, 0.01);
        boolean[] atThree = FoldedNormalBound.confidenceSet(t, 3, 0.01);
        int thirty = java.util.Arrays.binarySearch(FoldedNormalBound.THETAS, 30);
        int three = java.util.Arrays.binarySearch(FoldedNormalBound.THETAS, 3);
        assertTrue(atZero[0] && !atZero[thirty]);
        assertTrue(atThree[three] && !atThree[0] && !atThree[thirty]);
    }

    @Test
    void atTheTrueIndexTheBoundReachesItAtMostAlphaOfTheTime() {
        // the half-normal with 50 readings, the least favourable corner of the grader's grid; 300 studies,
        // limit 0.05 + 2·sqrt(0.05·0.95/300) = 0.075
        int studies = 300;
        SpecLimits usl = atIndex(0, 1.33);
        int passed = 0;
        for (int s = 0; s < studies; s++) {
            double[] x = readings(0, 50, 1_000L + s);
            passed += FoldedNormalBound.bounds(fit(x), IndexKind.PPU, usl, 50, 0.95, SEED)[0] >= 1.33 ? 1 : 0;
        }
        assertTrue(passed / (double) studies <= 0.05 + 2 * Math.sqrt(0.05 * 0.95 / studies), passed + " of " + studies);
    }

    @Test
    void refusesWhatItCannotBound() {
        ShapeFit normal = new ShapeFit(ShapeFamily.NORMAL, 1, 1);
        SpecLimits usl = SpecLimits.upperOnly(6);
        assertThrows(IllegalArgumentException.class, () -> FoldedNormalBound.bounds(normal, IndexKind.PPU, usl, 20, 0.95, SEED));
        ShapeFit fit = fit(FoldedNormalTest.Y);
        assertThrows(IllegalArgumentException.class, () -> FoldedNormalBound.bounds(fit, IndexKind.PPU, usl, 20, 1.0, SEED));
        assertThrows(IllegalArgumentException.class, () -> FoldedNormalBound.bounds(fit, IndexKind.PPU, usl, 2, 0.95, SEED));
        assertFalse(Double.isFinite(FoldedNormalBound.bounds(fit, IndexKind.PPL, usl, 20, 0.95, SEED)[0]));
    }
}
