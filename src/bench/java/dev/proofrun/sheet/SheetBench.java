package dev.proofrun.sheet;

import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The sheet's speed goal: a 500-slot, 5-characteristic plan (n = 5) written as PDF, CSV and XLSX in under
 * 3 s. Two measurements: {@link #cold} is a single shot in a fresh JVM (what a user of {@code proofrun sheet}
 * waits for, minus JVM start), {@link #warm} the steady state.
 *
 * <p>Run: {@code mvn -o -B -Pbench test-compile exec:exec -Dbench=SheetBench}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 5)
@Measurement(iterations = 10)
public class SheetBench {

    private StudyPlan plan;
    private Path dir;

    @Setup
    public void setUp() throws IOException {
        plan = SheetFixtures.plan("PR-BENCH", 500, 5, 5, true);
        dir = Files.createTempDirectory("sheet-bench");
    }

    /** All three files into a directory, first call in a fresh JVM (its own forks, no warm-up). */
    @Benchmark
    @Fork(3)
    @Warmup(iterations = 0)
    @Measurement(iterations = 1)
    public Object cold() {
        return SheetFiles.write(plan, dir, Paper.A4, false);
    }

    /** All three files into a directory, after warm-up. */
    @Benchmark
    public Object warm() {
        return SheetFiles.write(plan, dir, Paper.A4, false);
    }

    /** The PDF alone, after warm-up. */
    @Benchmark
    public int pdfOnly() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        SheetPdf.write(plan, Paper.A4, out);
        return out.size();
    }
}
