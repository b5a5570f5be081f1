package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.design.ProcedurePower;
import org.junit.jupiter.api.Test;

/** The design's power counts the shape check at the level the grader uses; the two constants must not drift apart. */
class ShapeLevelTest {

    @Test
    void theDesignCountsTheGradersShapeLevel() {
        assertEquals(ShapeJudge.LEVEL, ProcedurePower.NORMAL_SHAPE_REJECTION, 0.0);
    }
}
