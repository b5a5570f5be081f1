package dev.proofrun.stats;

import java.lang.management.ManagementFactory;
import java.util.Locale;

/**
 * The folded-normal bound's first call at one N in a fresh JVM (the table of {@value FoldedNormalBound#GRID_SIZE}
 * values of mean/σ × {@value FoldedNormalBound#DRAWS} refits is built then and kept): wall time and the process's
 * CPU time (all threads, JIT included) of that call, then of a second call at the same N. One N per run, so each
 * run is a first call; run it several times and take the median. The bound printed must not move between builds.
 *
 * <pre>mvn -B -q -Pbench test-compile
 * for i in 1 2 3 4 5; do java -cp "target/test-classes:target/classes:$(cat cp.txt)" \
 *     dev.proofrun.stats.FoldedNormalFirstBound 125; done</pre>
 * ({@code cp.txt} from {@code mvn -o -q -Pbench dependency:build-classpath -Dmdep.outputFile=cp.txt}; to time an
 * older build put its jar in place of {@code target/classes}.)
 */
public final class FoldedNormalFirstBound {

    private FoldedNormalFirstBound() {
    }

    public static void main(String[] args) {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 125;
        var os = (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        // an invented fit: mean/σ = 1.2, σ = 0.01 mm, upper limit 0.06 mm
        ShapeFit fit = new ShapeFit(ShapeFamily.FOLDED_NORMAL, 0.012, 0.01);
        SpecLimits limits = SpecLimits.upperOnly(0.06);
        for (String call : new String[] {"first", "second"}) {
            long cpu = os.getProcessCpuTime();
            long t0 = System.nanoTime();
            double[] b = FoldedNormalBound.bounds(fit, IndexKind.PPK, limits, n, 0.95, PivotalBound.DEFAULT_SEED);
            System.out.printf(Locale.ROOT, "N %d %s call: %.0f ms wall, %.0f ms CPU (process); bounds %.6f %.6f; load %.2f%n",
                    n, call, (System.nanoTime() - t0) / 1e6, (os.getProcessCpuTime() - cpu) / 1e6, b[0], b[1],
                    os.getSystemLoadAverage());
        }
    }
}
