package dev.proofrun.cli;

import dev.proofrun.grade.GradeResult;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.report.GradeReport;
import dev.proofrun.sheet.layout.Paper;
import java.io.PrintWriter;
import java.nio.file.Path;

/** Writes the grade report PDF for {@code grade --report}. */
final class GradeReports {

    private GradeReports() {
    }

    /**
     * Writes the report (A4) through {@link GradeReport}: to a temporary file beside {@code file}, moved into
     * place when complete. A failure to write is a {@link dev.proofrun.text.UserException} (exit 2).
     *
     * @param err unused; kept for the caller's signature
     */
    static void write(GradeResult result, StudyPlan plan, Path file, PrintWriter err) {
        GradeReport.write(result, plan, Paper.A4, file);
    }
}
