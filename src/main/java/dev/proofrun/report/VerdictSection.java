package dev.proofrun.report;

import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.Problem;
import dev.proofrun.grade.Reason;
import dev.proofrun.grade.Step;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Block;
import dev.proofrun.paper.Flow;
import dev.proofrun.paper.Framed;
import dev.proofrun.paper.Item;
import dev.proofrun.paper.Paragraph;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.paper.TextTable;
import dev.proofrun.paper.TextTable.Column;
import dev.proofrun.paper.Typeface;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The first part of the report: the verdict and why, before any evidence. A framed box with the part's
 * verdict, one entry per characteristic with the reasons that decided it, and the caution as its last
 * line (once; later pages point back to it in their footnote); the block to sign; then the problems found
 * in the returned file. Verdicts carry their {@link VerdictBadge}.
 */
final class VerdictSection {

    /** Problems listed in full; the rest are counted. */
    static final int PROBLEMS_LISTED = 40;

    private final Typeface regular;
    private final Typeface bold;

    VerdictSection(Typeface regular, Typeface bold) {
        this.regular = regular;
        this.bold = bold;
    }

    static String gloss(Verdict v) {
        switch (v) {
            case DEMONSTRATED:
                return "the lower confidence bound reaches the requirement, and the evidence is complete, stable and fits its model";
            case CONTINUE:
                return "at this planned look the bound does not yet reach the requirement and the study did not stop: collect the next stage";
            case INCONCLUSIVE:
                return "the estimate reaches the requirement but its lower confidence bound does not yet";
            case NOT_DEMONSTRATED:
                return "the estimate itself is below the requirement";
            default:
                return "the evidence cannot carry a capability statement (incomplete, unstable or no fitting model)";
        }
    }

    void place(Flow flow, GradeResult result, StudyPlan plan, ReportStamp stamp) {
        flow.place(Paragraph.of("Grade of the capability study", bold, 16));
        flow.gap(3);
        flow.place(Paragraph.of("Part: " + ReportNumbers.name(plan.part().name()) + (plan.part().number().isBlank() ? "" : "   No. "
                + ReportNumbers.name(plan.part().number())), bold, 10));
        flow.place(Paragraph.of("Plan " + result.planId() + ", " + GradeReport.revision(result, plan) + ". Returned file: "
                + ReportNumbers.fileName(result.file()) + ".", regular, 9));
        flow.place(Paragraph.of(stamp.line() + ".", regular, 9));
        flow.gap(8);

        List<Block> box = new ArrayList<>();
        box.add(new VerdictBadge(result.verdict(), "for the part", bold, bold, 14));
        box.add(Block.space(2));
        box.add(Paragraph.of("The worst of its characteristics: " + gloss(result.verdict()) + ".", regular, 9));
        result.look().ifPresent(l -> box.add(Paragraph.of(l.line(result.verdict()), bold, 9)));
        box.add(Block.space(6));
        for (CharacteristicGrade g : result.characteristics()) {
            box.add(new VerdictBadge(g.verdict(), g.id() + "  " + ReportNumbers.name(g.name()) + headline(g), bold, bold, 9.5f));
            box.add(Block.space(1));
            for (Reason r : decisive(g)) {
                box.add(new Item("\u2013", new Paragraph(r.text(), regular, 9, 1.3f, 0), 10));
            }
            box.add(Block.space(4));
        }
        box.add(Block.space(2));
        box.add(Paragraph.of(result.caution(), regular, 8.5f));
        flow.place(new Framed(box, 8f, LineStyle.solid(1.4f), 0.96f));

        flow.gap(10);
        signing(flow);
        flow.gap(10);
        List<Problem> problems = result.problems();
        String count = problems.isEmpty() ? "No problems were found in the returned file."
                : String.format(Locale.ROOT, "%d problem%s found in the returned file%s.", problems.size(),
                        problems.size() == 1 ? " was" : "s were",
                        problems.size() > PROBLEMS_LISTED ? "; the first " + PROBLEMS_LISTED + " are listed" : "");
        flow.placeTogether(List.of(Paragraph.of("Problems in the returned file", bold, 11), Block.space(3),
                Paragraph.of(count, regular, 9)));
        if (!problems.isEmpty()) {
            flow.gap(4);
            TextTable t = TextTable.of(List.of(Column.left("Where", 3), Column.left("Severity", 1.2f),
                    Column.left("Problem", 6)), regular, bold, 8);
            flow.startTable(t.header());
            for (Problem p : problems.subList(0, Math.min(PROBLEMS_LISTED, problems.size()))) {
                flow.place(t.row(p.location().toString(), p.severity().token(), p.message()));
            }
            flow.endTable();
            if (problems.size() > PROBLEMS_LISTED) {
                flow.place(Paragraph.of("\u2026 and " + (problems.size() - PROBLEMS_LISTED)
                        + " more (proofrun grade --json lists them all).", regular, 8.5f));
            }
        }
    }

    /**
     * The block to sign: who prepared the grade and who reviewed it, each with name, date and signature. A
     * report without it is a printout; with it, it is a record someone stands behind.
     */
    private void signing(Flow flow) {
        TextTable t = TextTable.of(List.of(Column.left("", 2.2f), Column.left("Name", 3), Column.left("Date", 1.6f),
                Column.left("Signature", 3)), regular, bold, 9);
        flow.placeTogether(List.of(Paragraph.of("Sign-off", bold, 11), Block.space(3), t.header(),
                t.row(24f, List.of("Prepared by", "", "", "")), t.row(24f, List.of("Reviewed by", "", "", ""))));
    }

    private static String headline(CharacteristicGrade g) {
        if (g.judged() == null) {
            return "";
        }
        var e = g.judged();
        if (g.verdict() == Verdict.NOT_VALID) {
            // an estimate beside "Not valid" would be read as a capability statement; the reasons say why not
            return String.format(Locale.ROOT, " (%s \u2265 %s required; no capability statement)",
                    e.index().symbol(), ReportNumbers.index(e.required()));
        }
        return String.format(Locale.ROOT, " (%s \u2265 %s required: estimate %s, lower bound %s; %s model, %s)",
                e.index().symbol(), ReportNumbers.index(e.required()), ReportNumbers.index(e.estimate()), ReportNumbers.index(e.lower()),
                e.model().token(), e.method().words());
    }

    /**
     * The reasons that decided the verdict, and for an inconclusive one the capability step's follow-up (how
     * many more subgroups would settle it); the last reason when none is marked decisive.
     */
    static List<Reason> decisive(CharacteristicGrade g) {
        List<Reason> out = new ArrayList<>();
        for (Reason r : g.reasons()) {
            if (r.decisive() || (g.verdict() == Verdict.INCONCLUSIVE && r.step() == Step.CAPABILITY)) {
                out.add(r);
            }
        }
        if (out.isEmpty() && !g.reasons().isEmpty()) {
            out.add(g.reasons().get(g.reasons().size() - 1));
        }
        return out;
    }
}
