package dev.proofrun.design;

import dev.proofrun.control.ChartKind;
import dev.proofrun.control.StabilityRisk;
import dev.proofrun.stats.Cancellation;
import dev.proofrun.stats.FoldedNormalPower;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.PercentilePower;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SigmaMethod;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalInt;

/**
 * Study sizes for a one-sided characteristic planned with a lognormal, Weibull or folded-normal shape: for each
 * subgroup size n the fewest subgroups k (at or above the floors) whose power — the chance that the grader's
 * percentile index bound reaches c₀ when the true index is c₁ ({@link PercentilePower}; the folded normal's
 * test-inversion bound, {@link FoldedNormalPower}) — reaches the wanted power. The index is
 * an overall one, so the power depends on N = n·k only: the smallest N is found once (doubling, then bisection
 * on N up to {@value #MAX_READINGS}), then each n gets k = ⌈N/n⌉ raised to the floors (and stepped up while the
 * simulated power at its own N, which wobbles by its Monte-Carlo error, is below the wanted one), and its power
 * is computed at its own N.
 *
 * <p>The row's power is the whole procedure's, as for the normal model ({@link ProcedurePower}): the bound's power
 * times the chance that the shape check lets a process of the planned shape through (its level,
 * {@link ProcedurePower#NORMAL_SHAPE_REJECTION}: the lognormal check is the normal one on ln x, the Weibull check
 * and the folded normal's bootstrap check are held to the same level) and the chance that the stability step, which
 * charts the readings' normal scores under the fitted model, does not call the stable process unstable — the
 * grader's own rule at (n, k) for an overall index ({@code control.StabilityRisk}). The bound's own power stays beside it ({@link Row#boundPower()}).
 */
public final class ShapeSizing {

    /** The largest study searched. */
    public static final int MAX_READINGS = 5000;
    private static final int MAX_STEPS = 25;
    /** A typical false-unstable rate of the grader's stability step, where the search for N starts (about 0.6-1 %). */
    private static final double TYPICAL_UNSTABLE = 0.008;

    private ShapeSizing() {
    }

    /**
     * One row.
     *
     * @param subgroupSize n
     * @param subgroups    k
     * @param readings     N
     * @param power        the whole procedure's power at (n, k): the bound's, the shape check and the stability step
     * @param boundPower     the bound's power at N alone (Monte-Carlo standard error at most 0.004 lognormal, 0.008
     *                       Weibull and folded normal)
     */
    public record Row(int subgroupSize, int subgroups, int readings, double power, double boundPower) {
    }

    /** (1 − shape rejection)·(1 − false unstable at (n, k)): the chance that both gates let a good study through. */
    public static double gates(int n, int k) {
        ChartKind chart = ChartKind.forMethod(SigmaMethod.defaultFor(n));
        return (1 - ProcedurePower.NORMAL_SHAPE_REJECTION) * (1 - StabilityRisk.falseUnstable(chart, n, k, true));
    }

    /**
     * The table, or empty rows when no N up to {@value #MAX_READINGS} reaches the power.
     *
     * @param parameter σ of ln x (lognormal), Weibull shape k, or mean/σ (folded normal)
     * @param side      UPPER or LOWER
     * @throws IllegalArgumentException if c₁ ≤ c₀ or the family or side cannot be planned here
     */
    public static List<Row> design(ShapeFamily family, double parameter, IndexKind.Side side, double c0, double c1,
            double confidence, double wanted, List<Integer> sizes, PracticeFloors floors) {
        if (!(c1 > c0)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the expected index %.3f is not above the required %.3f: no study size can show it", c1, c0));
        }
        Map<Integer, Double> cache = new java.util.concurrent.ConcurrentHashMap<>();
        // every power is a simulation: each asks first whether the job that wants the table was cancelled
        Cancellation cancel = Cancellation.ofCallingThread();
        java.util.function.IntToDoubleFunction power = n -> {
            cancel.check();
            return cache.computeIfAbsent(n, x -> family == ShapeFamily.FOLDED_NORMAL
                    ? FoldedNormalPower.power(parameter, side, c0, c1, confidence, x)
                    : PercentilePower.power(family, parameter, side, c0, c1, confidence, x));
        };
        // the gates take about 1-2 % off the bound's power: start each row where the bound alone reaches that much more
        double start = Math.min(wanted / (1 - ProcedurePower.NORMAL_SHAPE_REJECTION) / (1 - TYPICAL_UNSTABLE), 0.999);
        OptionalInt needed = smallestReadings(power, start, Math.max(3, floors.minReadings()));
        List<Row> rows = new ArrayList<>();
        if (needed.isEmpty()) {
            return rows;
        }
        // the rows' own study sizes and gates, on both cores (each is one simulation, kept: the loop below then
        // mostly reads them)
        sizes.parallelStream().forEach(n -> {
            int k = firstK(n, needed.getAsInt(), floors);
            power.applyAsDouble(n * k);
            gates(n, k);
        });
        for (int n : sizes) {
            int k = firstK(n, needed.getAsInt(), floors);
            // the simulated power wobbles by its Monte-Carlo error from one N to the next: step k up until this
            // row's own power reaches the wanted one
            for (int step = 0; step < MAX_STEPS && power.applyAsDouble(n * k) * gates(n, k) < wanted
                    && n * (k + 1) <= MAX_READINGS; step++) {
                k++;
            }
            double bound = power.applyAsDouble(n * k);
            rows.add(new Row(n, k, n * k, bound * gates(n, k), bound));
        }
        return rows;
    }

    private static int firstK(int n, int readings, PracticeFloors floors) {
        return Math.max(floors.minSubgroups(), Math.max((readings + n - 1) / n, (floors.minReadings() + n - 1) / n));
    }

    private static OptionalInt smallestReadings(java.util.function.IntToDoubleFunction power, double wanted, int start) {
        int lo = start;
        if (power.applyAsDouble(lo) >= wanted) {
            return OptionalInt.of(lo);
        }
        int hi = lo;
        while (power.applyAsDouble(hi) < wanted) {
            if (hi >= MAX_READINGS) {
                return OptionalInt.empty();
            }
            lo = hi;
            hi = Math.min(MAX_READINGS, hi * 2);
        }
        while (hi - lo > Math.max(1, lo / 50)) {
            int mid = (lo + hi) >>> 1;
            if (power.applyAsDouble(mid) >= wanted) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return OptionalInt.of(hi);
    }
}
