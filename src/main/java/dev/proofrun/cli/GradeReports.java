package dev.proofrun.cli;

import dev.proofrun.grade.GradeResult;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.report.GradeReport;
import dev.proofrun.paper.Paper;
import java.nio.file.Path;

/** Writes the grade report PDF for {@code grade --report}. */
final class GradeReports {

    private GradeReports() {
    }

    /**
     * Writes the report through {@link GradeReport}: to a temporary file beside {@code file}, moved into place
     * when complete. A failure to write is a {@link dev.proofrun.text.UserException} (exit 2).
     *
     * @param paper A4 or Letter ({@code --paper})
     */
    static void write(GradeResult result, StudyPlan plan, Path file, Paper paper) {
        GradeReport.write(result, plan, paper, file);
    }
}
