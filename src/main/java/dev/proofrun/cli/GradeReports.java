package dev.proofrun.cli;

import dev.proofrun.grade.GradeResult;
import dev.proofrun.plan.StudyPlan;
import java.io.PrintWriter;
import java.nio.file.Path;

/** Writes the grade report PDF for {@code grade --report}. */
final class GradeReports {

    private GradeReports() {
    }

    static void write(GradeResult result, StudyPlan plan, Path file, PrintWriter err) {
        err.println("proofrun: --report: the grade report PDF is not available in this build yet; no file was written to " + file);
        err.flush();
    }
}
