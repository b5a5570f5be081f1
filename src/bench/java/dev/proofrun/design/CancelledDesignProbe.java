package dev.proofrun.design;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;

/**
 * How soon a staged design stops once its job is cancelled (its thread interrupted, as the wizard's
 * {@code Task.cancel(true)} does), against how long it takes uninterrupted. A harness, not a JMH benchmark: the
 * figure is the wall time from the interrupt to the thread's end.
 *
 * <pre>
 * mvn -o -q -Pbench test-compile dependency:build-classpath -Dmdep.outputFile=cp.txt
 * java -cp target/test-classes:target/classes:$(cat cp.txt) dev.proofrun.design.CancelledDesignProbe 1000 0.88 0.89 0.9
 * </pre>
 * Arguments: milliseconds before the interrupt, then the powers asked (each a new design, so none is kept from
 * the one before). Three looks, Pocock spending, the demo's off-centre D1 request.
 */
public final class CancelledDesignProbe {

    private CancelledDesignProbe() {
    }

    public static void main(String[] args) throws InterruptedException {
        long afterMs = Long.parseLong(args[0]);
        for (int i = 1; i < args.length; i++) {
            double power = Double.parseDouble(args[i]);
            System.out.println(String.format(Locale.ROOT, "power %s: %s; %s", args[i], run(power, 0),
                    run(power + 0.001, afterMs)));
        }
    }

    /** One design on a thread of its own, interrupted after {@code afterMs} (0: never). */
    private static String run(double power, long afterMs) throws InterruptedException {
        DesignRequest request = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                Expectation.offCentre(1.67, 1.8)).withSubgroupSizes(List.of(5)).withPower(power);
        long[] end = new long[1];
        String[] how = new String[1];
        Thread worker = new Thread(() -> {
            try {
                StagedDesigner.design(request, 5, 3, Spending.POCOCK);
                how[0] = "finished";
            } catch (CancellationException e) {
                how[0] = "stopped";
            }
            end[0] = System.nanoTime();
        });
        long start = System.nanoTime();
        worker.start();
        if (afterMs <= 0) {
            worker.join();
            return String.format(Locale.ROOT, "uninterrupted %s in %d ms", how[0], (end[0] - start) / 1_000_000);
        }
        Thread.sleep(afterMs);
        long at = System.nanoTime();
        worker.interrupt();
        worker.join();
        return String.format(Locale.ROOT, "interrupted at %d ms, %s %d ms later", (at - start) / 1_000_000, how[0],
                (end[0] - at) / 1_000_000);
    }
}
