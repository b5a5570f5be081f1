package dev.proofrun.app.handout;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.UsesToolkit;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.DraftSnapshot;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.sizing.SizingViewModel;
import dev.proofrun.app.timing.TimingViewModel;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issuing writes the plan file in the background: the revision appears when the file is written, edits
 * made meanwhile stay unsaved and autosaved, and a failed write is said inline.
 */
@UsesToolkit
class HandoutViewModelTest {

    /** Holds the submitted jobs until {@link #runAll()}: "the file is being written" for as long as we like. */
    private static final class Held implements Background {
        private final List<Runnable> jobs = new ArrayList<>();

        @Override
        public <T> Job submit(Callable<T> work, Consumer<T> done, Consumer<Throwable> failed) {
            jobs.add(() -> Background.inline().submit(work, done, failed));
            return () -> { };
        }

        void runAll() {
            List<Runnable> now = new ArrayList<>(jobs);
            jobs.clear();
            now.forEach(Runnable::run);
        }

        int waiting() {
            return jobs.size();
        }
    }

    @TempDir
    Path home;

    private final Held files = new Held();
    private Session session;
    private HandoutViewModel vm;
    private Path planFile;

    private void openDemo() {
        session = new Session(new AppHome(home, home.resolve("plans")));
        // built before the plan is opened, as the wizard does
        GoalViewModel goal = new GoalViewModel(session.draft(), session.baseProperty());
        SizingViewModel sizing = new SizingViewModel(session.draft(), goal, Background.inline());
        TimingViewModel timing = new TimingViewModel(session.draft(), sizing.designBinding(), Background.inline());
        // previews are not drawn here (they need the toolkit): their jobs are held and never run
        vm = new HandoutViewModel(session, goal, sizing, timing, new Held(), files);
        planFile = session.demoFile();
        session.open(planFile);
        // a change to the issued demo plan, so that issuing makes a new revision
        session.draft().field(DraftField.SEED).set("20270405");
        assertTrue(vm.composedBinding().get().plan().isPresent(), vm.missingProperty().get());
        assertTrue(vm.issuedNow().isEmpty());
    }

    @Test
    void theRevisionAppearsWhenTheFileIsWritten() {
        openDemo();
        String before = session.base().orElseThrow().revision().orElseThrow();
        assertTrue(vm.issue());
        assertTrue(vm.issuingProperty().get());
        assertEquals(1, files.waiting());
        assertTrue(vm.messageProperty().get().startsWith("Issuing the plan"), vm.messageProperty().get());
        assertEquals(before, session.base().orElseThrow().revision().orElseThrow(), "nothing issued yet");
        assertFalse(vm.issue(), "a second issue is refused while the first is written");

        files.runAll();
        assertFalse(vm.issuingProperty().get());
        StudyPlan issued = session.base().orElseThrow();
        assertNotEquals(before, issued.revision().orElseThrow());
        assertEquals(before, issued.supersedes().orElseThrow());
        assertEquals(issued.revision(), PlanFiles.read(planFile).revision(), "the file holds the new revision");
        assertFalse(session.draft().dirtyProperty().get());
        assertTrue(vm.issuedNow().isPresent());
        // the demo plan is revision 1; the change issued is revision 2, said beside its fingerprint
        assertEquals(2, issued.revisionNumber());
        assertEquals(2, PlanFiles.read(planFile).revisionNumber(), "the file holds the number");
        assertEquals("Issued as revision 2 (" + issued.revision().orElseThrow() + ")", vm.stateBinding().get());
        assertTrue(vm.completeBinding().get());
    }

    @Test
    void aThresholdTypedInThePartTableIsInTheIssuedPlanFile() {
        openDemo();
        var d1 = session.draft().characteristics().get(0);
        String id = d1.id();
        d1.cell(dev.proofrun.app.session.CharacteristicField.SHAPE).set("lognormal3");
        assertTrue(vm.composedBinding().get().plan().isEmpty(), "a threshold shape without its threshold is not composed");
        assertTrue(vm.missingProperty().get().contains("the lognormal3 shape needs a threshold"), vm.missingProperty().get());
        // an invented stop 0.25 below the lower limit
        double theta = session.base().orElseThrow().characteristic(id).orElseThrow().limits().lower().getAsDouble() - 0.25;
        d1.cell(dev.proofrun.app.session.CharacteristicField.THRESHOLD).set(Double.toString(theta));
        assertTrue(vm.composedBinding().get().plan().isPresent(), vm.missingProperty().get());
        assertTrue(vm.issue());
        files.runAll();
        var written = PlanFiles.read(planFile).characteristic(id).orElseThrow();
        assertEquals(dev.proofrun.stats.ShapeFamily.LOGNORMAL3, written.shape());
        assertEquals(java.util.OptionalDouble.of(theta), written.threshold());
    }

    @Test
    void anEditMadeWhileTheFileIsWrittenIsKept() {
        openDemo();
        assertTrue(vm.issue());
        session.draft().field(DraftField.COLLECTOR).set("Night shift lead");
        files.runAll();
        StudyPlan issued = session.base().orElseThrow();
        assertTrue(issued.isIssued());
        assertTrue(session.draft().dirtyProperty().get(), "the edit is not in the file, so the draft is unsaved");
        DraftSnapshot kept = session.drafts().newerDraft(planFile).orElseThrow();
        assertEquals("Night shift lead", kept.fields().get(DraftField.COLLECTOR.name()), "and it is autosaved");
        assertTrue(vm.issuedNow().isEmpty());
        assertTrue(vm.stateBinding().get().startsWith("Changed since revision 2 (" + issued.revision().orElseThrow() + ") was issued: issue it again to make revision 3"),
                vm.stateBinding().get());
    }

    @Test
    void aFailedWriteIsSaidInlineAndChangesNothing() throws Exception {
        openDemo();
        Path notAFolder = Files.writeString(home.resolve("blocker"), "a file, not a folder");
        session.draft().planFileProperty().set(notAFolder.resolve("plan.json"));
        String before = session.base().orElseThrow().revision().orElseThrow();
        assertTrue(vm.issue());
        files.runAll();
        assertFalse(vm.issuingProperty().get());
        assertFalse(vm.messageProperty().get().startsWith("Issued"), vm.messageProperty().get());
        assertFalse(vm.messageProperty().get().isBlank());
        assertEquals(before, session.base().orElseThrow().revision().orElseThrow());
        assertTrue(session.draft().dirtyProperty().get());
    }

    @Test
    void aDraftCanBeExportedMarkedDraftAndTheIssuedPlanAsItIs() throws Exception {
        session = new Session(new AppHome(home, home.resolve("plans")));
        GoalViewModel goal = new GoalViewModel(session.draft(), session.baseProperty());
        SizingViewModel sizing = new SizingViewModel(session.draft(), goal, Background.inline());
        TimingViewModel timing = new TimingViewModel(session.draft(), sizing.designBinding(), Background.inline());
        Held exports = new Held();
        vm = new HandoutViewModel(session, goal, sizing, timing, exports, files);
        session.open(session.demoFile());
        assertTrue(vm.exportableBinding().get());
        assertEquals("_Export PDF, CSV and XLSX", vm.exportLabelBinding().get(), "the demo is issued as it stands");

        session.draft().field(DraftField.SEED).set("20270405"); // changed: a draft until issued again
        assertTrue(vm.issuedNow().isEmpty());
        assertTrue(vm.exportableBinding().get(), "a complete draft can be exported");
        assertEquals("_Export the DRAFT sheet and files", vm.exportLabelBinding().get());
        Path out = home.resolve("draft-out");
        assertTrue(vm.export(out));
        exports.runAll();
        assertTrue(vm.messageProperty().get().startsWith("Written to " + out + ", marked DRAFT on every page"),
                vm.messageProperty().get());
        String id = session.base().orElseThrow().id();
        String text;
        try (org.apache.pdfbox.pdmodel.PDDocument doc = org.apache.pdfbox.Loader.loadPDF(out.resolve(id + "-sheet.pdf").toFile())) {
            text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
        }
        assertTrue(text.contains("DRAFT"), "the sheet is marked DRAFT");
        assertTrue(Files.readString(out.resolve(id + "-fill-in.csv")).contains(id + "@draft"),
                "the fill-in file names no revision");

        session.draft().field(DraftField.SEED).set("");  // incomplete: nothing to export
        assertFalse(vm.exportableBinding().get());
        assertFalse(vm.export(out));
    }

    /**
     * A staged plan (made by {@code plan new --stages}) opened in the wizard keeps its looks while the steps
     * describe it as issued; a change that its looks were not calibrated for has the looks planned again by the
     * Sample-size step, never issued without them.
     */
    @Test
    void aStagedPlanKeepsItsLooksAndAChangeToWhatTheyRestOnPlansThemAgain() {
        Path staged = home.resolve("staged.json");
        java.io.StringWriter out = new java.io.StringWriter();
        assertEquals(0, dev.proofrun.cli.ProofrunCommand.run(new java.io.PrintWriter(out, true),
                new java.io.PrintWriter(out, true), "plan", "new", "--out", staged.toString(), "--id", "PR-2027-0078",
                "--part", "pump housing", "--characteristic", "seal bore", "--unit", "mm", "--lsl", "31.98", "--usl",
                "32.02", "--target", "1.33", "--expected", "1.67", "--stages", "2", "--spending", "obrien-fleming",
                "--start", "2027-04-05T06:00",
                "--span-days", "5", "--rate", "60", "--zone", "Europe/Berlin"), out.toString());
        assertEquals(0, dev.proofrun.cli.ProofrunCommand.run(new java.io.PrintWriter(out, true),
                new java.io.PrintWriter(out, true), "plan", "issue", staged.toString()), out.toString());
        StudyPlan issued = PlanFiles.read(staged);
        session = new Session(new AppHome(home, home.resolve("plans")));
        GoalViewModel goal = new GoalViewModel(session.draft(), session.baseProperty());
        SizingViewModel sizing = new SizingViewModel(session.draft(), goal, Background.inline());
        TimingViewModel timing = new TimingViewModel(session.draft(), sizing.designBinding(), Background.inline());
        vm = new HandoutViewModel(session, goal, sizing, timing, new Held(), files);
        session.open(staged);
        StudyPlan composed = vm.composedBinding().get().plan().orElseThrow(() -> new AssertionError(vm.missingProperty().get()));
        assertEquals(issued.stages(), composed.stages(), "the looks are carried over");
        assertEquals(issued, vm.issuedNow().orElseThrow(), "the steps describe the issued plan, looks and all");

        assertEquals("2", session.draft().text(DraftField.STAGES), "reopening restores the looks chosen");
        assertEquals("obrien-fleming", session.draft().text(DraftField.SPENDING));

        // a change the looks were calibrated for: the Sample-size step plans them again, as plan new --stages
        // --subgroups K would for the changed characteristic (K kept from the plan file)
        session.draft().field(DraftField.MINIMUM).set("1.50");
        StudyPlan changed = vm.composedBinding().get().plan().orElseThrow(
                () -> new AssertionError(vm.composedBinding().get().problem()));
        assertEquals(issued.design(), changed.design());
        dev.proofrun.design.Stages expected = dev.proofrun.plan.PlannedStages.of(changed.characteristics(),
                changed.design(), true, 0.90, 2, dev.proofrun.design.Spending.OBRIEN_FLEMING).stages();
        assertEquals(java.util.Optional.of(expected), changed.stages(), "never issued without its looks");
        assertNotEquals(issued.stages(), changed.stages(), "calibrated for the new requirement");
    }
}
