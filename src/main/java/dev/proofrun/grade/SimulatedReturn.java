package dev.proofrun.grade;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Writes a simulated returned fill-in file for a plan — seeded, for the demo and for tests. Each
 * characteristic follows a {@link Process}: normal readings (or lognormal when asked), a mean that may step
 * after a fraction of the study, rounded to the gauge's resolution. Invented data; it stands for no real
 * process.
 */
public final class SimulatedReturn {

    private static final DateTimeFormatter MINUTES = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mmxxx", Locale.ROOT);

    private SimulatedReturn() {
    }

    /**
     * How one characteristic's readings are drawn.
     *
     * @param mean      the process mean at the start
     * @param sd        the within-subgroup standard deviation
     * @param stepAt    fraction of the subgroups after which the mean steps (1 = never)
     * @param step      the size of the step
     * @param lognormal draw exp(N(ln mean, sd)) — sd then the σ of ln x — instead of N(mean, sd): a skewed characteristic
     */
    public record Process(double mean, double sd, double stepAt, double step, boolean lognormal) {

        public static Process stable(double mean, double sd) {
            return new Process(mean, sd, 1, 0, false);
        }

        public static Process stepping(double mean, double sd, double stepAt, double step) {
            return new Process(mean, sd, stepAt, step, false);
        }

        public static Process skewed(double median, double relativeSd) {
            return new Process(median, relativeSd, 1, 0, true);
        }
    }

    /**
     * Writes the fill-in CSV (header plan,slot,characteristic,planned,taken,lot,operator,x1..xn,remark).
     *
     * @param plan      the plan
     * @param processes one per characteristic id
     * @param seed      the seed
     * @param out       the file to write
     */
    public static void writeCsv(GradingPlan plan, Map<String, Process> processes, long seed, Path out) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        int n = plan.design().subgroupSize();
        List<PlannedSlot> slots = plan.slots();
        try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            StringBuilder header = new StringBuilder("plan,slot,characteristic,planned,taken,lot,operator");
            for (int j = 1; j <= n; j++) {
                header.append(",x").append(j);
            }
            w.write(header.append(",remark\n").toString());
            StringBuilder sb = new StringBuilder(256);
            for (int s = 0; s < slots.size(); s++) {
                PlannedSlot slot = slots.get(s);
                int late = (int) Math.floor(rng.nextDouble() * Math.max(1, slot.windowMinutes()));
                String taken = MINUTES.format(slot.start().plusMinutes(late).toOffsetDateTime());
                String lot = "L" + (1 + s * 3 / Math.max(1, slots.size()));
                for (PlannedCharacteristic c : plan.characteristics()) {
                    Process p = processes.get(c.id());
                    if (p == null) {
                        throw new IllegalArgumentException("no process for characteristic " + c.id());
                    }
                    double mean = s >= p.stepAt() * slots.size() ? p.mean() + p.step() : p.mean();
                    sb.setLength(0);
                    sb.append(plan.reference()).append(',').append(slot.id()).append(',').append(c.id()).append(',')
                            .append(MINUTES.format(slot.start().toOffsetDateTime())).append(',').append(taken).append(',')
                            .append(lot).append(",MK");
                    for (int j = 0; j < n; j++) {
                        double v = p.lognormal() ? Math.exp(Math.log(mean) + p.sd() * g.sample()) : mean + p.sd() * g.sample();
                        sb.append(',').append(round(v, c.resolution()));
                    }
                    sb.append(",\n");
                    w.write(sb.toString());
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The value rounded to the resolution, written without binary noise (e.g. 10.0125). */
    static String round(double v, double resolution) {
        if (!(resolution > 0)) {
            return Double.toString(v);
        }
        BigDecimal step = BigDecimal.valueOf(resolution);
        BigDecimal steps = BigDecimal.valueOf(Math.rint(v / resolution));
        return steps.multiply(step).stripTrailingZeros().toPlainString();
    }
}
