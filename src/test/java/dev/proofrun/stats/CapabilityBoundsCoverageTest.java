package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Simulated coverage of the 95 % lower bounds. Each cell draws 20,000 studies of N normal readings
 * (Commons RNG XO_RO_SHI_RO_128_PP, seed fixed per cell), estimates σ̂ = s with ν = N − 1, and counts
 * how often the bound is at or below the true index.
 *
 * <p>Tolerance: with 20,000 studies the binomial standard error of a 95 % rate is 0.0015, so the band
 * [0.94, 0.975] is about −6.7 to +17 standard errors around 0.95: an exact bound fails it only if it
 * is wrong, never by chance. The chi-square Cp bound is exact (a pivot) and is checked in the same band.
 *
 * <p>The Cpk bound with the centring taken from the data ({@link BoundMethod#EXACT}) is not a pivot.
 * For an off-centre process (Cp = Cpk + 0.5) it covers 95 % to within simulation noise; for a centred
 * process it is conservative, because the estimated offset |x̄ − m| is never below the true offset 0,
 * so the model behind the bound is always less centred than the truth: measured 96.0–96.6 %, i.e. 1 to
 * 1.6 points above nominal, at every N of the grid. That is still inside [0.94, 0.975], so every cell
 * is held to the same band (no wider limit was needed).
 *
 * <p>Measured (seeds as in the code; 20,000 studies per cell; lower bounds at 95 %):
 * <pre>
 *   N    Cpk   Cp    | EXACT Cpk  BISSELL Cpk  exact Cp
 *   30   1.00  1.00  | 0.9643     0.9772       0.9502
 *   30   1.00  1.50  | 0.9492     0.9461       0.9515
 *   30   1.33  1.33  | 0.9629     0.9720       0.9526
 *   30   1.33  1.83  | 0.9498     0.9468       0.9498
 *   30   1.67  1.67  | 0.9605     0.9672       0.9505
 *   30   1.67  2.17  | 0.9496     0.9468       0.9510
 *   100  1.00  1.00  | 0.9628     0.9789       0.9491
 *   100  1.00  1.50  | 0.9493     0.9481       0.9476
 *   100  1.33  1.33  | 0.9622     0.9727       0.9503
 *   100  1.33  1.83  | 0.9498     0.9481       0.9507
 *   100  1.67  1.67  | 0.9596     0.9682       0.9504
 *   100  1.67  2.17  | 0.9486     0.9474       0.9487
 *   300  1.00  1.00  | 0.9657     0.9814       0.9494
 *   300  1.00  1.50  | 0.9477     0.9469       0.9502
 *   300  1.33  1.33  | 0.9640     0.9746       0.9512
 *   300  1.33  1.83  | 0.9494     0.9486       0.9480
 *   300  1.67  1.67  | 0.9626     0.9721       0.9528
 *   300  1.67  2.17  | 0.9514     0.9505       0.9490
 * </pre>
 * Bissell's bound is reported (printed by the test), not asserted: off-centre it covers slightly less
 * than 95 % at N = 30 (94.6–94.7 %), centred it over-covers (96.7–98.1 %, above 0.975 in four cells).
 */
class CapabilityBoundsCoverageTest {

    /** Studies per cell of the long grid (the figures above). */
    private static final int STUDIES = 20_000;
    /**
     * Studies per cell of the default run: standard error 0.0024 at 95 %, so the band is −4.1 to +10.4 standard
     * errors — a correct bound still never fails it by chance, and one that covers 93.5 % or less still fails it
     * (0.935 is 2.1 of its standard errors below 0.94). Measured with 8,000 (the first 8,000 draws of each cell's
     * seed): N=30 Cpk 1.33 Cp 1.33 EXACT 0.9624, Cp 0.9528; N=30 1.00/1.50 0.9480, 0.9513; N=100 1.67/2.17 0.9476,
     * 0.9470.
     */
    private static final int DEFAULT_STUDIES = 8_000;
    private static final double CONFIDENCE = CoverageBand.CONFIDENCE;

    /** A representative part of the grid for the default run: one centred and two off-centre cells. */
    @ParameterizedTest(name = "N={0} Cpk={1} Cp={2}")
    @CsvSource({"30, 1.33, 1.33", "30, 1.0, 1.5", "100, 1.67, 2.17"})
    void representativeCells(int n, double cpk, double cp) {
        check(n, cpk, cp, DEFAULT_STUDIES);
    }

    @Tag("long")
    @ParameterizedTest(name = "N={0} Cpk={1} Cp={2}")
    @CsvSource({
        "30, 1.0, 1.0", "30, 1.0, 1.5", "30, 1.33, 1.33", "30, 1.33, 1.83", "30, 1.67, 1.67", "30, 1.67, 2.17",
        "100, 1.0, 1.0", "100, 1.0, 1.5", "100, 1.33, 1.33", "100, 1.33, 1.83", "100, 1.67, 1.67", "100, 1.67, 2.17",
        "300, 1.0, 1.0", "300, 1.0, 1.5", "300, 1.33, 1.33", "300, 1.33, 1.83", "300, 1.67, 1.67", "300, 1.67, 2.17",
    })
    void wholeGrid(int n, double cpk, double cp) {
        check(n, cpk, cp, STUDIES);
    }

    private static void check(int n, double cpk, double cp, int studies) {
        double[] rates = coverage(n, cpk, cp, studies);
        String cell = String.format(Locale.ROOT, "N=%d Cpk=%.2f Cp=%.2f: exact %.4f bissell %.4f cp %.4f",
                n, cpk, cp, rates[0], rates[1], rates[2]);
        System.out.println("coverage " + cell);
        assertTrue(CoverageBand.holds(rates[0]), "EXACT Cpk " + cell);
        assertTrue(CoverageBand.holds(rates[2]), "Cp " + cell);
    }

    /** Coverage rates {EXACT Cpk, BISSELL Cpk, exact Cp} of the lower bounds at 95 %. */
    static double[] coverage(int n, double cpk, double cp, int studies) {
        long seed = 1_000_003L * n + Math.round(1000 * cpk) * 7919L + Math.round(1000 * cp);
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian normal = ZigguratSampler.NormalizedGaussian.of(rng);
        // sigma 1, tolerance midpoint 0, half-width 3Cp, mean above the midpoint by 3(Cp - Cpk)
        double half = 3 * cp;
        double mu = 3 * (cp - cpk);
        int nu = n - 1;
        int exact = 0;
        int bissell = 0;
        int cpCovered = 0;
        for (int s = 0; s < studies; s++) {
            NormalStudy study = NormalStudy.draw(normal, n, mu);
            double mean = study.mean();
            double sd = study.sd();
            double cpHat = half / (3 * sd);
            double cpkHat = (half - Math.abs(mean)) / (3 * sd);
            if (CapabilityBounds.lowerCpk(cpkHat, cpHat, n, nu, CONFIDENCE, BoundMethod.EXACT) <= cpk) {
                exact++;
            }
            if (CapabilityBounds.lowerCpk(cpkHat, cpHat, n, nu, CONFIDENCE, BoundMethod.BISSELL) <= cpk) {
                bissell++;
            }
            if (CapabilityBounds.lowerCp(cpHat, nu, CONFIDENCE) <= cp) {
                cpCovered++;
            }
        }
        return new double[] {exact / (double) studies, bissell / (double) studies, cpCovered / (double) studies};
    }
}
