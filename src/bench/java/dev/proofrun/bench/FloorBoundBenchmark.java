package dev.proofrun.bench;

import dev.proofrun.stats.FloorBound;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PivotalBound;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.util.concurrent.TimeUnit;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * One lower bound of a threshold shape planned with a floor ({@link FloorBound}) for 150 readings (invented: 9.95 +
 * 0.05·lognormal σ 0.25 or Weibull k 1.5, floor 9.90): the set of thresholds (g₁ on the grid and the edge's bisection)
 * and a pivotal bound at each kept threshold. The pivot draws and the null of g₁ are cached per study size, as in a
 * grade after its first study of that size ("warm"). Goal: ≤ 300 ms warm. Run:
 * {@code mvn -B -Pbench test-compile exec:exec -Dbench=FloorBoundBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class FloorBoundBenchmark {

    @Param({"lognormal3", "weibull3"})
    public String shape;

    private ShapeFamily family;
    private double[] x;
    private final SpecLimits limits = SpecLimits.upperOnly(10.3);

    @org.openjdk.jmh.annotations.Setup
    public void setUp() {
        family = ShapeFamily.fromToken(shape);
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(150L);
        ZigguratSampler.NormalizedGaussian z = ZigguratSampler.NormalizedGaussian.of(rng);
        ZigguratSampler.Exponential e = ZigguratSampler.Exponential.of(rng);
        x = new double[150];
        for (int i = 0; i < x.length; i++) {
            x[i] = 9.95 + 0.05 * (family == ShapeFamily.WEIBULL3 ? Math.pow(e.sample(), 1 / 1.5) : Math.exp(0.25 * z.sample()));
        }
    }

    @Benchmark
    public double lowerBoundOf150ReadingsWithAFloor() {
        FloorBound.ThresholdSet set = FloorBound.thresholds(family, 9.90, x, FloorBound.GAMMA_SHARE * 0.05);
        return FloorBound.bounds(set, IndexKind.PPU, limits, 0.95, PivotalBound.DEFAULT_SEED)[0];
    }
}
