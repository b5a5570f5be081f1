package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The upper bound on parts per million from an index's lower bound ({@link Nonconforming#upperPpm}). */
class NonconformingBoundTest {

    private static final SpecLimits TWO = SpecLimits.twoSided(-1, 1);
    private static final SpecLimits UPPER = SpecLimits.upperOnly(1);

    @Test
    void matchesTheNormalTailAsScipyComputesIt() {
        // SciPy 1.17.1: 2*scipy.stats.norm.sf(3*L)*1e6 (two limits) and scipy.stats.norm.sf(3*L)*1e6 (one limit)
        assertEquals(2699.7960632601867, Nonconforming.upperPpm(IndexKind.CPK, TWO, 1.0).getAsDouble(), 1e-9);
        assertEquals(66.07329525880472, Nonconforming.upperPpm(IndexKind.PPK, TWO, 1.33).getAsDouble(), 1e-10);
        assertEquals(0.606926470431608, Nonconforming.upperPpm(IndexKind.CPK, TWO, 1.663).getAsDouble(), 1e-12);
        assertEquals(33.03664762940236, Nonconforming.upperPpm(IndexKind.PPU, UPPER, 1.33).getAsDouble(), 1e-10);
        assertEquals(33.03664762940236, Nonconforming.upperPpm(IndexKind.CPK, UPPER, 1.33).getAsDouble(), 1e-10);
    }

    @Test
    void indicesThatIgnoreCentringOrOneSideOfTwoBoundNothing() {
        assertTrue(Nonconforming.upperPpm(IndexKind.CP, TWO, 1.5).isEmpty(), "Cp ignores centring");
        assertTrue(Nonconforming.upperPpm(IndexKind.PP, TWO, 1.5).isEmpty(), "Pp ignores centring");
        assertTrue(Nonconforming.upperPpm(IndexKind.CPU, TWO, 1.5).isEmpty(), "Cpu says nothing of the lower tail");
        assertTrue(Nonconforming.upperPpm(IndexKind.PPK, TWO, Double.NaN).isEmpty(), "no lower bound");
    }

    /**
     * Coverage: 2000 studies of N = 125 normal readings (seed 20271203), Ppk with s and ν = N − 1, exact lower
     * 95 % bound. The true fraction outside must be at most the bound in at least 95 % − 2 SE of them (SE =
     * √(0.95·0.05/2000) ≈ 0.49 %): the bound inherits the index bound's coverage and adds slack (at most a
     * factor 2 in ppm). Off centre (μ = 0.2, σ = 0.25: Ppk = 1.067, 688 ppm of which 687 above USL) and
     * centred (μ = 0, σ = 0.3: Ppk = 1.11, 858 ppm, where 2·Φ(−3·Ppk) is exact); true ppm from SciPy 1.17.1
     * norm.cdf/norm.sf agree with {@link Nonconforming#expectedPpm}.
     */
    @Test
    void theBoundCoversTheTrueFractionInAtLeastNinetyFivePercentOfStudies() {
        double[][] cases = {{0.2, 0.25}, {0.0, 0.3}};
        for (double[] c : cases) {
            double mu = c[0];
            double sigma = c[1];
            double truePpm = Nonconforming.expectedPpm(TWO, mu, sigma);
            SplittableRandom rnd = new SplittableRandom(20271203L);
            int studies = 2000;
            int n = 125;
            int covered = 0;
            for (int s = 0; s < studies; s++) {
                double sum = 0;
                double sq = 0;
                double[] x = new double[n];
                for (int i = 0; i < n; i++) {
                    x[i] = mu + sigma * gaussian(rnd);
                    sum += x[i];
                }
                double m = sum / n;
                for (double v : x) {
                    sq += (v - m) * (v - m);
                }
                double sd = Math.sqrt(sq / (n - 1));
                double ppk = Math.min(1 - m, m + 1) / (3 * sd);
                double pp = 2 / (6 * sd);
                double lower = CapabilityBounds.lowerCpk(ppk, pp, n, n - 1, 0.95, BoundMethod.EXACT);
                if (Nonconforming.upperPpm(IndexKind.PPK, TWO, lower).getAsDouble() >= truePpm) {
                    covered++;
                }
            }
            double rate = covered / (double) studies;
            double se = Math.sqrt(0.95 * 0.05 / studies);
            assertTrue(rate >= 0.95 - 2 * se, "coverage " + rate + " at mu " + mu + ", sigma " + sigma);
        }
    }

    /** Box–Muller from two uniforms of the seeded generator. */
    private static double gaussian(SplittableRandom rnd) {
        double u = 1 - rnd.nextDouble();
        double v = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }
}
