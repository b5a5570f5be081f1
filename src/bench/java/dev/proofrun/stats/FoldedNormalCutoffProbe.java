package dev.proofrun.stats;

import java.util.Locale;

/**
 * How far the planner's folded-normal power from the stored thresholds ({@link FoldedNormalCutoffs}, interpolated
 * between stored sizes) lies from the power on the grader's own table at the same N: both on the same 4,000 seeded
 * studies ({@link FoldedNormalPower#study}), so the difference is the thresholds' alone (at a stored N it must be 0).
 * Upper limit, c₀ 1.33 at 95 %.
 *
 * <pre>mvn -o -q -Pbench test-compile dependency:build-classpath -Dmdep.outputFile=cp.txt
 * java -cp "target/test-classes:target/classes:$(cat cp.txt)" dev.proofrun.stats.FoldedNormalCutoffProbe</pre>
 */
public final class FoldedNormalCutoffProbe {

    private FoldedNormalCutoffProbe() {
    }

    public static void main(String[] args) {
        int[] sizes = {90, 110, 125, 137, 175, 225, 275, 350, 393, 450};
        double[][] cases = {{0, 1.67}, {1, 1.67}, {1, 2.0}, {3, 1.5}};
        double worst = 0;
        for (int n : sizes) {
            for (double[] c : cases) {
                double stored = FoldedNormalPower.power(c[0], IndexKind.Side.UPPER, 1.33, c[1], 0.95, n, true);
                double table = FoldedNormalPower.power(c[0], IndexKind.Side.UPPER, 1.33, c[1], 0.95, n, false);
                worst = Math.max(worst, Math.abs(stored - table));
                System.out.printf(Locale.ROOT, "N %4d mean/sigma %.0f c1 %.2f: stored %.4f table %.4f difference %+.4f%n",
                        n, c[0], c[1], stored, table, stored - table);
            }
        }
        System.out.printf(Locale.ROOT, "largest difference %.4f%n", worst);
    }
}
