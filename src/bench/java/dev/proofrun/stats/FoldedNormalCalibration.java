package dev.proofrun.stats;

import java.util.Locale;
import java.util.stream.IntStream;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The evidence against a calibrated bootstrap bound for the folded normal (not shipped; the product uses
 * {@link FoldedNormalBound}): the bias-corrected parametric-bootstrap bound (Efron 1981), {@value #REFITS} refits,
 * taken at error rate r·α, the bound
 * alone (fit and bound on simulated readings, no grader), upper limit only, placed so that the true percentile
 * index is c₀ = 1.33. For every configuration (mean/σ, N) of the calibration grid, the share of studies whose
 * lower bound at error rate r·α reaches c₀ is printed for each ratio r, at α = 0.05 and 0.10. The bootstrap
 * seed is {@link PivotalBound#DEFAULT_SEED}, as in the grader; study s of configuration i draws its readings
 * from seed 900,000 + 1,000·i + s.
 *
 * <p>This grid is deliberately not the one the grader is checked on (mean/σ ∈ {0, 0.5, 1, 2, 3},
 * N ∈ {50, 125, 250}); see docs/decisions/declared-shape-grading.md.
 *
 * <pre>mvn -B -q -Pbench test-compile
 * java -cp "target/test-classes:target/classes:$(mvn -q -Pbench dependency:build-classpath -Dmdep.outputFile=/dev/stdout)" \
 *     dev.proofrun.stats.FoldedNormalCalibration 600</pre>
 */
public final class FoldedNormalCalibration {

    static final double C0 = 1.33;
    static final double[] THETAS = {0.25, 0.75, 1.5, 2.5, 4};
    static final int[] SIZES = {40, 80, 160, 320};
    static final double[] RATIOS = {1, 0.8, 0.6, 0.5, 0.4, 0.3, 0.25, 0.2};
    static final double[] ALPHAS = {0.05, 0.10};

    private FoldedNormalCalibration() {
    }

    public static void main(String[] args) {
        int studies = args.length > 0 ? Integer.parseInt(args[0]) : 600;
        System.out.printf(Locale.ROOT, "%-6s %-4s %-5s", "theta", "N", "alpha");
        for (double r : RATIOS) {
            System.out.printf(Locale.ROOT, " r=%-5.2f", r);
        }
        System.out.println();
        int config = 0;
        for (double theta : THETAS) {
            for (int n : SIZES) {
                long base = 900_000L + 1_000L * config++;
                int[][] passed = new int[ALPHAS.length][RATIOS.length];
                int[][][] each = IntStream.range(0, studies).parallel()
                        .mapToObj(s -> study(theta, n, base + s)).toArray(int[][][]::new);
                for (int[][] e : each) {
                    for (int a = 0; a < ALPHAS.length; a++) {
                        for (int r = 0; r < RATIOS.length; r++) {
                            passed[a][r] += e[a][r];
                        }
                    }
                }
                for (int a = 0; a < ALPHAS.length; a++) {
                    System.out.printf(Locale.ROOT, "%-6.2f %-4d %-5.2f", theta, n, ALPHAS[a]);
                    for (int r = 0; r < RATIOS.length; r++) {
                        System.out.printf(Locale.ROOT, " %-7.4f", passed[a][r] / (double) studies);
                    }
                    System.out.println();
                }
            }
        }
    }

    /** 1 where the bound at error rate r·α reaches c₀, per α and r. */
    static int[][] study(double theta, int n, long seed) {
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(RandomSource.XO_RO_SHI_RO_128_PP.create(seed));
        double q50 = FoldedNormal.quantile(theta, 1, 0.5);
        double usl = q50 + C0 * (FoldedNormal.quantile(theta, 1, PercentileIndex.HIGH) - q50);
        SpecLimits limits = SpecLimits.upperOnly(usl);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.abs(theta + g.sample());
        }
        int[][] out = new int[ALPHAS.length][RATIOS.length];
        double[] f = FoldedNormal.fit(x);
        if (f == null) {
            return out;
        }
        ShapeFit fit = new ShapeFit(ShapeFamily.FOLDED_NORMAL, f[0], f[1]);
        double[] c = refitted(fit, limits, n, PivotalBound.DEFAULT_SEED);
        double estimate = PercentileIndex.of(IndexKind.PPU, limits, fit);
        for (int a = 0; a < ALPHAS.length; a++) {
            for (int r = 0; r < RATIOS.length; r++) {
                out[a][r] = biasCorrected(c, estimate, RATIOS[r] * ALPHAS[a], false) >= C0 ? 1 : 0;
            }
        }
        return out;
    }

    static final int REFITS = 1000;
    private static final org.apache.commons.statistics.distribution.NormalDistribution STANDARD =
            org.apache.commons.statistics.distribution.NormalDistribution.of(0, 1);

    /** Ppu of {@value #REFITS} studies drawn from {@code fit} and refitted; sorted. */
    static double[] refitted(ShapeFit fit, SpecLimits limits, int n, long seed) {
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(RandomSource.XO_RO_SHI_RO_128_PP.create(seed));
        double[] c = new double[REFITS];
        double[] x = new double[n];
        for (int j = 0; j < REFITS; j++) {
            double[] f = null;
            while (f == null) {
                for (int i = 0; i < n; i++) {
                    x[i] = Math.abs(fit.location() + fit.scale() * z.sample());
                }
                f = FoldedNormal.fit(x);
            }
            c[j] = PercentileIndex.of(IndexKind.PPU, limits, new ShapeFit(ShapeFamily.FOLDED_NORMAL, f[0], f[1]));
        }
        java.util.Arrays.sort(c);
        return c;
    }

    /** The bias-corrected lower bound at error rate a: the Φ(2z₀ − z)-quantile, z₀ = Φ⁻¹(share below the estimate). */
    static double biasCorrected(double[] sorted, double estimate, double a, boolean upper) {
        int below = 0;
        for (double v : sorted) {
            below += v < estimate ? 1 : 0;
        }
        double z0 = STANDARD.inverseCumulativeProbability(Math.min(Math.max((below + 0.5) / (sorted.length + 1.0), 1e-6), 1 - 1e-6));
        double za = STANDARD.inverseCumulativeProbability(1 - a);
        return PivotalBound.orderStatistic(sorted, STANDARD.cumulativeProbability(upper ? 2 * z0 + za : 2 * z0 - za));
    }
}
