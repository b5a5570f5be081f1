package dev.proofrun.design;

import dev.proofrun.stats.FoldedNormalPower;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import java.lang.management.ManagementFactory;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;

/**
 * The warm folded-normal tables of {@link ShapeSizingBenchmark} (n = 1..10, c₀ 1.33 at 95 %, power 0.9, upper limit,
 * default floors), timed by the process's CPU time (all threads: the work on both cores, the JIT and the collector)
 * as well as by the wall clock. On a shared machine other processes stretch the wall time; the CPU time does not,
 * and on two idle cores the wall time is at least half of it. Two kinds of shot, as the benchmark's two methods:
 * an edit of the expected index (mean/σ 1, expected 1.60 upward by 0.01) and an edit of the skewness (0.70 upward by
 * 0.001, expected 1.67). Warm-up: 4 shots of each kind; then {@code SHOTS} (default 10) of each, reported as each
 * shot and the median.
 * Run: {@code mvn -o -q -Pbench test-compile} then
 * {@code java -cp target/test-classes:target/classes:$(cat cp.txt) dev.proofrun.design.FoldedNormalTableCpuTime [SHOTS]}.
 */
public final class FoldedNormalTableCpuTime {

    private FoldedNormalTableCpuTime() {
    }

    public static void main(String[] args) {
        int shots = args.length > 0 ? Integer.parseInt(args[0]) : 10;
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        List<Integer> sizes = IntStream.rangeClosed(1, 10).boxed().toList();
        double theta = FoldedNormalPower.meanRatio(0.7017499382606746);
        for (String kind : new String[] {"expected-index edit", "skewness edit"}) {
            double[] cpu = new double[shots];
            double[] wall = new double[shots];
            for (int i = -4; i < shots; i++) {
                int shot = i + 4;
                double c1 = kind.startsWith("skew") ? 1.67 : 1.60 + 0.01 * shot;
                double t = kind.startsWith("skew") ? FoldedNormalPower.meanRatio(0.7017499382606746 + 0.001 * shot) : theta;
                long c0 = os.getProcessCpuTime();
                long w0 = System.nanoTime();
                List<ShapeSizing.Row> rows = ShapeSizing.design(ShapeFamily.FOLDED_NORMAL, t, IndexKind.Side.UPPER, 1.33, c1,
                        0.95, 0.9, sizes, PracticeFloors.defaults());
                double w = (System.nanoTime() - w0) / 1e6;
                double c = (os.getProcessCpuTime() - c0) / 1e6;
                System.out.printf(Locale.ROOT, "%s%s mean/sigma %.4f expected %.2f: wall %.0f ms, CPU %.0f ms, load %.1f,"
                        + " n = 1 row %d readings%n", i < 0 ? "warm-up " : "", kind, t, c1, w, c, os.getSystemLoadAverage(),
                        rows.get(0).readings());
                if (i >= 0) {
                    cpu[i] = c;
                    wall[i] = w;
                }
            }
            System.out.printf(Locale.ROOT, "%s: median CPU %.0f ms, median wall %.0f ms over %d shots%n", kind,
                    median(cpu), median(wall), shots);
        }
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
    }
}
