package dev.proofrun.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The stored detection is the simulation it claims to be. Each stored cell is a count of the 500 seeded shifted
 * studies the grader's decision called unstable, so a fresh run of {@link StabilityRisk#simulated} (same seeds) must
 * give exactly the stored figure — any change to the stability rule, its chance reference or the seeds breaks
 * equality here (the simulation's own error, about 0.017 at 500 studies, is no excuse: the same draws give the same
 * count). Checked: the rows of the README's example design table ({@code size --target 1.33 --expected 1.67}), a
 * step between neighbouring k, and one whole line of the file rebuilt by the writer.
 */
class DetectionTableTest {

    @Test
    void theExampleTablesRowsAreFreshSimulations() {
        // the rows of the example's table that the stored cells serve: 164 x 1, 112 x 2, 55 x 3, 28 x 5, 25 x 10
        check(1, 164);
        check(2, 112);
        check(3, 55);
        check(5, 28);
        check(10, 25);
    }

    @Test
    void aStepBetweenNeighboursIsStoredAsSimulated() {
        DetectionTable t = DetectionTable.get();
        double at164 = t.detection(ChartKind.INDIVIDUALS, 1, 164, 1.5).getAsDouble();
        double at165 = t.detection(ChartKind.INDIVIDUALS, 1, 165, 1.5).getAsDouble();
        assertEquals(StabilityRisk.simulated(ChartKind.INDIVIDUALS, 1, 165, 1.5).detection(), at165, 0.0);
        assertTrue(at164 - at165 > 0.03, at164 + " / " + at165);
    }

    @Test
    void theWriterRebuildsALineOfTheFile() throws IOException {
        // the first line of n = 4 (k = 2..21: up to 84 readings, a few seconds) as the writer makes it
        String rebuilt = DetectionTableWriter.line(4, 2, 21, k -> DetectionTableWriter.count(4, k));
        assertTrue(storedLines().contains(rebuilt), rebuilt);
    }

    @Test
    void onlyTheDefaultChartsShiftAndSizesAreStored() {
        DetectionTable t = DetectionTable.get();
        assertTrue(t.detection(ChartKind.XBAR_R, 5, 100, 1.5).isPresent(), "500 readings: the last stored");
        assertFalse(t.detection(ChartKind.XBAR_R, 5, 101, 1.5).isPresent(), "beyond 500 readings");
        assertFalse(t.detection(ChartKind.XBAR_S, 5, 28, 1.5).isPresent(), "another chart");
        assertFalse(t.detection(ChartKind.XBAR_R, 5, 28, 1.0).isPresent(), "another shift");
        assertFalse(t.detection(ChartKind.XBAR_R, 11, 25, 1.5).isPresent(), "n beyond 10");
    }

    @Test
    void overallRequirementsWithSubgroupsAreSimulatedNotStored() {
        // the means on their own chart: another decision (simulated: 0.782 at 30 x 3 against the within rule's
        // 0.892, 500 studies each), so the stored within-rule figure must not be returned for it
        double overall = StabilityRisk.of(ChartKind.XBAR_R, 3, 30, 1.5, true).detection();
        double stored = DetectionTable.get().detection(ChartKind.XBAR_R, 3, 30, 1.5).getAsDouble();
        assertEquals(stored, StabilityRisk.of(ChartKind.XBAR_R, 3, 30, 1.5, false).detection(), 0.0);
        assertTrue(stored - overall > 0.05, overall + " / " + stored);
    }

    private static void check(int n, int k) {
        ChartKind kind = ChartKind.forSubgroupSize(n);
        double stored = DetectionTable.get().detection(kind, n, k, 1.5).getAsDouble();
        assertEquals(StabilityRisk.simulated(kind, n, k, 1.5).detection(), stored, 0.0, k + " x " + n);
    }

    private static List<String> storedLines() throws IOException {
        try (InputStream in = DetectionTable.class.getResourceAsStream(DetectionTable.RESOURCE)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
        }
    }
}
