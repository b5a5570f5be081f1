package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.apache.commons.statistics.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/**
 * The floor's set of thresholds and its bound ({@link FloorBound}), checked against SciPy 1.17.1 and by seeded
 * simulation. Invented readings throughout.
 */
class FloorBoundTest {

    private static final int N = 125;

    @Test
    void skewnessIsScipysBiasedSampleSkewness() {
        double[] x = {10.02, 10.07, 9.98, 10.11, 10.04, 9.97, 10.3, 10.05, 10.01, 9.99};
        // SciPy 1.17.1: scipy.stats.skew([10.02, 10.07, 9.98, 10.11, 10.04, 9.97, 10.3, 10.05, 10.01, 9.99])
        assertEquals(1.7819123372200965, FloorBound.skewness(x), 1e-12);
    }

    /** y_i = −exp(s·z_i), z_i = Φ⁻¹((i − 0.375)/(N + 0.25)): a left-skewed sample of 125 with no randomness. */
    private static double[] leftSkewed(double s) {
        NormalDistribution phi = NormalDistribution.of(0, 1);
        double[] y = new double[N];
        for (int i = 1; i <= N; i++) {
            y[i - 1] = -Math.exp(s * phi.inverseCumulativeProbability((i - 0.375) / (N + 0.25)));
        }
        return y;
    }

    @Test
    void theNormalNullAgreesWithDAgostinosSkewnessTest() {
        // SciPy 1.17.1: scipy.stats.skewtest(y, alternative='less').pvalue for leftSkewed(0.15) and (0.20):
        // 0.030765952430377483 and 0.0072050114444341855 (D'Agostino's normal approximation; g1 -0.40158, -0.53745).
        // Our share is simulated (20,000 draws, SE 0.0012 at 0.03, 0.0006 at 0.007); the approximation's own error
        // is of the same order, so the tolerance is 0.004.
        assertEquals(-0.4015769328909256, FloorBound.skewness(leftSkewed(0.15)), 1e-12);
        assertEquals(0.030765952430377483, FloorBound.nullShareBelow(ShapeFamily.LOGNORMAL3, N, FloorBound.skewness(leftSkewed(0.15))), 0.004);
        assertEquals(0.0072050114444341855, FloorBound.nullShareBelow(ShapeFamily.LOGNORMAL3, N, FloorBound.skewness(leftSkewed(0.20))), 0.004);
    }

    @Test
    void theExtremeValueNullAgreesWithASciPySimulation() {
        // NumPy 2 / SciPy 1.17.1: rng = numpy.random.default_rng(20261204); Y = log(rng.standard_exponential((200000, 125)));
        // g = scipy.stats.skew(Y, axis=1); quantile(g, 0.01) = -2.30628, quantile(g, 0.5) = -0.98990.
        // Tolerance: 3 SE of our 20,000 draws in probability, read off the same simulation: 0.01 ± 0.0021 lies in
        // [-2.3925, -2.2402], 0.5 ± 0.0106 in [-0.99914, -0.98104].
        assertEquals(-2.30628, FloorBound.nullQuantile(ShapeFamily.WEIBULL3, N, 0.01), 0.087);
        assertEquals(-0.98990, FloorBound.nullQuantile(ShapeFamily.WEIBULL3, N, 0.5), 0.0093);
    }

    private static double[] lognormal3(UniformRandomProvider rng, double theta, double sigma) {
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(rng);
        double[] x = new double[N];
        for (int i = 0; i < N; i++) {
            x[i] = theta + 0.05 * Math.exp(sigma * z.sample());
        }
        return x;
    }

    @Test
    void theTrueThresholdIsLeftOutAboutGammaOfTheTime() {
        // 4,000 studies, seeds 7,000 + i, lognormal3 σ 0.5 from 9.95: g1 of ln(x − 9.95) below the 1 % null quantile in
        // γ = 0.01 of them, SE √(0.01·0.99/4000) = 0.0016 (plus the null's own Monte-Carlo error, 0.0007)
        double critical = FloorBound.nullQuantile(ShapeFamily.LOGNORMAL3, N, 0.01);
        int out = 0;
        int studies = 4000;
        for (int s = 0; s < studies; s++) {
            double[] x = lognormal3(RandomSource.XO_RO_SHI_RO_128_PP.create(7_000L + s), 9.95, 0.5);
            out += FloorBound.skewAt(x, 9.95) < critical ? 1 : 0;
        }
        assertEquals(0.01, out / (double) studies, 2 * Math.sqrt(0.01 * 0.99 / studies) + 0.0014, "left out " + out);
    }

    @Test
    void theSetRunsFromTheFloorToAnEdgeBelowTheFirstReadingAndTheBoundIsSetThere() {
        int edgeLimited = 0;
        for (int s = 0; s < 20; s++) {
            double[] x = lognormal3(RandomSource.XO_RO_SHI_RO_128_PP.create(8_000L + s), 9.95, 0.25);
            FloorBound.ThresholdSet set = FloorBound.thresholds(ShapeFamily.LOGNORMAL3, 9.90, x, 0.01);
            double min = java.util.Arrays.stream(x).min().getAsDouble();
            assertFalse(set.empty());
            assertEquals(9.90, set.thetas()[0], 0, "the floor itself is the first threshold tried");
            assertTrue(set.highest() < min);
            double central = set.central();
            assertTrue(central >= 9.90 && central <= set.highest());
            SpecLimits usl = SpecLimits.upperOnly(10.3);
            double[] b = FloorBound.bounds(set, IndexKind.PPU, usl, 0.95, PivotalBound.DEFAULT_SEED);
            assertTrue(b[0] < b[1]);
            // the bound at the set's edge is the smallest one (the Javadoc's claim; a grid point below it could be
            // lower only if the bound did not fall as θ rises): here it is, in every study
            edgeLimited += b[2] == set.highest() ? 1 : 0;
        }
        assertEquals(20, edgeLimited);
    }

    @Test
    void aLooksSmallerErrorRateTakesItsOwnWiderSetAndALowerBound() {
        // a staged study's early look asks for 1 − α with a small α: γ = 0.2·α leaves more thresholds and the bound falls
        double[] x = lognormal3(RandomSource.XO_RO_SHI_RO_128_PP.create(8_100L), 9.95, 0.25);
        FloorBound.ThresholdSet set = FloorBound.thresholds(ShapeFamily.LOGNORMAL3, 9.90, x, FloorBound.GAMMA_SHARE * 0.05);
        FloorBound.Estimate e = new FloorBound.Estimate(set, IndexKind.PPU, SpecLimits.upperOnly(10.3),
                PivotalBound.DEFAULT_SEED, 2.0);
        assertTrue(e.setAt(0.95) == set);
        FloorBound.ThresholdSet early = e.setAt(0.9995);
        assertTrue(early.highest() >= set.highest(), early.highest() + " " + set.highest());
        double late = e.lower(0.95);
        double first = e.lower(0.9995);
        assertTrue(Double.isFinite(first) && first < late, first + " " + late);
    }

    @Test
    void aThresholdOnTheFirstReadingIsNeverKept() {
        // a study whose readings are normal (no skew at all) leaves most thresholds; ones close to x(1) stretch the
        // logs' lower tail and go
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(9_001L);
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(rng);
        double[] x = new double[N];
        for (int i = 0; i < N; i++) {
            x[i] = 10 + 0.01 * z.sample();
        }
        FloorBound.ThresholdSet set = FloorBound.thresholds(ShapeFamily.WEIBULL3, 9.0, x, 0.01);
        double min = java.util.Arrays.stream(x).min().getAsDouble();
        assertTrue(set.empty() || min - set.highest() > 1e-4 * (min - 9.0), set.toString());
    }

    @Test
    void badInputIsNamed() {
        double[] x = {10.0, 10.1, 10.2, 10.3};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FloorBound.thresholds(ShapeFamily.LOGNORMAL3, 10.0, x, 0.01));
        assertTrue(e.getMessage().contains("not above the floor 10.0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> FloorBound.thresholds(ShapeFamily.LOGNORMAL, 9.0, x, 0.01));
        assertThrows(IllegalArgumentException.class, () -> FloorBound.thresholds(ShapeFamily.LOGNORMAL3, 9.0, x, 0.6));
    }
}
