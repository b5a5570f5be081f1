package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Sampling distributions of estimated indices against SciPy 1.17.1, mpmath 1.3.0 and a seeded simulation. */
class IndexDistributionTest {

    /** The quadrature runs to 1e-12; the promise to callers is 1e-9. */
    private static final double ABSOLUTE = 1e-9;

    @ParameterizedTest
    @CsvSource({
        // c,   trueCp, nu,  expected: SciPy 1.17.1 scipy.stats.chi2.cdf(nu*(trueCp/c)**2, nu)
        "1.33, 1.5,    29,   0.850871920076922",
        "1.0,  1.33,   19,   0.9795733577124176",
        "1.67, 1.67,   99,   0.5189030875917361",
        "1.2,  1.0,    41.7, 0.06751421152878434",
    })
    void cpIsChiSquare(double c, double trueCp, double nu, double expected) {
        assertEquals(expected, IndexDistribution.cpAtLeast(c, trueCp, nu), ABSOLUTE);
    }

    @ParameterizedTest
    @CsvSource({
        // c,   trueCpu, n,  nu,  expected: SciPy 1.17.1 scipy.stats.nct.sf(3*sqrt(n)*c, nu, 3*sqrt(n)*trueCpu)
        "1.33, 1.5,     30,  29,   0.8375352486757417",
        "1.0,  1.33,    20,  19,   0.9700061089040503",
        "1.67, 1.67,   100,  99,   0.5178675697082568",
        "1.2,  1.0,     50,  41.7, 0.08083353800242628",
    })
    void oneSidedIsNoncentralT(double c, double trueCpu, int n, double nu, double expected) {
        assertEquals(expected, IndexDistribution.oneSidedAtLeast(c, trueCpu, n, nu), ABSOLUTE);
    }

    /**
     * mpmath 1.3.0, 30 digits, integrating in the other order (over the mean, with the chi-square
     * probability inside): src/test/resources/dev/proofrun/stats/cpk-distribution-reference.py.
     */
    @ParameterizedTest
    @CsvSource({
        // c,  trueCpk, trueCp, n, nu, P(Cpk^ >= c)
        "1.2, 1.33, 1.5, 100, 99, 0.92561358446283020422",
        "1.33, 1.33, 1.33, 30, 29, 0.42585578541909511807",
        "1.5, 1.67, 2.17, 300, 299, 0.99573778720258066478",
        "1.0, 1.33, 1.33, 20, 19, 0.95028760511807855561",
        "1.1, 1.0, 1.2, 50, 41.7, 0.23690856707245242188",
        "0.9, 1.0, 1.0, 10, 9, 0.58828041526747763472",
        "1.6, 1.33, 1.83, 125, 110.5, 0.0073543514564769041571",
        "0.5, 0.3, 1.5, 30, 29, 0.012977102927130965909",
        "2.0, 2.0, 2.5, 1000, 999, 0.50571547613481594435",
        "0.2, 1.0, 1.0, 5, 3.6, 0.99999836577572474044",
        "1.4, 1.33, 1.33, 200, 180.2, 0.12291304178365068901",
        "1.0, 1.2, 4.0, 40, 39, 0.94878990308531668997",
    })
    void cpkMatchesTheDoubleIntegral(double c, double trueCpk, double trueCp, int n, double nu, double expected) {
        assertEquals(expected, IndexDistribution.cpkAtLeast(c, trueCpk, trueCp, n, nu), ABSOLUTE);
    }

    /**
     * Seeded simulation: 40,000 studies of N = 25 normal readings (σ̂ = s, ν = 24), off-centre
     * (Cp 1.5, Cpk 1.2), counting Ĉpk ≥ c. The binomial standard error is at most 0.0025; the tolerance
     * is four of them, so a correct integral fails this by chance about once in 16,000 runs — and never
     * with the fixed seed.
     */
    @Test
    void cpkAgreesWithSimulatedStudies() {
        int studies = 40_000;
        int n = 25;
        double cp = 1.5;
        double cpk = 1.2;
        double[] thresholds = {0.9, 1.1, 1.2, 1.4};
        // Process with sigma 1, tolerance midpoint 0, half-width 3Cp, mean shifted by 3(Cp - Cpk).
        double half = 3 * cp;
        double mu = 3 * (cp - cpk);
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(20261201L);
        ZigguratSampler.NormalizedGaussian normal = ZigguratSampler.NormalizedGaussian.of(rng);
        int[] hits = new int[thresholds.length];
        for (int s = 0; s < studies; s++) {
            NormalStudy study = NormalStudy.draw(normal, n, mu);
            double cpkHat = (half - Math.abs(study.mean())) / (3 * study.sd());
            for (int j = 0; j < thresholds.length; j++) {
                if (cpkHat >= thresholds[j]) {
                    hits[j]++;
                }
            }
        }
        double tolerance = 4 * 0.5 / Math.sqrt(studies);
        for (int j = 0; j < thresholds.length; j++) {
            double expected = IndexDistribution.cpkAtLeast(thresholds[j], cpk, cp, n, n - 1);
            assertEquals(expected, hits[j] / (double) studies, tolerance, "threshold " + thresholds[j]);
        }
    }

    @Test
    void cpkEdges() {
        // c <= 0 is reached whenever |D| <= 3Cp + 3|c|W; for c = 0 exactly P(|D| <= 3Cp) (centred, N = 4):
        // 2*Phi(3*1.0*2) - 1, SciPy 1.17.1 2*scipy.stats.norm.cdf(6)-1 = 0.9999999980268246
        assertEquals(0.9999999980268246, IndexDistribution.cpkAtLeast(0, 1.0, 1.0, 4, 3), ABSOLUTE);
        // Far above anything the estimate reaches.
        assertEquals(0, IndexDistribution.cpkAtLeast(50, 1.0, 1.0, 30, 29), ABSOLUTE);
        // Centred and far off-centre with a wide tolerance: the far limit no longer matters and Cpk^ is Cpu^.
        assertEquals(IndexDistribution.oneSidedAtLeast(1.1, 1.0, 40, 39),
                IndexDistribution.cpkAtLeast(1.1, 1.0, 6.0, 40, 39), ABSOLUTE);
    }

    @Test
    void rejectsBadInput() {
        assertThrows(IllegalArgumentException.class, () -> IndexDistribution.cpkAtLeast(1, 1.5, 1.2, 30, 29));
        assertThrows(IllegalArgumentException.class, () -> IndexDistribution.cpkAtLeast(1, 1.0, 0, 30, 29));
        assertThrows(IllegalArgumentException.class, () -> IndexDistribution.cpkAtLeast(1, 1.0, 1.2, 1, 29));
        assertThrows(IllegalArgumentException.class, () -> IndexDistribution.cpkAtLeast(Double.NaN, 1.0, 1.2, 30, 29));
        assertThrows(IllegalArgumentException.class, () -> IndexDistribution.cpAtLeast(1, -1, 29));
        assertThrows(IllegalArgumentException.class, () -> IndexDistribution.oneSidedAtLeast(1, 1, 30, -2));
    }
}
