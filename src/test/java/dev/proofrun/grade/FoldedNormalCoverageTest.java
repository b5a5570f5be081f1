package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The folded-normal shape through the real grader ({@link Grader#grade}, files written and read): at the boundary
 * (true percentile index = c₀ = 1.33, upper limit only) at most α + 2 SE of the studies are graded demonstrated.
 * Each study costs about 1,400 refits (fit check and bound), so the default suite grades 80 studies of 25 × 5 at
 * mean/σ = 1 (limit 0.05 + 2·√(0.05·0.95/80) = 0.099); the grid of 400 studies at mean/σ = 1 and 3 is {@code long}
 * (limit 0.072). Figures: docs/decisions/declared-shape-grading.md.
 */
class FoldedNormalCoverageTest {

    static final double C0 = 1.33;
    static final double ALPHA = 0.05;

    @TempDir
    Path dir;

    private static double limit(int studies) {
        return ALPHA + 2 * Math.sqrt(ALPHA * (1 - ALPHA) / studies);
    }

    private Map<Verdict, Integer> atTheBoundary(double ratio, int studies, long seed) {
        ShapeStudies.Case c = new ShapeStudies.Case(ShapeFamily.FOLDED_NORMAL, ratio, C0, 5, 25, false);
        Map<Verdict, Integer> v = ShapeStudies.run(c, C0, studies, seed, dir);
        double pass = v.getOrDefault(Verdict.DEMONSTRATED, 0) / (double) studies;
        assertTrue(pass <= limit(studies), c.label() + ": demonstrated " + pass + " " + v);
        return v;
    }

    @Test
    void atTheBoundaryAtMostAlphaPlusTwoStandardErrors() {
        Map<Verdict, Integer> v = atTheBoundary(1, 80, 3_000L);
        // the fit check (1 %) and the stability step void only a few of the studies of the declared shape
        assertTrue(v.getOrDefault(Verdict.NOT_VALID, 0) <= 6, v.toString());
    }

    @Test
    @Tag("long")
    void atTheBoundaryFullGrid() {
        atTheBoundary(1, 400, 60_000L);
        atTheBoundary(3, 400, 61_000L);
    }

    @Test
    void aCapableFoldedNormalProcessIsDemonstrated() {
        // true index 2.0, 25 x 5, mean/sigma 1: far above c0, so nearly every study is demonstrated
        ShapeStudies.Case capable = new ShapeStudies.Case(ShapeFamily.FOLDED_NORMAL, 1, 2.0, 5, 25, false);
        Map<Verdict, Integer> v = ShapeStudies.run(capable, C0, 30, 9_000L, dir);
        assertEquals(0, v.getOrDefault(Verdict.NOT_DEMONSTRATED, 0), v.toString());
        assertTrue(v.getOrDefault(Verdict.DEMONSTRATED, 0) >= 27, v.toString());
    }
}
