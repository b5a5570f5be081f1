package dev.proofrun.cli;

import dev.proofrun.grade.GradeMessage;
import dev.proofrun.grade.GradingPlan;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.DemoReturn;
import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.text.AtomicFile;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code proofrun demo --out DIR}: the issued demo plan and a seeded, simulated returned file that grades to
 * a mix of verdicts — the whole loop in two commands. The readings are invented and come from
 * {@link DemoReturn}, which the wizard's demo runs use too: the bore runs well (demonstrated), the roughness
 * runs close to its requirement (inconclusive), the push-out force drops after a material-lot change (not
 * valid: unstable).
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Write the demo plan (issued) and a simulated returned file to grade.")
public final class DemoCommand implements Callable<Integer> {

    /** The returned file's name. */
    public static final String RETURNED = "demo-valve-body-returned.csv";
    static final long SEED = DemoReturn.SEED;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "Directory to write into (created if missing).")
    Path out;

    @Override
    public Integer call() {
        Path planFile = out.resolve(DemoPlan.FILE_NAME);
        Path dataFile = out.resolve(RETURNED);
        for (Path p : new Path[] {planFile, dataFile}) {
            if (Files.exists(p)) {
                throw new UserException(Location.file(p.toString()), GradeMessage.DEMO_EXISTS, p);
            }
        }
        StudyPlan plan = DemoPlan.create();
        GradingPlan gp = GradingPlans.of(plan);
        try {
            Files.createDirectories(out);
            try (AtomicFile.Pending returned = AtomicFile.begin(dataFile)) {
                DemoReturn.writeCsv(gp, returned.temp());
                PlanFiles.write(planFile, plan);
                returned.commit();
            }
        } catch (IOException e) {
            throw new UserException(Location.file(out.toString()), GradeMessage.FILE_UNREADABLE, e.getMessage());
        }
        PrintWriter w = spec.commandLine().getOut();
        w.println("Wrote " + planFile + " (issued, " + plan.reference() + ")");
        w.println("Wrote " + dataFile + " (simulated readings, seed " + SEED + ")");
        w.println("Grade it: proofrun grade " + planFile + " " + dataFile);
        w.flush();
        return 0;
    }
}
