package dev.proofrun.report;

import dev.proofrun.grade.GradingPlan;
import dev.proofrun.grade.SimulatedReturn;
import java.nio.file.Path;
import java.util.Map;

/** Invented returns of the demo plan for the report tests: D1 always from a stable process well inside its limits. */
final class DemoReturns {

    private DemoReturns() {
    }

    /**
     * Writes the demo's returned file from {@code seed}: D1 stable at 22.0 (σ 0.002), R4 and F7 from the processes
     * given.
     */
    static Path write(GradingPlan demo, Path file, long seed, SimulatedReturn.Process r4, SimulatedReturn.Process f7) {
        SimulatedReturn.writeCsv(demo, Map.of(
                "D1", SimulatedReturn.Process.stable(22.0, 0.002),
                "R4", r4,
                "F7", f7), seed, file);
        return file;
    }
}
