package dev.proofrun.control;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.StringJoiner;

/**
 * Writes {@code src/main/resources/dev/proofrun/control/detection-risks.txt}, the table {@link DetectionTable}
 * reads: the detection of {@link StabilityRisk#simulated} (the grader's own decision on 500 seeded studies whose
 * mean moves by 1.5 σ_within for the second half) for the default charts, n = 1…10, at every k from 2 up to
 * {@value DetectionTable#MAX_READINGS} readings, stored as the count called unstable. A harness, not a test. Run it
 * after a change to the stability rule or its chance reference (DetectionTableTest fails when the table no longer
 * matches):
 * <pre>
 * mvn -o -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/test-classes:target/classes:$(cat target/cp.txt) dev.proofrun.control.DetectionTableWriter \
 *   src/main/resources/dev/proofrun/control/detection-risks.txt
 * </pre>
 * Cells are seeded by (n, k), so the output does not depend on the number of threads or the order of the cells.
 * About 20 minutes of CPU on the development machine (2 cores used).
 */
public final class DetectionTableWriter {

    private DetectionTableWriter() {
    }

    public static void main(String[] args) throws IOException {
        List<int[]> lines = new ArrayList<>();
        for (int n = 1; n <= 10; n++) {
            int last = DetectionTable.MAX_READINGS / n;
            for (int first = 2; first <= last; first += DetectionTable.PER_LINE) {
                lines.add(new int[] {n, first, Math.min(last, first + DetectionTable.PER_LINE - 1)});
            }
        }
        // the largest cells first, so the two threads finish together
        List<int[]> cells = new ArrayList<>();
        for (int[] l : lines) {
            for (int k = l[1]; k <= l[2]; k++) {
                cells.add(new int[] {l[0], k});
            }
        }
        cells.sort((a, b) -> Integer.compare(b[0] * b[1], a[0] * a[1]));
        java.util.Map<Long, Integer> counts = new java.util.concurrent.ConcurrentHashMap<>();
        java.util.concurrent.atomic.AtomicInteger done = new java.util.concurrent.atomic.AtomicInteger();
        cells.parallelStream().forEach(c -> {
            counts.put(((long) c[0] << 32) | c[1], count(c[0], c[1]));
            int d = done.incrementAndGet();
            if (d % 200 == 0) {
                System.err.println(d + " / " + cells.size());
            }
        });
        try (Writer w = Files.newBufferedWriter(Path.of(args[0]), StandardCharsets.UTF_8)) {
            w.write("# The grader's detection of a shifted mean for planning (control.DetectionTable), at every k.\n");
            w.write("# Line: n, the first k, then for k, k+1, ... the count of 500 simulated studies (mean moved\n");
            w.write("# 1.5 sigma_within for the second half, StabilityRisk seeds) that StabilityRule called unstable.\n");
            w.write("# Default charts (individuals n = 1, X-bar/R n = 2..10), within requirements, up to 500 readings.\n");
            w.write("# Made by dev.proofrun.control.DetectionTableWriter (src/test).\n");
            for (int[] l : lines) {
                w.write(line(l[0], l[1], l[2], k -> counts.get(((long) l[0] << 32) | k)));
                w.write('\n');
            }
        }
    }

    /** The count of the shifted studies called unstable at (n, k): a fresh simulation. */
    static int count(int n, int k) {
        StabilityRisk.Figures f = StabilityRisk.simulated(ChartKind.forSubgroupSize(n), n, k, StabilityRiskTable.SHIFT);
        return (int) Math.round(f.detection() * StabilityRisk.SHIFTED_STUDIES);
    }

    /** One line of the file: n, first k, the counts from first to last. */
    static String line(int n, int first, int last, java.util.function.IntUnaryOperator count) {
        StringJoiner j = new StringJoiner(" ");
        j.add(Integer.toString(n)).add(Integer.toString(first));
        for (int k = first; k <= last; k++) {
            j.add(Integer.toString(count.applyAsInt(k)));
        }
        return j.toString();
    }
}
