package dev.proofrun.grade;

import dev.proofrun.grade.SimulatedReturn.Process;
import java.nio.file.Path;
import java.util.Map;

/**
 * The demo's returned readings: how the demo plan's three characteristics behave (invented) and the seed
 * they are drawn with. {@code proofrun demo} and the wizard's demo runs both write the returned file
 * through here, so a newcomer sees the same verdicts in the terminal and on screen.
 */
public final class DemoReturn {

    /** The seed of the demo's returned file. */
    public static final long SEED = 20270334L;

    private DemoReturn() {
    }

    /**
     * The bore runs well and centred (demonstrated), the roughness — lognormal, median 0.42 µm, σ of ln x 0.16,
     * a percentile index of about 1.47 — runs close to its requirement (inconclusive on the demo plan), the push-out force drops after a material-lot change halfway
     * through (not valid: unstable).
     */
    public static Map<String, Process> processes() {
        return Map.of(
                "D1", Process.stable(22.0012, 0.0021),
                "R4", Process.skewed(0.42, 0.16),
                "F7", Process.stepping(6.1, 0.22, 0.6, -0.55));
    }

    /** Writes the demo's returned file for {@code plan} (its slots and subgroup sizes) with {@link #SEED}. */
    public static void writeCsv(GradingPlan plan, Path out) {
        SimulatedReturn.writeCsv(plan, processes(), SEED, out);
    }
}
