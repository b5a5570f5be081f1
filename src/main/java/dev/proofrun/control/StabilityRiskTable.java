package dev.proofrun.control;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The grader's false-unstable rate stored for planning: {@link StabilityRisk#simulated} run once on a grid of k for
 * the default charts (individuals for n = 1, X̄–R for n = 2…10) and within requirements, read from
 * {@code stability-risks.txt} (its header names the generator and the seeds). Between grid points it is
 * interpolated linearly in k; outside the grid, for other charts or overall requirements, nothing is stored and
 * {@link StabilityRisk} simulates. The file's detection column (δ = {@value #SHIFT}) is kept for reference only:
 * detection steps with k and is always simulated at the row's k. {@code StabilityRiskTableTest} checks stored
 * points and interpolated ones against fresh simulations.
 */
final class StabilityRiskTable {

    static final String RESOURCE = "stability-risks.txt";
    static final double SHIFT = 1.5;

    /** Per n: the grid of k, and u and detection at each. */
    private final Map<Integer, double[][]> byN;

    private StabilityRiskTable(Map<Integer, double[][]> byN) {
        this.byN = byN;
    }

    private static final class Holder {
        static final StabilityRiskTable TABLE = load();
    }

    static StabilityRiskTable get() {
        return Holder.TABLE;
    }

    /** The stored u(n, k), interpolated, or empty. */
    OptionalDouble falseUnstable(ChartKind kind, int n, int k) {
        return lookup(kind, n, k, 1);
    }

    /** The stored detection at δ = {@value #SHIFT}, interpolated, or empty (for the table's check only). */
    OptionalDouble detection(ChartKind kind, int n, int k, double shift) {
        return shift == SHIFT ? lookup(kind, n, k, 2) : OptionalDouble.empty();
    }

    private OptionalDouble lookup(ChartKind kind, int n, int k, int column) {
        double[][] rows = byN.get(n);
        if (rows == null || kind != ChartKind.forSubgroupSize(n)) {
            return OptionalDouble.empty();
        }
        if (k < rows[0][0] || k > rows[rows.length - 1][0]) {
            return OptionalDouble.empty();
        }
        for (int i = 0; i < rows.length; i++) {
            if (rows[i][0] == k) {
                return OptionalDouble.of(rows[i][column]);
            }
            if (rows[i][0] > k) {
                double[] a = rows[i - 1];
                double[] b = rows[i];
                double t = (k - a[0]) / (b[0] - a[0]);
                return OptionalDouble.of(a[column] + t * (b[column] - a[column]));
            }
        }
        return OptionalDouble.empty();
    }

    /** The grid of k stored for n (empty when none), for the table's check. */
    List<Integer> grid(int n) {
        List<Integer> out = new ArrayList<>();
        double[][] rows = byN.get(n);
        if (rows != null) {
            for (double[] r : rows) {
                out.add((int) r[0]);
            }
        }
        return out;
    }

    private static StabilityRiskTable load() {
        Optional<List<String[]>> stored = StoredTable.rows(RESOURCE);
        if (stored.isEmpty()) {
            return new StabilityRiskTable(Map.of());
        }
        Map<Integer, List<double[]>> rows = new HashMap<>();
        for (String[] f : stored.get()) {
            int n = Integer.parseInt(f[0]);
            rows.computeIfAbsent(n, x -> new ArrayList<>()).add(new double[] {Integer.parseInt(f[1]),
                Double.parseDouble(f[2]), Double.parseDouble(f[3])});
        }
        Map<Integer, double[][]> byN = new HashMap<>();
        rows.forEach((n, list) -> {
            list.sort((a, b) -> Double.compare(a[0], b[0]));
            byN.put(n, list.toArray(new double[0][]));
        });
        return new StabilityRiskTable(byN);
    }
}
