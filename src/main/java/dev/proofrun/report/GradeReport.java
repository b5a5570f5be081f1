package dev.proofrun.report;

import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.Gauge;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.paper.Flow;
import dev.proofrun.paper.PageHeading;
import dev.proofrun.paper.Pages;
import dev.proofrun.paper.Paper;
import dev.proofrun.text.AtomicFile;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Optional;

/**
 * The grade report PDF, written as an argument: first the verdict for the part and each characteristic
 * with the reasons that decided it and the caution ({@link VerdictSection}), then for each characteristic
 * the evidence in the order that matters ({@link EvidenceSection}): completeness, stability with its
 * control charts, shape with histogram and probability plot, capability with the bound against the
 * requirement and every index. Vector charts, black and white, fonts embedded (the sheet's toolkit).
 *
 * <p>As evidence for a customer's file every page names the part, the plan with its revision fingerprint, the
 * returned file by name (never the grading machine's folders), the part's verdict in words, and when and by
 * which version of the tool the grade was made ({@link ReportStamp}); page 1 carries a block to sign.
 */
public final class GradeReport {

    private GradeReport() {
    }

    /**
     * Writes the report to a stream (not closed).
     *
     * @param result the grade
     * @param plan   the plan it was graded against (part, nominal values)
     * @param paper  A4 or Letter
     * @param out    where to write
     */
    public static void write(GradeResult result, StudyPlan plan, Paper paper, OutputStream out) {
        write(result, plan, paper, ReportStamp.now(Clock.systemDefaultZone()), out);
    }

    /**
     * Writes the report to a stream (not closed), stamped with the given time and version.
     *
     * @param stamp when and by which version the grade was made
     */
    public static void write(GradeResult result, StudyPlan plan, Paper paper, ReportStamp stamp, OutputStream out) {
        PageHeading heading = new PageHeading(ReportNumbers.name(plan.part().name()),
                "Grade report: returned file " + ReportNumbers.fileName(result.file()),
                "Plan " + result.planId() + ", " + revision(result, plan),
                "Part verdict: " + result.verdict().words() + ". " + stamp.line()
                        + ". Not an approval; see page 1.",
                false);
        try (Pages pages = Pages.open(paper, heading)) {
            Flow flow = new Flow(pages);
            new VerdictSection(pages.regular(), pages.bold()).place(flow, result, plan, stamp);
            EvidenceSection evidence = new EvidenceSection(pages.regular(), pages.bold());
            for (CharacteristicGrade g : result.characteristics()) {
                Optional<Characteristic> c = plan.characteristic(g.id());
                double nominal = c.filter(x -> x.nominal().isPresent()).map(x -> x.nominal().getAsDouble())
                        .orElse(Double.NaN);
                double step = c.flatMap(Characteristic::gauge).map(Gauge::resolution).orElse(Double.NaN);
                evidence.place(flow, g, nominal, step);
            }
            pages.write(out);
        }
    }

    /**
     * The plan's revision as people say it, "revision 2 (3f2a9c01b7de)", when the plan given is the one graded
     * against; else the grade's fingerprint alone.
     */
    static String revision(GradeResult result, StudyPlan plan) {
        return plan.revision().map(result.revision()::equals).orElse(false) ? plan.revisionWords()
                : "revision " + result.revision();
    }

    /**
     * Writes the report to a file: to a temporary file beside it first, moved into place when complete.
     *
     * @throws UserException if the file cannot be written
     */
    public static void write(GradeResult result, StudyPlan plan, Paper paper, Path file) {
        Path dir = file.toAbsolutePath().getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            // said before anything is made: the temporary file's name would otherwise be the one reported
            throw new UserException(Location.file(file.toString()), ReportMessage.FOLDER_MISSING,
                    String.valueOf(file.getParent() == null ? dir : file.getParent()));
        }
        try {
            AtomicFile.write(file, out -> write(result, plan, paper, out));
        } catch (IOException | UncheckedIOException e) {
            throw new UserException(Location.file(file.toString()), ReportMessage.WRITE_FAILED, e.getMessage());
        }
    }
}
