package dev.proofrun.stats;

import java.util.Locale;
import java.util.stream.IntStream;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The bound alone ({@link FoldedNormalBound}, no grader gates): for mean/σ θ and N readings, the share of
 * simulated studies whose 95 % lower bound of Ppu reaches c₀ = 1.33 when the true index is c₀ (at most α
 * allowed) and when it is 1.67 (the power), upper limit only. Study s of configuration i draws its readings from
 * seed 700,000 + 10,000·i + s; the bound's own seed is {@link PivotalBound#DEFAULT_SEED}, as in the grader.
 * Also prints the time to build the table of one N (first bound) and of a bound after it.
 *
 * <pre>mvn -B -q -Pbench test-compile
 * java -cp "target/test-classes:target/classes:$(mvn -q -Pbench dependency:build-classpath -Dmdep.outputFile=/dev/stdout)" \
 *     dev.proofrun.stats.FoldedNormalBoundProbe 400 0,0.5,1,2,3 50,125,250</pre>
 */
public final class FoldedNormalBoundProbe {

    static final double C0 = 1.33;
    static final double C1 = 1.67;

    private FoldedNormalBoundProbe() {
    }

    public static void main(String[] args) {
        int studies = args.length > 0 ? Integer.parseInt(args[0]) : 400;
        double[] thetas = args.length > 1 ? parse(args[1]) : new double[] {0, 0.5, 1, 2, 3};
        double[] sizes = args.length > 2 ? parse(args[2]) : new double[] {50, 125, 250};
        int config = 0;
        for (double n : sizes) {
            long t0 = System.nanoTime();
            FoldedNormalBound.table((int) n, PivotalBound.DEFAULT_SEED);
            System.out.printf(Locale.ROOT, "N %d: table %.2f s%n", (int) n, (System.nanoTime() - t0) / 1e9);
            for (double theta : thetas) {
                long base = 700_000L + 10_000L * config++;
                double atC0 = IntStream.range(0, studies).parallel().map(s -> passes(theta, (int) n, C0, base + s)).sum() / (double) studies;
                double atC1 = IntStream.range(0, studies).parallel().map(s -> passes(theta, (int) n, C1, base + 5_000 + s)).sum() / (double) studies;
                System.out.printf(Locale.ROOT, "theta %.2f N %3d: passed at c0 %.4f (limit %.4f), at %.2f %.4f%n", theta, (int) n,
                        atC0, 0.05 + 2 * Math.sqrt(0.05 * 0.95 / studies), C1, atC1);
            }
        }
    }

    private static double[] parse(String s) {
        String[] p = s.split(",");
        double[] v = new double[p.length];
        for (int i = 0; i < p.length; i++) {
            v[i] = Double.parseDouble(p[i]);
        }
        return v;
    }

    /** 1 if the 95 % lower bound of a study of N readings |θ + Z| reaches c₀ when the true index is c. */
    static int passes(double theta, int n, double c, long seed) {
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(RandomSource.XO_RO_SHI_RO_128_PP.create(seed));
        double q50 = FoldedNormal.quantile(theta, 1, 0.5);
        SpecLimits limits = SpecLimits.upperOnly(q50 + c * (FoldedNormal.quantile(theta, 1, PercentileIndex.HIGH) - q50));
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.abs(theta + g.sample());
        }
        double[] f = FoldedNormal.fit(x);
        if (f == null) {
            return 0;
        }
        ShapeFit fit = new ShapeFit(ShapeFamily.FOLDED_NORMAL, f[0], f[1]);
        return FoldedNormalBound.bounds(fit, IndexKind.PPU, limits, n, 0.95, PivotalBound.DEFAULT_SEED)[0] >= C0 ? 1 : 0;
    }
}
