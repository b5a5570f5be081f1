package dev.proofrun.design;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.concurrent.atomic.AtomicReferenceArray;

/**
 * The simulated first-signal distributions behind {@link RuleRisks}, read once from the generated resource
 * {@code rule-risks.txt} (its header says how it was made; the generator is {@code RuleRiskTableWriter} in
 * src/test, the check against fresh simulations {@code RuleRisksTest}).
 *
 * <p>Stored: cumulative counts of first signals at the points m of {@link #pointGrid()} (every m up to
 * {@value #DENSE}, then steps of about 10 % up to {@value #LONGEST}), for the stable chart and for every
 * shift s = j·{@value #SHIFT_STEP} (j = 0…{@value #SHIFT_STEPS}) after R = 1…{@value #RUN_IN} quiet points.
 *
 * <p>Between grid points m the survival u(m) = 1 − share is interpolated log-linearly (exact for a
 * geometric tail, which the first signal has once the rules' 15-point memory is filled; linearly where a
 * count has reached every draw). Between shifts the share is interpolated by a cubic through the four
 * nearest columns. Measured on the table itself: predicting every odd column from the even ones (step 0.2)
 * this way misses by at most 0.009 over all R and m, which is the size of the simulation noise of such a
 * comparison (the stored shares have standard errors up to 0.0022); straight lines missed by up to 0.017
 * (G bends most in s for small s and long runs), so at the stored step 0.1 the cubic's own error is well
 * below the noise. Beyond s = 6 the value at s = 6 is used: a lower bound, short by less than
 * Φ(−3) ≈ 0.0013.
 */
final class RuleRiskTable {

    static final double SHIFT_STEP = 0.1;
    static final int SHIFT_STEPS = 60;
    static final int RUN_IN = 15;
    static final int DENSE = 50;
    static final int LONGEST = 10_000;
    private static final String RESOURCE = "rule-risks.txt";

    private final int[] grid;
    private final int stableDraws;
    private final int shiftedDraws;
    private final int[] stable;
    /** The counts of each shifted row, [j·RUN_IN + (R − 1)], parsed from {@code rows} on first use. */
    private final AtomicReferenceArray<int[]> shifted;
    private final String[] rows;

    private RuleRiskTable(int[] grid, int stableDraws, int shiftedDraws, int[] stable, String[] rows) {
        this.grid = grid;
        this.stableDraws = stableDraws;
        this.shiftedDraws = shiftedDraws;
        this.stable = stable;
        this.rows = rows;
        this.shifted = new AtomicReferenceArray<>(rows.length);
    }

    private static final class Holder {
        static final RuleRiskTable TABLE = load();
    }

    static RuleRiskTable get() {
        return Holder.TABLE;
    }

    /** The points m at which counts are stored: 1…50, then m ← max(m + 1, round(1.1·m)) up to 10,000. */
    static int[] pointGrid() {
        int[] g = new int[128];
        int size = 0;
        for (int m = 1; m <= DENSE; m++) {
            g[size++] = m;
        }
        int m = DENSE;
        while (m < LONGEST) {
            m = Math.min(LONGEST, Math.max(m + 1, (int) Math.round(1.1 * m)));
            g[size++] = m;
        }
        return Arrays.copyOf(g, size);
    }

    /** P(first signal of a stable chart at or before point m). */
    double stableShare(int m) {
        return share(stable, stableDraws, m);
    }

    /**
     * P(first signal within m points shifted by s, after R quiet stable points), 1 ≤ R ≤ 15: cubic
     * (four-point Lagrange) interpolation between the shift columns, the four nearest (one-sided at the ends).
     */
    double shiftedShare(double s, int runIn, int m) {
        double x = Math.min(s, SHIFT_STEPS * SHIFT_STEP) / SHIFT_STEP;
        int j0 = Math.max(0, Math.min((int) Math.floor(x) - 1, SHIFT_STEPS - 3));
        double t = x - j0;
        double sum = 0;
        for (int a = 0; a < 4; a++) {
            double weight = 1;
            for (int b = 0; b < 4; b++) {
                if (b != a) {
                    weight *= (t - b) / (a - b);
                }
            }
            sum += weight * share(shiftedRow((j0 + a) * RUN_IN + runIn - 1), shiftedDraws, m);
        }
        return Math.max(0, Math.min(1, sum));
    }

    /** Parsing every row costs more than a cold {@code proofrun size} uses, so rows are parsed as needed. */
    private int[] shiftedRow(int index) {
        int[] row = shifted.get(index);
        if (row == null) {
            row = counts(rows[index]);
            shifted.compareAndSet(index, null, row);
        }
        return row;
    }

    private double share(int[] counts, int draws, int m) {
        if (m <= 0) {
            return 0;
        }
        int b = Arrays.binarySearch(grid, Math.min(m, LONGEST));
        if (b >= 0) {
            return count(counts, b, draws) / (double) draws;
        }
        int hi = -b - 1;
        int lo = hi - 1;
        double ua = draws - count(counts, lo, draws);
        double ub = draws - count(counts, hi, draws);
        double t = (m - grid[lo]) / (double) (grid[hi] - grid[lo]);
        double u = ua > 0 && ub > 0 ? ua * Math.pow(ub / ua, t) : ua + t * (ub - ua);
        return 1 - u / draws;
    }

    private static int count(int[] counts, int index, int draws) {
        return index < counts.length ? counts[index] : draws;
    }

    private static RuleRiskTable load() {
        try (InputStream in = RuleRiskTable.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            int[] grid = pointGrid();
            int stableDraws = 0;
            int shiftedDraws = 0;
            int[] stable = null;
            String[] rows = new String[(SHIFT_STEPS + 1) * RUN_IN];
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (line.isEmpty() || line.startsWith("#")) {
                    continue;
                }
                if (line.startsWith("shifted ")) {
                    int[] key = counts(line.substring(0, nthSpace(line, 3)));
                    rows[key[0] * RUN_IN + key[1] - 1] = line.substring(nthSpace(line, 3));
                } else if (line.startsWith("stable ")) {
                    stable = counts(line);
                } else if (line.startsWith("draws ")) {
                    int[] d = counts(line);
                    stableDraws = d[0];
                    shiftedDraws = d[1];
                } else if (line.startsWith("points ")) {
                    if (!Arrays.equals(counts(line), grid)) {
                        throw new IllegalStateException(RESOURCE + ": the point grid differs from pointGrid()");
                    }
                } else {
                    throw new IllegalStateException(RESOURCE + ": unexpected line " + line);
                }
            }
            if (stable == null || Arrays.asList(rows).contains(null) || stableDraws <= 0 || shiftedDraws <= 0) {
                throw new IllegalStateException(RESOURCE + ": incomplete");
            }
            return new RuleRiskTable(grid, stableDraws, shiftedDraws, stable, rows);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The index of the n-th space in the line (n ≥ 1). */
    private static int nthSpace(String line, int n) {
        int at = -1;
        for (int i = 0; i < n; i++) {
            at = line.indexOf(' ', at + 1);
        }
        return at;
    }

    /** The non-negative integers in a line, in order (words without digits, such as the label, are skipped). */
    static int[] counts(String line) {
        int[] out = new int[16];
        int size = 0;
        int value = -1;
        for (int i = 0, len = line.length(); i <= len; i++) {
            char ch = i < len ? line.charAt(i) : ' ';
            if (ch >= '0' && ch <= '9') {
                value = (value < 0 ? 0 : value * 10) + (ch - '0');
            } else if (ch == ' ') {
                if (value >= 0) {
                    if (size == out.length) {
                        out = Arrays.copyOf(out, 2 * size);
                    }
                    out[size++] = value;
                }
                value = -1;
            } else if (value >= 0) {
                throw new IllegalStateException(RESOURCE + ": not a count in " + line);
            }
        }
        return Arrays.copyOf(out, size);
    }
}
