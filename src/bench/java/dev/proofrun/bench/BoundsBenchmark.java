package dev.proofrun.bench;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.CapabilityBounds;
import dev.proofrun.stats.IndexDistribution;
import dev.proofrun.stats.NoncentralT;
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
 * Cost per call of the statistics-core bounds. Run:
 * {@code mvn -B -Pbench test-compile exec:exec -Dbench=BoundsBenchmark} (-Dbench takes only the regex;
 * for other JMH options run {@code org.openjdk.jmh.Main} on the bench test classpath, see DEVELOPERS.md).
 *
 * <p>Cases: a 30-reading study near Cpk 1.33 (df 29) and a 1,000-reading study at Cpk 2 (df 999,
 * noncentrality near 190), which span what the design tables ask for.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class BoundsBenchmark {

    @Param({"30", "1000"})
    public int readings;

    private double cpk;
    private double nu;
    private double t;
    private double ncp;

    @org.openjdk.jmh.annotations.Setup
    public void setUp() {
        cpk = readings == 30 ? 1.33 : 2.0;
        nu = readings - 1;
        ncp = 3 * Math.sqrt(readings) * cpk;
        t = ncp * 0.97;
    }

    @Benchmark
    public double noncentralTCdf() {
        return NoncentralT.cdf(t, nu, ncp);
    }

    @Benchmark
    public double cpkAtLeast() {
        return IndexDistribution.cpkAtLeast(cpk * 0.95, cpk, cpk + 0.5, readings, nu);
    }

    @Benchmark
    public double lowerCpkExact() {
        return CapabilityBounds.lowerCpk(cpk, cpk + 0.5, readings, nu, 0.95, BoundMethod.EXACT);
    }

    @Benchmark
    public double lowerOneSided() {
        return CapabilityBounds.lowerOneSided(cpk, readings, nu, 0.95);
    }
}
