package dev.proofrun.cli;

import dev.proofrun.stats.AndersonDarling;
import dev.proofrun.stats.ReadingGrid;
import java.util.List;
import java.util.Optional;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Whether rounding is the likely cause of a rejected normality test in {@code estimate}: the readings lie on a grid
 * ({@link ReadingGrid}) and, each spread evenly over its step (x + h·(U − ½), U uniform, seeded — the continuity
 * correction the grader applies), they no longer reject normality at 5 %. Then the ties of the grid, not the
 * process's shape, made the test reject.
 */
final class RoundingCheck {

    private static final long SEED = 0x70_0e5L;
    private static final double LEVEL = 0.05;

    private RoundingCheck() {
    }

    /** The sentence to add, or empty when the readings are on no grid or still reject spread over it. */
    static Optional<String> explain(List<double[]> subgroups) {
        int total = subgroups.stream().mapToInt(g -> g.length).sum();
        double[] x = new double[total];
        int i = 0;
        for (double[] g : subgroups) {
            for (double v : g) {
                x[i++] = v;
            }
        }
        double h = ReadingGrid.step(x);
        if (!(h > 0) || x.length < 8) {
            return Optional.empty();
        }
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(SEED);
        double[] y = new double[x.length];
        for (int j = 0; j < x.length; j++) {
            y[j] = x[j] + h * (rng.nextDouble() - 0.5);
        }
        double p = AndersonDarling.test(y).pValue();
        if (p < LEVEL) {
            return Optional.empty();
        }
        long distinct = java.util.Arrays.stream(x).distinct().count();
        return Optional.of(EstimateMessage.ROUNDING_LIKELY.format(plain(h), distinct, p));
    }

    private static String plain(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
