package dev.proofrun.cli;

import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code proofrun plan issue FILE.json}: freeze a plan and print its revision. */
@Command(name = "issue", mixinStandardHelpOptions = true,
        description = "Freeze the plan and record its revision fingerprint. A plan changed after it was issued"
                + " becomes a new revision that names the old one; the file as found is kept as FILE.bak.")
public final class PlanIssueCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE.json", description = "The plan file.")
    Path file;

    @Override
    public Integer call() {
        PlanFiles.Inspection before = PlanFiles.inspect(file);
        StudyPlan after = PlanFiles.issue(file);
        PrintWriter out = spec.commandLine().getOut();
        String rev = after.revision().orElseThrow();
        switch (before.integrity()) {
            case INTACT:
                out.println(PlanOptionMessage.ALREADY_ISSUED.format(file, after.revisionWords()));
                break;
            case CHANGED_AFTER_ISSUE: {
                String old = before.plan().revision().orElseThrow();
                out.println(PlanOptionMessage.REISSUED.format(file, before.plan().revisionWords(), after.revisionWords(), old,
                        file.getFileName()));
                break;
            }
            default:
                out.println(PlanOptionMessage.ISSUED.format(file, after.revisionWords(), after.reference()));
        }
        out.println(rev);
        out.flush();
        return 0;
    }
}
