package dev.proofrun.control;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes {@code src/main/resources/dev/proofrun/control/stability-risks.txt}, the table
 * {@link StabilityRiskTable} reads: {@link StabilityRisk#simulated} (the grader's own decision, seeded) for the
 * default charts, n = 1…10, δ = 1.5, on the grid {@link #GRID} up to {@value #MAX_READINGS} readings. A harness,
 * not a test. Run it after a change to the stability rule or its chance reference (StabilityRiskTableTest fails
 * when the table no longer matches):
 * <pre>
 * mvn -o -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/test-classes:target/classes:$(cat target/cp.txt) dev.proofrun.control.StabilityRiskTableWriter \
 *   src/main/resources/dev/proofrun/control/stability-risks.txt
 * </pre>
 * Cells are seeded by (n, k), so the output does not depend on the number of threads.
 */
public final class StabilityRiskTableWriter {

    static final int[] GRID = {2, 3, 4, 5, 6, 7, 8, 10, 12, 14, 16, 18, 20, 22, 25, 28, 30, 33, 36, 40, 45, 50, 55, 60,
        70, 80, 90, 100, 110, 125, 140, 160, 180, 200, 225, 250, 300, 350, 400, 500, 600, 800, 1000, 1250, 1500, 2000,
        2500};
    static final int MAX_READINGS = 2500;

    private StabilityRiskTableWriter() {
    }

    public static void main(String[] args) throws IOException {
        List<int[]> cells = new ArrayList<>();
        for (int n = 1; n <= 10; n++) {
            for (int k : GRID) {
                if (n * k <= MAX_READINGS) {
                    cells.add(new int[] {n, k});
                }
            }
        }
        String[] lines = new String[cells.size()];
        java.util.stream.IntStream.range(0, cells.size()).parallel().forEach(i -> {
            int n = cells.get(i)[0];
            int k = cells.get(i)[1];
            StabilityRisk.Figures f = StabilityRisk.simulated(ChartKind.forSubgroupSize(n), n, k, StabilityRiskTable.SHIFT);
            lines[i] = String.format(Locale.ROOT, "%d %d %.5f %.4f", n, k, f.falseUnstable(), f.detection());
        });
        try (Writer w = Files.newBufferedWriter(Path.of(args[0]), StandardCharsets.UTF_8)) {
            w.write("# The grader's stability risks for planning (control.StabilityRiskTable): n k falseUnstable detection\n");
            w.write("# falseUnstable: leave-one-out share of the grader's chance reference (ChanceSignalCounts, its seeds);\n");
            w.write("# detection (for reference, not used: it steps with k): 500 studies, mean moved 1.5 sigma_within for the second half, StabilityRisk seeds.\n");
            w.write("# Default charts (individuals n = 1, X-bar/R n = 2..10), within requirements. Made by\n");
            w.write("# dev.proofrun.control.StabilityRiskTableWriter (src/test).\n");
            for (String l : lines) {
                w.write(l);
                w.write('\n');
            }
        }
    }
}
