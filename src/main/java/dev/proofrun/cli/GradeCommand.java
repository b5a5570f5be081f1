package dev.proofrun.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeMessage;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Grader;
import dev.proofrun.grade.GradingPlan;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.Problem;
import dev.proofrun.grade.Reason;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Paper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code proofrun grade PLAN.json DATA.(csv|xlsx) [--json] [--report FILE.pdf [--paper a4|letter]] [--require-demonstrated]}.
 * Exit 0 when graded (whatever the verdict), 1 with {@code --require-demonstrated} when a characteristic is
 * not demonstrated, 2 for unusable input.
 */
@Command(name = "grade", mixinStandardHelpOptions = true,
        description = "Grade returned readings against their plan: completeness, stability, shape, capability, verdict.",
        footer = {"",
            "DATA in the fill-in form: the CSV or XLSX that 'sheet' writes, one row per",
            "slot and characteristic, the readings in columns x1, x2 and on up to xn.",
            "",
            "DATA in a gauge's long form (CSV): one reading per row, with the header",
            "  plan,slot,characteristic,taken,value",
            "for example",
            "  PR-2027-0311@0123456789ab,S01,D1,2027-03-01 06:03,22.004",
            "  PR-2027-0311@0123456789ab,S01,D1,2027-03-01 06:03,22.006",
            "The rows of one slot and characteristic, in file order, are its subgroup;",
            "the time of its first row is the time it was taken. The plan and taken",
            "columns may be left out; columns may come in any order, in any case.",
            "",
            "Cells are separated by ',' or ';' (whichever the header has more of). In a",
            "';' file a comma is a decimal mark, in a ',' file only inside quotes; the",
            "result says how many readings were read with a decimal comma. Thousands",
            "separators are never read."})
public final class GradeCommand implements Callable<Integer> {

    /** Exit code when --require-demonstrated and something is not demonstrated. */
    public static final int EXIT_NOT_DEMONSTRATED = 1;
    private static final int LISTED_PROBLEMS = 20;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PLAN.json", description = "The issued plan.")
    Path planFile;

    @Parameters(index = "1", paramLabel = "DATA", description = "The returned fill-in file (.csv or .xlsx) or a gauge's long-form CSV.")
    Path dataFile;

    @Mixin
    JsonOption output;

    @Option(names = "--report", paramLabel = "FILE.pdf", description = "Also write the grade report as PDF.")
    Path report;

    @Mixin
    PaperOption paper;

    @Option(names = "--require-demonstrated", description = "Exit 1 unless every characteristic is demonstrated"
            + " (at a staged plan's look, 'continue' exits 1 too).")
    boolean requireDemonstrated;

    @Override
    public Integer call() {
        Paper size = Paper.of(paper.paper); // refused before anything is read or written
        // the plan's revision is checked while the returned file is read; the check speaks first, as before
        PlanFiles.Pending pending = PlanFiles.readPending(planFile);
        StudyPlan plan = pending.plan();
        if (!plan.isIssued()) { // a draft has no revision to check: nothing was pending
            throw new UserException(Location.file(planFile.toString()), GradeMessage.PLAN_NOT_ISSUED);
        }
        GradeResult result;
        try {
            GradingPlan gp = GradingPlans.of(plan);
            result = Grader.grade(gp, dataFile, dataFile.toString());
        } catch (RuntimeException e) {
            pending.confirm();
            throw e;
        }
        pending.confirm();
        PrintWriter out = spec.commandLine().getOut();
        if (report != null) {
            GradeReports.write(result, plan, report, size);
        }
        if (output.json) {
            try {
                out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(GradeJson.of(result, plan)));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        } else {
            text(result, plan, out);
        }
        if (report != null) {
            // stdout stays one JSON object with --json; the note then goes to stderr
            PrintWriter note = output.json ? spec.commandLine().getErr() : out;
            note.println("Wrote the grade report " + report);
            note.flush();
        }
        out.flush();
        return requireDemonstrated && !result.allDemonstrated() ? EXIT_NOT_DEMONSTRATED : 0;
    }

    static void text(GradeResult r, StudyPlan plan, PrintWriter out) {
        out.printf(Locale.ROOT, "Plan %s, %s, file %s%n", r.planId(), plan.revisionWords(), r.file());
        out.printf(Locale.ROOT, "Part verdict: %s%n", r.verdict().words()); // words as on paper; ids in --json
        r.look().ifPresent(l -> out.println(l.line(r.verdict())));
        for (CharacteristicGrade g : r.characteristics()) {
            out.println();
            out.printf(Locale.ROOT, "%s %s: %s%n", g.id(), g.name(), g.verdict().words());
            if (g.judged() != null && g.verdict() != dev.proofrun.grade.Verdict.NOT_VALID) {
                out.println("  " + g.judged().summary() + ".");
            }
            for (Reason reason : g.reasons()) {
                out.println("  - " + reason.text());
            }
        }
        if (!r.problems().isEmpty()) {
            out.println();
            out.printf(Locale.ROOT, "Problems in the file (%d):%n", r.problems().size());
            r.problems().stream().limit(LISTED_PROBLEMS).forEach((Problem p) -> out.println("  " + p));
            if (r.problems().size() > LISTED_PROBLEMS) {
                out.printf(Locale.ROOT, "  ... %d more (all of them with --json)%n", r.problems().size() - LISTED_PROBLEMS);
            }
        }
        out.println();
        out.println(r.caution());
    }
}
