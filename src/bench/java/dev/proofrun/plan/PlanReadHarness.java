package dev.proofrun.plan;

import com.sun.management.OperatingSystemMXBean;
import dev.proofrun.design.Design;
import dev.proofrun.schedule.ProductionCalendar;
import dev.proofrun.schedule.ProductionRate;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.schedule.StudySpan;
import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.Locale;

/**
 * The plan-reading harness (not JMH: the question is one cold read of a very large plan, JVM start, JIT and
 * garbage collector included, as {@code proofrun grade} does it once per run).
 * <pre>
 *   mvn -o -q package -DskipTests
 *   javac -d target/bench-classes -cp target/proofrun.jar src/bench/java/dev/proofrun/plan/PlanReadHarness.java
 *   java -cp target/proofrun.jar:target/bench-classes dev.proofrun.plan.PlanReadHarness write /tmp/big-plan.json
 *   /usr/bin/time -v java -Xmx512m -cp target/proofrun.jar:target/bench-classes dev.proofrun.plan.PlanReadHarness read /tmp/big-plan.json
 *   /usr/bin/time -v java -Xmx512m -cp target/proofrun.jar:target/bench-classes dev.proofrun.plan.PlanReadHarness pending /tmp/big-plan.json
 * </pre>
 * {@code write} schedules the demo plan's calendar and characteristics with the ordinary scheduler at 300
 * parts an hour over 200 working days, 200,000 evenly spaced slots of 5, about 1.3 minutes apart (so the slots cross both daylight-saving
 * changes of 2027 in Europe/Berlin), issues it and saves it with {@link PlanFiles#write} (about 34 MB).
 * {@code read} times {@link PlanFiles#read}; {@code pending} times {@link PlanFiles#readPending} then
 * {@code plan()} and {@code confirm()} (the revision check), as grading does. Each prints wall time, the CPU
 * time of the whole process during the step (all threads, JIT and GC included), the peak of the heap pools and
 * the collector's time; {@code /usr/bin/time -v} adds the process's wall time and peak RSS.
 */
public final class PlanReadHarness {

    static final int SLOTS = 200_000;

    private PlanReadHarness() {
    }

    static StudyPlan plan() {
        StudyPlan demo = DemoPlan.draft();
        ProductionCalendar c = demo.calendar();
        ProductionCalendar fast = new ProductionCalendar(c.zone(), c.workingDays(), c.shifts(), c.breaks(),
                c.nonWorkingDates(), ProductionRate.perHour(300));
        return PlanFiles.issue(StudyPlan.draft("PR-BENCH-PLAN", demo.part(), demo.people(), demo.characteristics(), fast,
                StudySpan.days(LocalDateTime.of(2027, 1, 4, 6, 0), 200), Design.of(5, SLOTS), Spacing.EVEN, 20270104L));
    }

    public static void main(String[] args) throws Exception {
        Path file = Path.of(args[1]);
        switch (args[0]) {
            case "write" -> {
                StudyPlan p = plan();
                Files.deleteIfExists(file);
                PlanFiles.write(file, p);
                System.out.printf(Locale.ROOT, "%s: %d slots, %d bytes, revision %s%n", file, p.schedule().slots().size(),
                        Files.size(file), p.revision().orElseThrow());
            }
            case "read" -> time("read", () -> PlanFiles.read(file));
            case "pending" -> time("readPending+confirm", () -> {
                PlanFiles.Pending pending = PlanFiles.readPending(file);
                pending.plan();
                return pending.confirm();
            });
            default -> throw new IllegalArgumentException("write | read | pending FILE");
        }
    }

    private interface Step {
        StudyPlan run() throws Exception;
    }

    private static void time(String name, Step step) throws Exception {
        OperatingSystemMXBean os = (OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        long cpu0 = os.getProcessCpuTime();
        long t0 = System.nanoTime();
        StudyPlan p = step.run();
        long t1 = System.nanoTime();
        long cpu1 = os.getProcessCpuTime();
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        long gcMs = 0;
        for (GarbageCollectorMXBean gc : ManagementFactory.getGarbageCollectorMXBeans()) {
            gcMs += Math.max(0, gc.getCollectionTime());
        }
        System.out.printf(Locale.ROOT, "%s: %d slots, revision %s; wall %.2f s, process CPU %.2f s, heap pools peak %d MB, GC %d ms%n",
                name, p.schedule().slots().size(), p.revision().orElseThrow(), (t1 - t0) / 1e9, (cpu1 - cpu0) / 1e9,
                peak >> 20, gcMs);
    }
}
