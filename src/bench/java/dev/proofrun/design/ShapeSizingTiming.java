package dev.proofrun.design;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;

/**
 * Wall time of the {@code size --shape} table for n = 1..10 (c₀ 1.33, 95 %, power 0.9, default floors): the
 * first table in a fresh JVM, then a recompute after an edit of the expected index (the pivot draws of the
 * study sizes already met are reused from the cache), lognormal σ 0.25 and Weibull k 1.5, upper limit.
 *
 * <pre>mvn -B -q -Pbench test-compile
 * java -cp "target/test-classes:target/classes:$(mvn -q dependency:build-classpath -Dmdep.outputFile=/dev/stdout)" \
 *     dev.proofrun.design.ShapeSizingTiming</pre>
 */
public final class ShapeSizingTiming {

    private ShapeSizingTiming() {
    }

    public static void main(String[] args) {
        List<Integer> sizes = IntStream.rangeClosed(1, 10).boxed().toList();
        for (Object[] c : new Object[][] {{ShapeFamily.LOGNORMAL, 0.25}, {ShapeFamily.WEIBULL, 1.5}}) {
            ShapeFamily f = (ShapeFamily) c[0];
            double p = (Double) c[1];
            for (double c1 : new double[] {1.67, 1.70, 1.65}) {
                long t0 = System.nanoTime();
                List<ShapeSizing.Row> rows = ShapeSizing.design(f, p, IndexKind.Side.UPPER, 1.33, c1, 0.95, 0.9, sizes,
                        PracticeFloors.defaults());
                System.out.printf(Locale.ROOT, "%s %.2f, expected %.2f: %.0f ms, n = 5 row %s%n", f.token(), p, c1,
                        (System.nanoTime() - t0) / 1e6, rows.get(4));
            }
        }
    }
}
