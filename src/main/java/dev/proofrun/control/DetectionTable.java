package dev.proofrun.control;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The grader's detection of a shifted mean stored for planning, at <em>every</em> k: {@link StabilityRisk#simulated}
 * run once per cell for the default charts (individuals for n = 1, X̄–R for n = 2…10), within requirements and
 * δ = {@value StabilityRiskTable#SHIFT}, for every k from 2 up to {@value #MAX_READINGS} readings, read from
 * {@code detection-risks.txt} (its header names the generator and the seeds).
 *
 * <p>Each stored value is the count of the {@value StabilityRisk#SHIFTED_STUDIES} simulated shifted studies that the
 * grader's decision called unstable, so the figure read back is the fresh simulation's figure exactly (same seeds,
 * same division). Nothing is interpolated: detection steps with k (the decision's count thresholds do). Outside the
 * table — other charts, other shifts, overall requirements, larger studies — {@link StabilityRisk} simulates as
 * before. {@code DetectionTableTest} checks stored cells against fresh simulations and the writer's output.
 */
final class DetectionTable {

    static final String RESOURCE = "detection-risks.txt";
    /** The largest study (n·k readings) stored. */
    static final int MAX_READINGS = 500;
    /** Consecutive k per line of the file. */
    static final int PER_LINE = 20;

    /** Per n: the count called unstable at k, index k (0 and 1 unused, −1 where not stored). */
    private final Map<Integer, int[]> byN;

    private DetectionTable(Map<Integer, int[]> byN) {
        this.byN = byN;
    }

    private static final class Holder {
        static final DetectionTable TABLE = load();
    }

    static DetectionTable get() {
        return Holder.TABLE;
    }

    /** The stored detection, or empty when this cell is not stored. */
    OptionalDouble detection(ChartKind kind, int n, int k, double shift) {
        int[] counts = byN.get(n);
        if (counts == null || kind != ChartKind.forSubgroupSize(n) || shift != StabilityRiskTable.SHIFT
                || k < 0 || k >= counts.length || counts[k] < 0) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(counts[k] / (double) StabilityRisk.SHIFTED_STUDIES);
    }

    private static DetectionTable load() {
        Optional<List<String[]>> rows = StoredTable.rows(RESOURCE);
        if (rows.isEmpty()) {
            return new DetectionTable(Map.of());
        }
        Map<Integer, int[]> byN = new HashMap<>();
        for (String[] f : rows.get()) {
            int n = Integer.parseInt(f[0]);
            int first = Integer.parseInt(f[1]);
            int[] counts = byN.computeIfAbsent(n, x -> filled(MAX_READINGS / x + 1));
            for (int i = 2; i < f.length; i++) {
                counts[first + i - 2] = Integer.parseInt(f[i]);
            }
        }
        return new DetectionTable(byN);
    }

    private static int[] filled(int length) {
        int[] a = new int[length];
        java.util.Arrays.fill(a, -1);
        return a;
    }
}
