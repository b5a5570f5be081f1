package dev.proofrun.stats;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The grader's folded-normal decision stored for planning: for study sizes N on a grid ({@link #READINGS}), per value
 * of mean/σ g of {@link FoldedNormalBound}'s table, the range of a study's mean/σ that puts g in its confidence set
 * and the threshold c*(g) that the study's index must reach for the bound to reach c₀ — the figures
 * {@link FoldedNormalPower} otherwise finds on the grader's own table ({@link FoldedNormalPower#setRanges},
 * {@link FoldedNormalPower#brackets}), read from {@code folded-normal-cutoffs.txt} (its header names the generator
 * and the seed). They are stored for the usual requirements ({@link #TARGETS}) and confidences ({@link #CONFIDENCES}),
 * upper and lower limit.
 *
 * <p>At a stored N every figure is the fresh computation's, to the last digit ({@code FoldedNormalCutoffsTest}
 * recomputes some). Between two stored sizes each figure is interpolated linearly in 1/√N: the planner then uses a
 * smoothed version of the grader's thresholds, not the ones its table at that N has (which differ by the table's
 * Monte-Carlo error; the effect on the power is measured in {@code docs/decisions/declared-shape-grading.md},
 * "Planning the folded normal from stored thresholds"). Outside the grid, or for another requirement or confidence,
 * the planner uses the grader's table as before.
 */
final class FoldedNormalCutoffs {

    static final String RESOURCE = "folded-normal-cutoffs.txt";
    /** The stored study sizes N. */
    static final int[] READINGS = {25, 30, 40, 50, 60, 80, 100, 125, 150, 200, 250, 300, 400, 500, 600, 800, 1000};
    /** The stored requirements c₀. */
    static final double[] TARGETS = {1.0, 1.33, 1.5, 1.67, 2.0};
    /** The stored confidences. */
    static final double[] CONFIDENCES = {0.90, 0.95, 0.99};
    /** Figures per line after N and g: per confidence the set's range, then per side, requirement, confidence c*. */
    static final int FIELDS = 2 * CONFIDENCES.length + 2 * TARGETS.length * CONFIDENCES.length;

    /**
     * Per value of mean/σ: a study's mean/σ from setLow to setHigh puts it in the confidence set; c* the threshold.
     */
    record Cut(double[] setLow, double[] setHigh, double[] cutoff) {
    }

    /** Per stored N: [g][field] in the order of {@link #FIELDS}. */
    private final Map<Integer, double[][]> byN;

    private FoldedNormalCutoffs(Map<Integer, double[][]> byN) {
        this.byN = byN;
    }

    private static final class Holder {
        static final FoldedNormalCutoffs TABLE = load();
    }

    /** The stored or interpolated decision, or empty when the table does not hold (N, c₀, confidence). */
    static Optional<Cut> at(int readings, boolean upper, double c0, double confidence) {
        int t = indexOf(TARGETS, c0);
        int c = indexOf(CONFIDENCES, confidence);
        FoldedNormalCutoffs table = Holder.TABLE;
        if (t < 0 || c < 0 || readings < READINGS[0] || readings > READINGS[READINGS.length - 1]
                || table.byN.size() != READINGS.length) {
            return Optional.empty();
        }
        int b = 0;
        while (READINGS[b] < readings) {
            b++;
        }
        double[][] high = table.byN.get(READINGS[b]);
        double[][] low = READINGS[b] == readings ? high : table.byN.get(READINGS[b - 1]);
        double w = READINGS[b] == readings ? 1 : (1 / Math.sqrt(readings) - 1 / Math.sqrt(READINGS[b - 1]))
                / (1 / Math.sqrt(READINGS[b]) - 1 / Math.sqrt(READINGS[b - 1]));
        int grid = FoldedNormalBound.GRID_SIZE;
        double[] setLow = new double[grid];
        double[] setHigh = new double[grid];
        double[] cutoff = new double[grid];
        int cut = cutoffField(upper, t, c);
        for (int g = 0; g < grid; g++) {
            setLow[g] = between(low[g][2 * c], high[g][2 * c], w);
            setHigh[g] = between(low[g][2 * c + 1], high[g][2 * c + 1], w);
            cutoff[g] = between(low[g][cut], high[g][cut], w);
        }
        return Optional.of(new Cut(setLow, setHigh, cutoff));
    }

    /** The field of c* for (side, requirement, confidence). */
    static int cutoffField(boolean upper, int target, int confidence) {
        return 2 * CONFIDENCES.length + ((upper ? 0 : TARGETS.length) + target) * CONFIDENCES.length + confidence;
    }

    /** a at w = 0, b at w = 1; the stored figure itself at w = 1; infinite when either is (no index reaches c₀). */
    private static double between(double a, double b, double w) {
        if (w == 1 || Double.isInfinite(b)) {
            return b;
        }
        return Double.isInfinite(a) ? a : a + w * (b - a);
    }

    private static int indexOf(double[] values, double v) {
        for (int i = 0; i < values.length; i++) {
            if (values[i] == v) {
                return i;
            }
        }
        return -1;
    }

    private static FoldedNormalCutoffs load() {
        Map<Integer, double[][]> byN = new HashMap<>();
        try (InputStream in = FoldedNormalCutoffs.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                return new FoldedNormalCutoffs(byN);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                double[][] rows = byN.computeIfAbsent(Integer.parseInt(f[0]), n -> new double[FoldedNormalBound.GRID_SIZE][]);
                rows[Integer.parseInt(f[1])] = Arrays.stream(f, 2, 2 + FIELDS).mapToDouble(Double::parseDouble).toArray();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        // a size with a missing value of mean/σ is not used
        byN.values().removeIf(rows -> Arrays.stream(rows).anyMatch(row -> row == null));
        return new FoldedNormalCutoffs(byN);
    }
}
