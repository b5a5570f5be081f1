package dev.proofrun.design;

import dev.proofrun.stats.IndexKind;
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
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A whole design table (n = 1–10, exact bound, default floors, with OC and power curves) as the wizard
 * recomputes it while the user types. Goal: ≤ 20 ms warm. The run-rule risks are read from the stored
 * table ({@code RuleRiskTable}, loaded once per JVM), so the set-up call loads it as the wizard's first table does.
 * Run: mvn -B -Pbench test-compile exec:exec -Dbench=DesignTable
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class DesignTableBenchmark {

    @Param({"centred", "off-centre", "cp"})
    public String scenario;

    private DesignRequest request;
    private double step;

    @Setup
    public void setUp() {
        switch (scenario) {
            case "centred":
                request = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                        Expectation.centred(1.67));
                break;
            case "off-centre":
                request = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                        Expectation.offCentre(1.67, 2.0));
                break;
            default:
                request = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CP, 1.33, 0.95),
                        Expectation.centred(1.67));
        }
        StudyDesigner.design(request);
    }

    /** A slightly different c₁ each call, as when typing: nothing of the power side is cached. */
    @Benchmark
    public DesignTable wholeTable() {
        step = step >= 0.01 ? 0 : step + 0.0001;
        Expectation e = request.expectation();
        Expectation next = e.potential().isPresent()
                ? Expectation.offCentre(e.index() + step, e.potential().getAsDouble() + step)
                : Expectation.centred(e.index() + step);
        return StudyDesigner.design(request.withExpectation(next));
    }
}
