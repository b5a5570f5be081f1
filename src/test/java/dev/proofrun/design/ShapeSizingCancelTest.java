package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import java.util.List;
import java.util.concurrent.CancellationException;
import org.junit.jupiter.api.Test;

/**
 * A shaped table is simulated power by power; a job cancelled by interrupting its thread stops at the next power
 * instead of finishing the table. (The table itself, against the grader, is checked in
 * {@code grade.PromisedShapePowerTest}.)
 */
class ShapeSizingCancelTest {

    @Test
    void aCancelledJobStopsBeforeTheNextSimulatedPower() {
        Thread.currentThread().interrupt();
        try {
            assertThrows(CancellationException.class, () -> ShapeSizing.design(ShapeFamily.LOGNORMAL, 0.25,
                    IndexKind.Side.UPPER, 1.33, 1.67, 0.95, 0.9, List.of(5), PracticeFloors.defaults()));
        } finally {
            Thread.interrupted();
        }
    }
}
