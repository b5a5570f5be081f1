package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The stored folded-normal thresholds are what they claim to be. At a stored N each figure is a fresh computation on the
 * grader's own table (same seed, same draws), so a fresh run must give the stored line to the last digit — a change to
 * the bound, the fit or the seed breaks equality here. At a stored N the planner's decision from the stored figures is
 * the decision from the grader's table, study by study; between stored sizes it is a smoothed one, held near the
 * table's own.
 */
class FoldedNormalCutoffsTest {

    @Test
    void theWriterRebuildsTheLinesOfStoredSizes() throws IOException {
        List<String> stored = storedLines();
        for (int n : new int[] {25, 125}) {
            double[][] rows = FoldedNormalCutoffsWriter.fresh(n);
            for (int g = 0; g < rows.length; g++) {
                String line = FoldedNormalCutoffsWriter.line(n, g, rows[g]);
                assertTrue(stored.contains(line), "N = " + n + ", g = " + g + ": " + line);
            }
        }
        assertEquals(FoldedNormalCutoffs.READINGS.length * FoldedNormalBound.GRID_SIZE, stored.size());
    }

    /**
     * N = 125 is a stored size: the decision from the stored figures and the one from the grader's table agree study by
     * study (mean/σ 1, upper limit at true index 1.67, c₀ 1.33, 95 %; 400 studies, both outcomes present).
     */
    @Test
    void atAStoredSizeTheStoredDecisionIsTheTablesStudyByStudy() {
        FoldedNormalPower.Decision stored = new FoldedNormalPower.Decision(1, IndexKind.Side.UPPER, 1.33, 1.67, 0.95, 125);
        FoldedNormalPower.Decision table = new FoldedNormalPower.Decision(1, IndexKind.Side.UPPER, 1.33, 1.67, 0.95, 125,
                false);
        assertTrue(stored.stored());
        assertFalse(table.stored());
        int passed = 0;
        for (int s = 0; s < 400; s++) {
            double[] x = FoldedNormalPower.study(1, 125, s);
            assertEquals(table.demonstrates(x), stored.demonstrates(x), "study " + s);
            passed += stored.demonstrates(x) ? 1 : 0;
        }
        assertTrue(passed > 40 && passed < 360, "passed " + passed);
    }

    @Test
    void onlyStoredRequirementsConfidencesAndTheGridsRangeAreServed() {
        assertTrue(FoldedNormalCutoffs.at(125, true, 1.33, 0.95).isPresent());
        assertTrue(FoldedNormalCutoffs.at(137, false, 2.0, 0.99).isPresent(), "between stored sizes");
        assertFalse(FoldedNormalCutoffs.at(24, true, 1.33, 0.95).isPresent(), "below the grid");
        assertFalse(FoldedNormalCutoffs.at(1001, true, 1.33, 0.95).isPresent(), "above the grid");
        assertFalse(FoldedNormalCutoffs.at(125, true, 1.34, 0.95).isPresent(), "another requirement");
        assertFalse(FoldedNormalCutoffs.at(125, true, 1.33, 0.975).isPresent(), "another confidence");
        assertFalse(new FoldedNormalPower.Decision(1, IndexKind.Side.UPPER, 1.33, 1.67, 0.975, 125).stored());
    }

    /** Between two stored sizes every figure lies between theirs (linear in 1/√N; infinite stays infinite). */
    @Test
    void betweenStoredSizesTheFiguresLieBetweenTheNeighbours() {
        FoldedNormalCutoffs.Cut a = FoldedNormalCutoffs.at(125, true, 1.33, 0.95).orElseThrow();
        FoldedNormalCutoffs.Cut b = FoldedNormalCutoffs.at(150, true, 1.33, 0.95).orElseThrow();
        FoldedNormalCutoffs.Cut m = FoldedNormalCutoffs.at(137, true, 1.33, 0.95).orElseThrow();
        for (int g = 0; g < FoldedNormalBound.GRID_SIZE; g++) {
            between(a.cutoff()[g], b.cutoff()[g], m.cutoff()[g], "c* at g = " + g);
            between(a.setLow()[g], b.setLow()[g], m.setLow()[g], "set low at g = " + g);
            between(a.setHigh()[g], b.setHigh()[g], m.setHigh()[g], "set high at g = " + g);
        }
    }

    private static void between(double a, double b, double m, String what) {
        if (Double.isInfinite(a) || Double.isInfinite(b)) {
            assertTrue(Double.isInfinite(m), what);
        } else {
            assertTrue(m >= Math.min(a, b) && m <= Math.max(a, b), what + ": " + m + " not between " + a + " and " + b);
        }
    }

    private static List<String> storedLines() throws IOException {
        try (InputStream in = FoldedNormalCutoffs.class.getResourceAsStream(FoldedNormalCutoffs.RESOURCE)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines()
                    .filter(l -> !l.isBlank() && !l.startsWith("#")).toList();
        }
    }
}
