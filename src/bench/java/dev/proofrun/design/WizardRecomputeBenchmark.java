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
 * The wizard's recompute after an edit of the Goal step: the call {@code app.sizing.SizingViewModel.recompute} makes
 * on its worker, {@code StudyDesigner.design(DesignRequest.of(sides, requirement, expectation).withPower(power))},
 * for the whole table n = 1–10 with the whole procedure's power (every gate) and the grader's stability risks per
 * row. Goal: ≤ 300 ms warm.
 *
 * <p>Unlike {@link DesignTableBenchmark} (which moves c₁ by 0.0001, so every row keeps its k), each call here is an
 * edit the user has not made before in this JVM: the expected Cpk steps by {@value #STEP} from {@value #FIRST} upward
 * (to 1.75 over the 40 shots) and never comes back, so the rows limited by power (most of them in this range) move
 * to a k whose stability risks are not yet in any cache (what depends
 * only on (n, k) is cached for the life of the JVM, and a real edit meets that cache as this benchmark does). Single
 * shots: the warm-up edits warm the JIT, each measured shot is one edit. Every row of these tables stays within the
 * 500 readings that {@code control.DetectionTable} stores.
 *
 * <pre>
 * mvn -B -Pbench test-compile exec:exec -Dbench=WizardRecompute
 * </pre>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 10)
@Measurement(iterations = 30)
@Fork(1)
public class WizardRecomputeBenchmark {

    static final double FIRST = 1.55;
    static final double STEP = 0.005;

    /** Cpk 1.33 at 95 %, the default power, two-sided limits: the Goal step's defaults. */
    @Param({"centred", "off-centre"})
    public String scenario;

    private DesignRequest request;
    private int edits;

    @Setup
    public void setUp() {
        request = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                Expectation.centred(1.67)).withPower(DesignRequest.DEFAULT_POWER);
        edits = 0;
    }

    /** One edit: the next expected Cpk (off centre: Cp 0.33 above it), never one asked before in this fork. */
    @Benchmark
    public DesignTable edit() {
        double c1 = FIRST + STEP * edits++;
        Expectation e = scenario.equals("centred") ? Expectation.centred(c1) : Expectation.offCentre(c1, c1 + 0.33);
        return StudyDesigner.design(request.withExpectation(e));
    }
}
