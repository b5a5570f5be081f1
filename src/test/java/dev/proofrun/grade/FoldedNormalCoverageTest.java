package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The folded-normal shape through the real grader ({@link Grader#grade}, files written and read): at the boundary
 * (true percentile index = c₀ = 1.33, upper limit only, Cpk required at 95 %) at most α + 2 SE of the studies are
 * graded demonstrated. The bound ({@code stats.FoldedNormalBound}) has no tuned constant, so the grid it is checked
 * on is the whole evidence: mean/σ ∈ {0, 0.5, 1, 2, 3} × n ∈ {1, 5} × N ∈ {50, 125, 250} ({@code long}, 300 studies
 * each, limit 0.05 + 2·√(0.05·0.95/300) = 0.075). The default suite grades 100 studies at the least favourable
 * corner found there (the half-normal, 10 × 5) and 80 at mean/σ = 1, 25 × 5 (limit 0.099).
 * Figures: docs/decisions/declared-shape-grading.md; table: {@code FoldedNormalTable} (src/bench).
 */
class FoldedNormalCoverageTest {

    static final double C0 = 1.33;
    static final double ALPHA = 0.05;

    @TempDir
    Path dir;

    /** The grid of the coverage table: every (mean/σ, n, N), upper limit only, true index c₀. */
    static List<ShapeStudies.Case> grid() {
        List<ShapeStudies.Case> cases = new ArrayList<>();
        for (int readings : new int[] {50, 125, 250}) {
            for (int n : new int[] {1, 5}) {
                for (double ratio : new double[] {0, 0.5, 1, 2, 3}) {
                    cases.add(new ShapeStudies.Case(ShapeFamily.FOLDED_NORMAL, ratio, C0, n, readings / n, false));
                }
            }
        }
        return cases;
    }

    private Map<Verdict, Integer> atTheBoundary(ShapeStudies.Case c, int studies, long seed) {
        Map<Verdict, Integer> v = ShapeStudies.run(c, C0, studies, seed, dir);
        double pass = v.getOrDefault(Verdict.DEMONSTRATED, 0) / (double) studies;
        assertTrue(pass <= ShapeStudies.limit(ALPHA, studies), c.label() + ": demonstrated " + pass + " " + v);
        return v;
    }

    @Test
    void atTheBoundaryAtMostAlphaPlusTwoStandardErrors() {
        atTheBoundary(new ShapeStudies.Case(ShapeFamily.FOLDED_NORMAL, 0, C0, 5, 10, false), 80, 3_000L);
        Map<Verdict, Integer> v = atTheBoundary(new ShapeStudies.Case(ShapeFamily.FOLDED_NORMAL, 1, C0, 5, 25, false), 80, 4_000L);
        // the fit check (1 %) and the stability step void only a few of the studies of the declared shape
        assertTrue(v.getOrDefault(Verdict.NOT_VALID, 0) <= 6, v.toString());
    }

    @Test
    @Tag("long")
    void atTheBoundaryFullGrid() {
        long seed = 60_000L;
        for (ShapeStudies.Case c : grid()) {
            atTheBoundary(c, 300, seed);
            seed += 1_000;
        }
    }

    @Test
    void aCapableFoldedNormalProcessIsDemonstrated() {
        // true index 2.0, 25 x 5, mean/sigma 1 (the hardest mean/sigma for the bound): never graded not demonstrated;
        // 25 of these 30 studies demonstrated, 4 inconclusive, 1 not valid when written; at least 20 required
        ShapeStudies.Case capable = new ShapeStudies.Case(ShapeFamily.FOLDED_NORMAL, 1, 2.0, 5, 25, false);
        Map<Verdict, Integer> v = ShapeStudies.run(capable, C0, 30, 9_000L, dir);
        assertEquals(0, v.getOrDefault(Verdict.NOT_DEMONSTRATED, 0), v.toString());
        assertTrue(v.getOrDefault(Verdict.DEMONSTRATED, 0) >= 20, v.toString());
    }
}
