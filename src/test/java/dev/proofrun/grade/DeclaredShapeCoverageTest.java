package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The customer's risk through the real grader: with the true percentile index exactly at c₀ = 1.33 the
 * fraction of studies graded demonstrated may be at most α + 2 SE (α = 0.05, SE = √(α(1 − α)/S) for S
 * studies). Invented processes, fixed seeds. The default suite runs 200 studies per case (SE 0.015, so the
 * limit is 0.081); the long grid 2,000 (limit 0.060). Figures: docs/decisions/declared-shape-grading.md.
 */
class DeclaredShapeCoverageTest {

    static final double C0 = 1.33;
    static final double ALPHA = 0.05;

    @TempDir
    Path dir;

    static List<ShapeStudies.Case> grid() {
        return List.of(
                new ShapeStudies.Case(ShapeFamily.NORMAL, 0, C0, 5, 25, false),
                new ShapeStudies.Case(ShapeFamily.NORMAL, 0, C0, 1, 100, false),
                new ShapeStudies.Case(ShapeFamily.LOGNORMAL, 0.25, C0, 5, 25, false),
                new ShapeStudies.Case(ShapeFamily.LOGNORMAL, 0.5, C0, 5, 25, false),
                new ShapeStudies.Case(ShapeFamily.WEIBULL, 1.2, C0, 5, 25, false),
                new ShapeStudies.Case(ShapeFamily.WEIBULL, 1.5, C0, 5, 25, false),
                new ShapeStudies.Case(ShapeFamily.WEIBULL, 3, C0, 5, 25, false));
    }

    private void atTheBoundary(int studies, long seed) {
        System.out.print(ShapeStudies.assertAtMostAlpha(grid(), C0, ALPHA, studies, seed, dir));
    }

    @Test
    void atTheBoundaryAtMostAlphaPlusTwoStandardErrors() {
        atTheBoundary(200, 1_000L);
    }

    @Test
    @Tag("long")
    void atTheBoundaryFullGrid() {
        atTheBoundary(2_000, 50_000L);
    }

    @Test
    void aCapableNormalProcessIsNeverGradedNotDemonstrated() {
        // Cpk 2.0 centred, 27 subgroups of 5: the shape gate at 1 % and the index can no longer send it to
        // not-demonstrated through another model
        ShapeStudies.Case capable = new ShapeStudies.Case(ShapeFamily.NORMAL, 0, 2.0, 5, 27, true);
        Map<Verdict, Integer> v = ShapeStudies.run(capable, C0, 200, 7_000L, dir);
        assertEquals(0, v.getOrDefault(Verdict.NOT_DEMONSTRATED, 0), v.toString());
        assertTrue(v.getOrDefault(Verdict.DEMONSTRATED, 0) >= 190, v.toString());
    }
}
