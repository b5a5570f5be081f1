package dev.proofrun.bench;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PivotalBound;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.ShapeFit;
import dev.proofrun.stats.SpecLimits;
import java.util.concurrent.TimeUnit;
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
 * One lower bound of the percentile index for a characteristic of 150 readings under a declared skewed shape,
 * with the pivot draws made afresh every call (a new seed each time, so the cache never answers): the cost a
 * grade pays the first time it meets a study size. Goal: ≤ 300 ms warm. Run:
 * {@code mvn -B -Pbench test-compile exec:exec -Dbench=PivotalBoundBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class PivotalBoundBenchmark {

    @Param({"lognormal", "weibull"})
    public String shape;

    private ShapeFit fit;
    private long seed;
    private final SpecLimits limits = SpecLimits.upperOnly(4.0);

    @org.openjdk.jmh.annotations.Setup
    public void setUp() {
        ShapeFamily f = ShapeFamily.fromToken(shape);
        fit = f == ShapeFamily.WEIBULL ? new ShapeFit(f, 0, 1 / 1.5) : new ShapeFit(f, 0, 0.25);
    }

    @Benchmark
    public double lowerBoundOf150Readings() {
        return PivotalBound.bounds(fit, IndexKind.PPK, limits, 150, 0.95, seed++)[0];
    }
}
