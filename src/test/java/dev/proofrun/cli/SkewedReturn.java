package dev.proofrun.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.grade.GradingPlan;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.plan.PlanFiles;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * A returned fill-in file for an issued one-characteristic plan of subgroups of 5 (characteristic C1), with invented
 * readings start + 0.02·exp(0.4·Z) from a seeded stream — a skewed characteristic seated on a stop at {@code start}.
 */
final class SkewedReturn {

    private SkewedReturn() {
    }

    /**
     * Issues the plan, then writes {@code returned.csv} beside it in {@code dir}.
     *
     * @param position    the reading of the first subgroup (0..4) that {@code replacement} takes the place of
     * @param replacement the text written there instead, or null for none
     */
    static Path write(LastRun cli, Path plan, Path dir, long seed, double start, int position, String replacement)
            throws Exception {
        assertEquals(0, cli.run("plan", "issue", plan.toString()), cli.err());
        GradingPlan gp = GradingPlans.of(PlanFiles.read(plan));
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        StringBuilder sb = new StringBuilder("plan,slot,characteristic,planned,taken,lot,operator,x1,x2,x3,x4,x5,remark\n");
        boolean first = true;
        for (var slot : gp.slots()) {
            String t = slot.start().toOffsetDateTime().toString();
            sb.append(gp.reference()).append(',').append(slot.id()).append(",C1,").append(t).append(',').append(t).append(",L1,MK");
            for (int j = 0; j < 5; j++) {
                String x = String.format(Locale.ROOT, "%.5f", start + 0.02 * Math.exp(0.4 * g.sample()));
                sb.append(',').append(first && j == position && replacement != null ? replacement : x);
            }
            first = false;
            sb.append(",\n");
        }
        Path data = dir.resolve("returned.csv");
        Files.writeString(data, sb.toString(), StandardCharsets.UTF_8);
        return data;
    }
}
