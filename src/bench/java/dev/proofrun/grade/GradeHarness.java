package dev.proofrun.grade;

import dev.proofrun.control.ChanceSignalCounts;
import dev.proofrun.design.Design;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.nio.file.Path;
import java.time.Duration;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The grading speed harness (not JMH: the goal is cold wall time including JVM start and peak heap).
 * <pre>
 *   mvn -o -q package -DskipTests
 *   javac -d target/bench-classes -cp target/proofrun.jar src/bench/java/dev/proofrun/grade/GradeHarness.java
 *   java -cp target/proofrun.jar:target/bench-classes dev.proofrun.grade.GradeHarness write /tmp/million.csv
 *   /usr/bin/time -v java -Xmx512m -cp target/proofrun.jar:target/bench-classes dev.proofrun.grade.GradeHarness grade /tmp/million.csv
 * </pre>
 * One characteristic, 200,000 slots of 5 readings (1,000,000 readings), in the fill-in CSV form. The plan is
 * built in code (the same one for writing and grading); the grade phase prints the time of each step.
 * {@code write-for PLAN.json OUT.csv} writes a stable return for a real plan file instead, to time the
 * command itself: {@code java -Xmx512m -jar target/proofrun.jar grade PLAN.json OUT.csv}.
 */
public final class GradeHarness {

    static final int SLOTS = 200_000;

    private GradeHarness() {
    }

    static GradingPlan plan() {
        List<PlannedSlot> slots = new ArrayList<>(SLOTS);
        ZonedDateTime t = ZonedDateTime.of(2027, 1, 4, 6, 0, 0, 0, ZoneId.of("Europe/Berlin"));
        for (int i = 0; i < SLOTS; i++) {
            // no String.format here: on a cold JVM 200,000 calls of it cost seconds, which is not grading
            String digits = Integer.toString(i + 1);
            slots.add(new PlannedSlot("S" + "000000".substring(digits.length()) + digits, t.plusMinutes(2L * i), 1));
        }
        PlannedCharacteristic c = new PlannedCharacteristic("D1", "bore diameter", "mm", SpecLimits.twoSided(9.9, 10.1), 10.0,
                0.0001, Requirement.of(IndexKind.CPK, 1.33, 0.95));
        return new GradingPlan("PR-BENCH-1", "0123456789ab", ZoneId.of("Europe/Berlin"), List.of(c), Design.of(5, SLOTS),
                slots, GradingPlan.defaultAllowedShortfall(SLOTS), Duration.ofMinutes(2));
    }

    /** Times each step separately in CPU time of the main thread (third argument "phases"): robust on a loaded machine. */
    private static long cpu() {
        return java.lang.management.ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
    }

    static void phases(GradingPlan plan, Path file) {
        long a = cpu();
        // as Grader.grade does for a large study: chance simulated on a background thread while reading
        ChanceSignalCounts.prepare(dev.proofrun.control.ChartKind.forMethod(plan.design().sigmaMethod()),
                plan.design().subgroupSize(), plan.slots().size(), StabilityJudge.rules());
        ReturnedData data = new ReturnedData(plan, file.toString());
        CsvTable.read(file, file.toString(), data);
        long b = cpu();
        ReturnedData.Collection c = data.finish(0);
        long c1 = cpu();
        List<Reason> reasons = new ArrayList<>();
        Stability st = StabilityJudge.judge(dev.proofrun.control.ChartKind.XBAR_R, c.subgroups(), c.slots(), reasons);
        long d = cpu();
        PlannedCharacteristic gc0 = plan.characteristics().get(0);
        Shape sh = ShapeJudge.judge(c.subgroups(), c.slots(), gc0.resolution(), gc0.shape(), gc0.limits(), reasons);
        long e = cpu();
        dev.proofrun.capability.CapabilityAnalysis.withoutNormality(c.subgroups(), plan.characteristics().get(0).limits(), 10.0,
                plan.design().sigmaMethod(), 0.95, plan.design().boundMethod());
        long f = cpu();
        JudgedIndex j = CapabilityJudge.judge(gc0, plan.design(), c.subgroups());
        j.lower(0.95);
        long g = cpu();
        System.out.printf("main-thread CPU: read %.0f, finish %.0f, stability %.0f, shape %.0f, capability figures %.0f, judged %.0f ms%n",
                (b - a) / 1e6, (c1 - b) / 1e6, (d - c1) / 1e6, (e - d) / 1e6, (f - e) / 1e6, (g - f) / 1e6);
        reasons.forEach(x -> System.out.println("  " + x.text()));
    }

    public static void main(String[] args) {
        long t0 = System.nanoTime();
        GradingPlan plan = plan();
        Path file = Path.of(args[1]);
        if (args[0].equals("write-for")) {
            // write-for PLAN.json OUT.csv: a stable return for a real plan file, every characteristic centred
            // with sigma = tolerance width / 12 (Cp = 2; invented)
            GradingPlan real = GradingPlans.of(dev.proofrun.plan.PlanFiles.read(file));
            Map<String, SimulatedReturn.Process> processes = new java.util.HashMap<>();
            for (PlannedCharacteristic c : real.characteristics()) {
                double mid = c.nominal() != null ? c.nominal()
                        : 0.5 * (c.limits().lower().getAsDouble() + c.limits().upper().getAsDouble());
                processes.put(c.id(), SimulatedReturn.Process.stable(mid, c.limits().width().getAsDouble() / 12));
            }
            // characteristics without a gauge resolution are written to 4 decimals, as a gauge prints them
            // (full 17-digit doubles would measure Double.parseDouble's slow path, not a returned file)
            List<PlannedCharacteristic> rounded = new ArrayList<>();
            for (PlannedCharacteristic c : real.characteristics()) {
                rounded.add(c.resolution() > 0 ? c : new PlannedCharacteristic(c.id(), c.name(), c.unit(), c.limits(),
                        c.nominal(), 0.0001, c.requirement()));
            }
            GradingPlan written = new GradingPlan(real.id(), real.revision(), real.zone(), rounded, real.design(),
                    real.slots(), real.allowedShortfall(), real.interval());
            SimulatedReturn.writeCsv(written, processes, 1L, Path.of(args[2]));
            return;
        }
        if (args[0].equals("write")) {
            SimulatedReturn.writeCsv(plan, Map.of("D1", SimulatedReturn.Process.stable(10.0, 0.015)), 1L, file);
            return;
        }
        long t1 = System.nanoTime();
        if (args.length > 2) {
            phases(plan, file);
            return;
        }
        GradeResult r = Grader.grade(plan, file, file.toString());
        long t2 = System.nanoTime();
        CharacteristicGrade g = r.characteristics().get(0);
        System.out.printf("plan built %.0f ms, graded %.0f ms; %d readings, verdict %s, problems %d%n",
                (t1 - t0) / 1e6, (t2 - t1) / 1e6, g.completeness().readings(), g.verdict().token(), r.problems().size());
        g.reasons().forEach(x -> System.out.println("  " + x.text()));
        Runtime rt = Runtime.getRuntime();
        System.out.printf("heap used at end %.0f MB (max %.0f MB)%n", (rt.totalMemory() - rt.freeMemory()) / 1e6, rt.maxMemory() / 1e6);
    }
}
