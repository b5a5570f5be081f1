package dev.proofrun.design;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;

/**
 * The same whole tables as {@link DesignTableBenchmark}, timed by this thread's CPU time as well as by the
 * wall clock. On a shared machine other processes stretch the wall time of every call (JMH's score and its
 * error with them); the thread's CPU time counts only the work of the call, so it is the steadier figure
 * when the load is high. Warm-up: 300 tables per scenario; then 10 rounds of 50 tables, reported as the
 * range (min–max) and median of the round means.
 * Run: {@code mvn -o -q -Pbench test-compile} then
 * {@code java -cp target/test-classes:target/classes:$(cat cp.txt) dev.proofrun.design.DesignTableCpuTime}.
 */
public final class DesignTableCpuTime {

    private DesignTableCpuTime() {
    }

    public static void main(String[] args) {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        String[] names = {"centred", "off-centre", "cp"};
        DesignRequest[] requests = {
            DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.centred(1.67)),
            DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                    Expectation.offCentre(1.67, 2.0)),
            DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CP, 1.33, 0.95), Expectation.centred(1.67)),
        };
        for (int s = 0; s < requests.length; s++) {
            DesignRequest r = requests[s];
            double step = 0;
            for (int i = 0; i < 300; i++) {
                step = step >= 0.01 ? 0 : step + 0.0001;
                StudyDesigner.design(next(r, step));
            }
            double[] cpu = new double[10];
            double[] wall = new double[10];
            for (int round = 0; round < 10; round++) {
                long c0 = mx.getCurrentThreadCpuTime();
                long w0 = System.nanoTime();
                for (int i = 0; i < 50; i++) {
                    step = step >= 0.01 ? 0 : step + 0.0001;
                    StudyDesigner.design(next(r, step));
                }
                cpu[round] = (mx.getCurrentThreadCpuTime() - c0) / 50 / 1e6;
                wall[round] = (System.nanoTime() - w0) / 50 / 1e6;
            }
            Arrays.sort(cpu);
            Arrays.sort(wall);
            System.out.printf(Locale.ROOT, "%-10s  cpu ms/table %.2f-%.2f (median %.2f)   wall ms/table %.2f-%.2f (median %.2f)%n",
                    names[s], cpu[0], cpu[9], (cpu[4] + cpu[5]) / 2, wall[0], wall[9], (wall[4] + wall[5]) / 2);
        }
    }

    private static DesignRequest next(DesignRequest r, double step) {
        Expectation e = r.expectation();
        Expectation next = e.potential().isPresent()
                ? Expectation.offCentre(e.index() + step, e.potential().getAsDouble() + step)
                : Expectation.centred(e.index() + step);
        return r.withExpectation(next);
    }
}
