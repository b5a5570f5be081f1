package dev.proofrun.design;

import dev.proofrun.stats.FoldedNormalPower;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.ShapeSkewness;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.IntStream;
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
 * The warm table of {@code size --shape NAME --skewness G --spec upper --target 1.33}, n = 1..10, power 0.9, default
 * floors: {@link ShapeSizing#design}. Goal (issue 12): ≤ 2 s warm on two cores.
 *
 * <p>Each shot is an expected index not asked before in the fork ({@value #FIRST} upward by {@value #STEP}), so the
 * study sizes it visits are mostly new: the simulated studies and pivot draws for a new N, and the stability gates for
 * a new (n, k), are not in any cache, as after a real edit. What depends only on N or (n, k) is cached for the life of
 * the JVM, so a shot that meets an N asked before is cheaper; the steps are wide enough that few do. Single shots: the
 * warm-up shots warm the JIT.
 *
 * <pre>
 * mvn -B -Pbench test-compile exec:exec -Dbench=ShapeSizingBenchmark
 * </pre>
 * The folded normal takes 10-20 s a shot; fewer shots for it alone:
 * {@code java -cp "target/test-classes:target/classes:$(cat cp.txt)" org.openjdk.jmh.Main ShapeSizingBenchmark
 * -p shape=folded-normal -wi 2 -i 5} (cp.txt from {@code mvn -o -q -Pbench dependency:build-classpath
 * -Dmdep.outputFile=cp.txt}).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 4)
@Measurement(iterations = 10)
@Fork(1)
public class ShapeSizingBenchmark {

    static final double FIRST = 1.60;
    static final double STEP = 0.01;
    /** The skewness added at each shot of {@link #tableAfterShapeEdit}. */
    static final double SKEW_STEP = 0.001;

    /**
     * The planned shape: Weibull and lognormal at skewness 1 (Weibull k 1.564, lognormal σ of ln x 0.314), the folded
     * normal at skewness 0.70 (mean/σ 1, where its bound keeps the least power).
     */
    @Param({"weibull", "lognormal", "folded-normal"})
    public String shape;

    private ShapeFamily family;
    private double parameter;
    private int edits;
    private int shapeEdits;
    private final List<Integer> sizes = IntStream.rangeClosed(1, 10).boxed().toList();

    @Setup
    public void setUp() {
        family = ShapeFamily.fromToken(shape);
        parameter = family == ShapeFamily.FOLDED_NORMAL ? FoldedNormalPower.meanRatio(0.7017499382606746)
                : ShapeSkewness.parameter(family, 1.0);
        edits = 0;
        shapeEdits = 0;
    }

    /** One table at the next expected index. */
    @Benchmark
    public List<ShapeSizing.Row> table() {
        double c1 = FIRST + STEP * edits++;
        return ShapeSizing.design(family, parameter, IndexKind.Side.UPPER, 1.33, c1, 0.95, 0.9, sizes,
                PracticeFloors.defaults());
    }

    /**
     * One table at expected index 1.67 after an edit of the skewness ({@value #SKEW_STEP} more each shot): the
     * simulated studies of every study size are new (the folded normal keeps its studies' fits per mean/σ and N, and
     * the lognormal and Weibull their pivot draws per N only, so for those two this is {@link #table} again).
     */
    @Benchmark
    public List<ShapeSizing.Row> tableAfterShapeEdit() {
        double skewness = (family == ShapeFamily.FOLDED_NORMAL ? 0.7017499382606746 : 1.0) + SKEW_STEP * shapeEdits++;
        double p = family == ShapeFamily.FOLDED_NORMAL ? FoldedNormalPower.meanRatio(skewness)
                : ShapeSkewness.parameter(family, skewness);
        return ShapeSizing.design(family, p, IndexKind.Side.UPPER, 1.33, 1.67, 0.95, 0.9, sizes,
                PracticeFloors.defaults());
    }
}
