package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The expected-readings curve reads the designer's own simulated studies: at c₀ and c₁ it is the designer's
 * expected readings (the same studies, the same looks), it lies between the first and the last look, a very poor
 * process stops early for futility, and the single stage is flat.
 */
class StagedReadingsCurveTest {

    /** One-sided Cpk ≥ 1.33 at 95 %, expected 1.8 (invented demo values), subgroups of 5. */
    private static final DesignRequest REQUEST = DesignRequest.of(SpecLimits.Sides.LOWER_ONLY,
            Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.centred(1.8));

    @Test
    void atTheRequirementAndAsExpectedItIsTheDesignersFigure() {
        StagedDesign d = StagedDesigner.design(REQUEST.withSubgroupSizes(List.of(5)), 5, 2, Spending.OBRIEN_FLEMING);
        double[] at = {0.9, 1.33, 1.8, 2.6};
        List<StagedReadingsCurve.Point> curve = StagedReadingsCurve.of(REQUEST, d, d.stages(), at);
        assertEquals(d.expectedReadingsAtTarget(), curve.get(1).staged(), 1e-9, "c₀: the designer's own figure");
        assertEquals(d.expectedReadingsAtExpected(), curve.get(2).staged(), 1e-9, "c₁: the designer's own figure");
        assertEquals(d.passAtTarget(), curve.get(1).demonstrated(), 1e-9, "the OC at c₀: the designer's false-pass risk");
        assertEquals(d.power(), curve.get(2).demonstrated(), 1e-9, "the OC at c₁: the designer's power");
        assertTrue(curve.get(1).demonstrated() <= 0.05 + 2 * Math.sqrt(0.05 * 0.95 / StagedDesigner.PATHS),
                "at c₀ at most α (+2 SE) demonstrated: " + curve.get(1).demonstrated());
        int first = d.looks().get(0).readings();
        for (StagedReadingsCurve.Point p : curve) {
            assertTrue(p.staged() >= first - 1e-9 && p.staged() <= d.maxReadings() + 1e-9, p.toString());
            assertEquals(d.singleStage().readings(), p.singleStage(), 0.0);
        }
        // far below c₀ most studies stop at the first look for futility; far above, demonstrated there
        assertTrue(curve.get(0).staged() < d.expectedReadingsAtTarget(), curve.toString());
        assertTrue(curve.get(3).staged() < d.expectedReadingsAtExpected(), curve.toString());
        assertSame(curve, StagedReadingsCurve.of(REQUEST, d, d.stages(), at), "kept, not simulated again");
    }

    @Test
    void aSingleStageIsFlatAndABadIndexIsRefused() {
        StagedDesign one = StagedDesigner.design(REQUEST.withSubgroupSizes(List.of(5)), 5, 1, Spending.OBRIEN_FLEMING);
        for (StagedReadingsCurve.Point p : StagedReadingsCurve.of(REQUEST, one, one.stages(), new double[] {1, 2})) {
            assertEquals(one.singleStage().readings(), p.staged(), 0.0);
        }
        assertThrows(IllegalArgumentException.class,
                () -> StagedReadingsCurve.of(REQUEST, one, one.stages(), new double[] {0}));
        double[] span = StagedReadingsCurve.span(REQUEST, 5);
        assertEquals(0.75 * 1.33, span[0], 1e-12);
        assertEquals(1.25 * 1.8, span[4], 1e-12);
    }
}
