package dev.proofrun.grade;

import dev.proofrun.control.ChanceSignalCounts;
import dev.proofrun.control.ChartKind;
import dev.proofrun.design.Look;
import dev.proofrun.design.Stages;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Grades a returned file against its plan: reads the file (CSV or XLSX, fill-in or long form) streaming,
 * checks it against the plan, and grades each characteristic. The plan wins: limits, design, slots and
 * requirement come from the plan; the file supplies readings and times only.
 *
 * <p>A staged plan's return is graded at one planned look ({@link #look}): the slots up to that look's last one,
 * against the loss allowance of a study of that many subgroups, with the bound at the look's confidence.
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
            ChanceSignalCounts.prepare(ChartKind.forMethod(plan.design().sigmaMethod()), n, k, StabilityJudge.rules());
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
        Optional<GradedLook> look = plan.staged() ? Optional.of(look(plan, data.reach())) : Optional.empty();
        int slotsSoFar = look.map(l -> l.look().subgroups()).orElse(k);
        int allowed = look.isPresent() ? GradingPlan.defaultAllowedShortfall(slotsSoFar) : plan.allowedShortfall();
        List<CharacteristicGrade> grades = new ArrayList<>();
        Verdict part = Verdict.DEMONSTRATED;
        for (int c = 0; c < plan.characteristics().size(); c++) {
            int ci = c;
            CharacteristicGrade g = decidedEarlier(plan, data, ci, look).orElseGet(() -> CharacteristicGrader.grade(
                    plan.characteristics().get(ci), plan.design(), plan.interval(), data.finish(ci, slotsSoFar, allowed), look));
            grades.add(g);
            part = part.worse(g.verdict());
        }
        return new GradeResult(plan.id(), plan.revision(), display, data.problems(), grades, part, look);
    }

    /**
     * A characteristic an earlier look already decided: the planned looks are replayed on the readings up to each
     * one, and the first that says demonstrated or stops the study for futility is its grade — as it would have been
     * had the file been sent back there (a later look neither takes back an early pass nor gives a second chance
     * after a stop). Empty when no earlier look decided it, or the plan is single-stage.
     */
    private static Optional<CharacteristicGrade> decidedEarlier(GradingPlan plan, ReturnedData data, int c,
            Optional<GradedLook> graded) {
        if (graded.isEmpty()) {
            return Optional.empty();
        }
        for (int i = 1; i < graded.get().number(); i++) {
            int m = plan.stages().orElseThrow().looks().get(i - 1).subgroups();
            GradedLook at = look(plan, m);
            // replayed: no "furthest look" or "later slots" notes, which speak of the file, not of this look
            GradedLook earlier = new GradedLook(at.number(), at.look(), at.stages(), at.endSlot(), at.nextFrom(),
                    at.nextTo(), List.of(), true, 0, at.reachSlot());
            CharacteristicGrade g = CharacteristicGrader.grade(plan.characteristics().get(c), plan.design(),
                    plan.interval(), data.replay(c, m, GradingPlan.defaultAllowedShortfall(m)), Optional.of(earlier));
            if (g.verdict() == Verdict.DEMONSTRATED || g.verdict() == Verdict.NOT_DEMONSTRATED) {
                List<Reason> reasons = new ArrayList<>(List.of(new Reason(Step.COMPLETENESS, false,
                        GradeMessage.REASON_DECIDED_EARLIER.format(i, earlier.of(), earlier.endSlot(), graded.get().number()))));
                reasons.addAll(g.reasons());
                return Optional.of(new CharacteristicGrade(g.id(), g.name(), g.unit(), g.limits(), g.requirement(),
                        g.completeness(), g.subgroups(), g.slots(), g.stability(), g.shape(), g.judged(), g.capability(),
                        g.verdict(), reasons, g.additionalSubgroups(), g.look()));
            }
        }
        return Optional.empty();
    }

    /**
     * The look a staged return is graded at: the furthest planned look whose last slot it reaches, or look 1 when
     * it reaches none; with the looks it went past and the slots it holds beyond the one graded.
     *
     * @param reach the planned slots up to the last one that came back with a reading ({@link ReturnedData#reach})
     */
    static GradedLook look(GradingPlan plan, int reach) {
        Stages stages = plan.stages().orElseThrow();
        List<Look> looks = stages.looks();
        int j = 0;
        for (int i = 0; i < looks.size(); i++) {
            if (looks.get(i).subgroups() <= reach) {
                j = i;
            }
        }
        Look at = looks.get(j);
        boolean reached = at.subgroups() <= reach;
        List<Integer> skipped = new ArrayList<>();
        for (int i = 0; i < j; i++) {
            skipped.add(i + 1);
        }
        List<PlannedSlot> slots = plan.slots();
        Optional<String> nextFrom = Optional.empty();
        Optional<String> nextTo = Optional.empty();
        if (j + 1 < looks.size()) {
            nextFrom = Optional.of(slots.get(at.subgroups()).id());
            nextTo = Optional.of(slots.get(looks.get(j + 1).subgroups() - 1).id());
        }
        return new GradedLook(j + 1, at, stages, slots.get(at.subgroups() - 1).id(), nextFrom, nextTo, skipped, reached,
                Math.max(0, reach - at.subgroups()), reach == 0 ? Optional.empty() : Optional.of(slots.get(reach - 1).id()));
    }
}
