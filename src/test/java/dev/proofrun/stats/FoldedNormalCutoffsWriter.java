package dev.proofrun.stats;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.StringJoiner;

/**
 * Writes {@code src/main/resources/dev/proofrun/stats/folded-normal-cutoffs.txt}, the table {@link FoldedNormalCutoffs}
 * reads: for each stored N, the grader's own table ({@link FoldedNormalBound#table}, seed
 * {@link PivotalBound#DEFAULT_SEED}) turned into each value of mean/σ's confidence-set range
 * ({@link FoldedNormalPower#setRanges}) and threshold c* ({@link FoldedNormalPower#brackets}, the upper end of the
 * bracket) — the figures the planner computes without the table. A harness, not a test. Run it after a change to
 * the bound, its fit or its seed ({@code FoldedNormalCutoffsTest} fails when the table no longer matches):
 * <pre>
 * mvn -o -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/test-classes:target/classes:$(cat target/cp.txt) dev.proofrun.stats.FoldedNormalCutoffsWriter \
 *   src/main/resources/dev/proofrun/stats/folded-normal-cutoffs.txt
 * </pre>
 * The grader's table is seeded by (N, seed), so the output does not depend on threads. Figures are written with
 * {@link Double#toString}, which reads back to the same double.
 */
public final class FoldedNormalCutoffsWriter {

    private FoldedNormalCutoffsWriter() {
    }

    public static void main(String[] args) throws IOException {
        try (Writer w = Files.newBufferedWriter(Path.of(args[0]), StandardCharsets.UTF_8)) {
            w.write("# The grader's folded-normal decision for planning (stats.FoldedNormalCutoffs), from the grader's own\n");
            w.write("# table (FoldedNormalBound.table(N, PivotalBound.DEFAULT_SEED), 1,000 draws per value of mean/sigma).\n");
            w.write("# Line: N, g (index of mean/sigma in FoldedNormalBound.THETAS), then per confidence 0.90, 0.95, 0.99 the\n");
            w.write("# lowest and highest study mean/sigma in g's confidence set, then for the upper limit and then the lower\n");
            w.write("# limit, per requirement 1.0, 1.33, 1.5, 1.67, 2.0, per confidence 0.90, 0.95, 0.99, the threshold c*(g).\n");
            w.write("# Made by dev.proofrun.stats.FoldedNormalCutoffsWriter (src/test).\n");
            for (int n : FoldedNormalCutoffs.READINGS) {
                long t0 = System.nanoTime();
                double[][] rows = fresh(n);
                for (int g = 0; g < rows.length; g++) {
                    w.write(line(n, g, rows[g]));
                    w.write('\n');
                }
                w.flush();
                System.err.printf("N = %d: %.1f s%n", n, (System.nanoTime() - t0) / 1e9);
            }
        }
    }

    /** [g][field] for N, in the order of {@link FoldedNormalCutoffs#FIELDS}: a fresh computation. */
    static double[][] fresh(int readings) {
        FoldedNormalBound.Table table = FoldedNormalBound.table(readings, PivotalBound.DEFAULT_SEED);
        int grid = FoldedNormalBound.GRID_SIZE;
        double[][] rows = new double[grid][FoldedNormalCutoffs.FIELDS];
        double[] cs = FoldedNormalCutoffs.CONFIDENCES;
        for (int c = 0; c < cs.length; c++) {
            double gamma = FoldedNormalBound.GAMMA_SHARE * (1 - cs[c]);
            double[][] set = FoldedNormalPower.setRanges(table, gamma);
            for (int g = 0; g < grid; g++) {
                rows[g][2 * c] = set[0][g];
                rows[g][2 * c + 1] = set[1][g];
            }
        }
        java.util.List<int[]> cells = new java.util.ArrayList<>();
        for (int side = 0; side < 2; side++) {
            for (int t = 0; t < FoldedNormalCutoffs.TARGETS.length; t++) {
                for (int c = 0; c < cs.length; c++) {
                    cells.add(new int[] {side, t, c});
                }
            }
        }
        cells.parallelStream().forEach(cell -> {
            boolean upper = cell[0] == 0;
            double gamma = FoldedNormalBound.GAMMA_SHARE * (1 - cs[cell[2]]);
            double alpha = 1 - cs[cell[2]] - gamma;
            double[] cutoff = FoldedNormalPower.brackets(table, upper, FoldedNormalCutoffs.TARGETS[cell[1]], alpha)[1];
            int field = FoldedNormalCutoffs.cutoffField(upper, cell[1], cell[2]);
            for (int g = 0; g < grid; g++) {
                rows[g][field] = cutoff[g];
            }
        });
        return rows;
    }

    /** One line of the file. */
    static String line(int readings, int g, double[] row) {
        StringJoiner j = new StringJoiner(" ");
        j.add(Integer.toString(readings)).add(Integer.toString(g));
        for (double v : row) {
            j.add(Double.toString(v));
        }
        return j.toString();
    }
}
