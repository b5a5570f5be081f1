package dev.proofrun.grade;

import dev.proofrun.control.ChanceSignals;
import dev.proofrun.control.ChartKind;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Grades a returned file against its plan: reads the file (CSV or XLSX, fill-in or long form) streaming,
 * checks it against the plan, and grades each characteristic. The plan wins: limits, design, slots and
 * requirement come from the plan; the file supplies readings and times only.
 */
public final class Grader {

    private Grader() {
    }

    /**
     * @param plan    what to grade against
     * @param file    the returned file
     * @param display the file's name as the user gave it, used in every message
     * @throws UserException if the file cannot be read, has no usable header, belongs to another plan or
     *                       revision, or has no data rows
     */
    public static GradeResult grade(GradingPlan plan, Path file, String display) {
        if (!Files.isRegularFile(file)) {
            throw new UserException(Location.file(display), GradeMessage.FILE_UNREADABLE, "no such file");
        }
        int n = plan.design().subgroupSize();
        int k = plan.slots().size();
        if ((long) n * k >= CharacteristicGrader.PARALLEL_READINGS && k >= 2) {
            // a large study: simulate what chance gives a complete return while the file is read
            ChanceSignals.prepare(ChartKind.forMethod(plan.design().sigmaMethod()), n, k, StabilityJudge.rules());
        }
        ReturnedData data = new ReturnedData(plan, display);
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".csv") || name.endsWith(".txt")) {
            CsvTable.read(file, display, data);
        } else if (name.endsWith(".xlsx")) {
            XlsxTable.read(file, display, data);
        } else {
            int dot = name.lastIndexOf('.');
            throw new UserException(Location.file(display), GradeMessage.UNSUPPORTED_FORMAT, dot < 0 ? name : name.substring(dot));
        }
        if (data.rows() == 0) {
            throw new UserException(Location.file(display), GradeMessage.NO_ROWS);
        }
        List<CharacteristicGrade> grades = new ArrayList<>();
        Verdict part = Verdict.DEMONSTRATED;
        for (int c = 0; c < plan.characteristics().size(); c++) {
            CharacteristicGrade g = CharacteristicGrader.grade(plan.characteristics().get(c), plan.design(), plan.interval(),
                    data.finish(c));
            grades.add(g);
            part = part.worse(g.verdict());
        }
        return new GradeResult(plan.id(), plan.revision(), display, data.problems(), grades, part);
    }
}
