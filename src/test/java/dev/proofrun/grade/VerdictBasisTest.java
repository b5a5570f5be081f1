package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The judged index names the method and the model its verdict rests on. */
class VerdictBasisTest {

    @TempDir
    Path dir;

    @Test
    void normalReadingsRestOnNormalTheory() {
        CharacteristicGrade g = gradeOf(SimulatedReturn.Process.stable(10.0, 0.012), 3L);
        IndexEvidence e = g.judged();
        assertNotNull(e);
        assertEquals(IndexMethod.NORMAL_THEORY, e.method());
        assertEquals(ShapeFamily.NORMAL, e.model());
        assertTrue(e.summary().startsWith("Cpk under the normal model by normal theory, exact bounds: estimate "), e.summary());
    }

    @Test
    void skewedReadingsNameTheModelThatCarriedTheVerdict() {
        // invented: a roughness-like characteristic planned lognormal, readings lognormal with a relative sd of 0.5,
        // upper limit only; 50 subgroups of 5
        PlannedCharacteristic rough = new PlannedCharacteristic("R1", "roughness", "um", SpecLimits.upperOnly(3.0), null,
                0, Requirement.of(IndexKind.PPK, 1.33, 0.95), ShapeFamily.LOGNORMAL);
        GradingPlan plan = TestPlans.plan(5, 50, rough);
        Path f = dir.resolve("rough.csv");
        SimulatedReturn.writeCsv(plan, Map.of("R1", SimulatedReturn.Process.skewed(0.5, 0.5)), 8L, f);
        CharacteristicGrade g = Grader.grade(plan, f, "rough.csv").characteristics().get(0);
        IndexEvidence e = g.judged();
        assertNotNull(e, g.reasons().toString());
        assertTrue(e.otherThanNormalTheory(), e.toString());
        assertEquals(ShapeFamily.LOGNORMAL, e.model());
        assertEquals(IndexMethod.PERCENTILE, e.method());
        assertTrue(e.summary().contains("under the " + e.model().token() + " model"), e.summary());
    }

    private CharacteristicGrade gradeOf(SimulatedReturn.Process p, long seed) {
        GradingPlan plan = TestPlans.plan(5, 25, TestPlans.bore());
        Path f = dir.resolve("normal.csv");
        SimulatedReturn.writeCsv(plan, Map.of("D1", p), seed, f);
        return Grader.grade(plan, f, "normal.csv").characteristics().get(0);
    }
}
