package dev.proofrun.design;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

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
 * count has reached every draw). Between shifts the share is interpolated linearly; the error bound h²/8·|∂²/∂s²|
 * with h = 0.1 is about 0.001 for the curves in the table (measured in RuleRisksTest at mid-grid shifts).
 * Beyond s = 6 the value at s = 6 is used: a lower bound, short by less than Φ(−3) ≈ 0.0013.
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
    private final int[][] shifted; // [j * RUN_IN + (R − 1)]

    private RuleRiskTable(int[] grid, int stableDraws, int shiftedDraws, int[] stable, int[][] shifted) {
        this.grid = grid;
        this.stableDraws = stableDraws;
        this.shiftedDraws = shiftedDraws;
        this.stable = stable;
        this.shifted = shifted;
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

    /** P(first signal within m points shifted by s, after R quiet stable points), 1 ≤ R ≤ 15. */
    double shiftedShare(double s, int runIn, int m) {
        double x = Math.min(s, SHIFT_STEPS * SHIFT_STEP) / SHIFT_STEP;
        int j = Math.min((int) Math.floor(x), SHIFT_STEPS - 1);
        double w = x - j;
        double lo = share(shifted[j * RUN_IN + runIn - 1], shiftedDraws, m);
        double hi = share(shifted[(j + 1) * RUN_IN + runIn - 1], shiftedDraws, m);
        return (1 - w) * lo + w * hi;
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
            int[][] shifted = new int[(SHIFT_STEPS + 1) * RUN_IN][];
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (line.isEmpty() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split(" ");
                switch (f[0]) {
                    case "draws" -> {
                        stableDraws = Integer.parseInt(f[1]);
                        shiftedDraws = Integer.parseInt(f[2]);
                    }
                    case "points" -> {
                        if (!Arrays.equals(ints(f, 1), grid)) {
                            throw new IllegalStateException(RESOURCE + ": the point grid differs from pointGrid()");
                        }
                    }
                    case "stable" -> stable = ints(f, 1);
                    case "shifted" -> shifted[Integer.parseInt(f[1]) * RUN_IN + Integer.parseInt(f[2]) - 1] = ints(f, 3);
                    default -> throw new IllegalStateException(RESOURCE + ": unexpected line " + f[0]);
                }
            }
            if (stable == null || Arrays.asList(shifted).contains(null) || stableDraws <= 0 || shiftedDraws <= 0) {
                throw new IllegalStateException(RESOURCE + ": incomplete");
            }
            return new RuleRiskTable(grid, stableDraws, shiftedDraws, stable, shifted);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static int[] ints(String[] f, int from) {
        int[] v = new int[f.length - from];
        for (int i = 0; i < v.length; i++) {
            v[i] = Integer.parseInt(f[from + i]);
        }
        return v;
    }
}
