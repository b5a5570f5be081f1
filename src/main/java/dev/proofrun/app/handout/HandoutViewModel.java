package dev.proofrun.app.handout;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.PlanBridge;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.app.sizing.SizingViewModel;
import dev.proofrun.app.timing.TimingViewModel;
import dev.proofrun.design.Design;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.PlanState;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.sheet.SheetFiles;
import dev.proofrun.sheet.SheetPdf;
import dev.proofrun.paper.Paper;
import dev.proofrun.text.UserException;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.ObjectBinding;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.image.Image;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;

/**
 * Issues the plan (the core fingerprints it and the file is written), previews the collection sheet
 * (the core writes the PDF, PDFBox renders its pages in a JavaFX Task, see {@link Background}), exports the three files and
 * opens the PDF with the system viewer.
 */
public final class HandoutViewModel extends StepViewModel {

    private static final float PREVIEW_DPI = 60f;
    private final Session session;
    private final GoalViewModel goal;
    private final SizingViewModel sizing;
    private final TimingViewModel timing;
    private final ObjectBinding<Composed> composed;
    private final ObjectProperty<Paper> paper = new SimpleObjectProperty<>(this, "paper", Paper.A4);
    private final ObservableList<Image> pages = FXCollections.observableArrayList();
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final BooleanProperty exporting = new SimpleBooleanProperty(this, "exporting", false);
    private final BooleanProperty issuing = new SimpleBooleanProperty(this, "issuing", false);
    private final StringProperty message = new SimpleStringProperty(this, "message", "");
    private final ObjectProperty<SheetFiles.Written> exported = new SimpleObjectProperty<>(this, "exported");
    private final StringBinding state;
    private final ObjectBinding<Optional<StudyPlan>> issued;
    private Consumer<String> opener = uri -> { };
    private final Background background;
    private final Background files;
    private Background.Job preview;
    private long generation;

    /** The plan the steps describe now, or why there is none. */
    public record Composed(Optional<StudyPlan> plan, String problem) {
    }

    /**
     * @param background renders the sheet preview and writes the exported files
     * @param files      issues and writes the plan file (apart, so an issue does not wait for a preview)
     */
    public HandoutViewModel(Session session, GoalViewModel goal, SizingViewModel sizing, TimingViewModel timing,
            Background background, Background files) {
        this.session = session;
        this.background = background;
        this.files = files;
        this.goal = goal;
        this.sizing = sizing;
        this.timing = timing;
        composed = Bindings.createObjectBinding(this::compose, session.draft().editsProperty(), sizing.designBinding(),
                timing.scheduleChanges(), timing.busyProperty(), goal.requirementBinding(), session.baseProperty());
        issued = Bindings.createObjectBinding(this::computeIssued, composed, session.baseProperty());
        state = Bindings.createStringBinding(this::describeState, issued, session.baseProperty());
        bindMissing(Bindings.createStringBinding(() -> {
            Composed c = composed.get();
            if (c.plan().isEmpty()) {
                return c.problem().isEmpty() ? AppMessage.HANDOUT_EARLIER.format() : c.problem();
            }
            return issued.get().isPresent() ? "" : AppMessage.HANDOUT_ISSUE.format();
        }, composed, issued, session.baseProperty()));
        // a new base (another plan, or a new revision) makes the exported files someone else's; no listener
        // on the composed plan itself, which would compose and fingerprint it on every edit of any step
        session.baseProperty().addListener((o, a, b) -> exported.set(null));
        session.openedProperty().addListener((o, a, b) -> {
            exported.set(null);
            message.set("");
        });
    }

    @Override
    public String title() {
        return AppMessage.STEP_HANDOUT.english();
    }

    @Override
    public String hint() {
        return AppMessage.STEP_HANDOUT_HINT.english();
    }

    @Override
    public void entered() {
        refreshPreview();
    }

    /** How the PDF is opened (the window passes HostServices.showDocument). */
    public void setOpener(Consumer<String> opener) {
        this.opener = opener;
    }

    public ObjectProperty<Paper> paperProperty() {
        return paper;
    }

    public ObservableList<Image> pages() {
        return pages;
    }

    public BooleanProperty busyProperty() {
        return busy;
    }

    public StringProperty messageProperty() {
        return message;
    }

    public ObjectProperty<SheetFiles.Written> exportedProperty() {
        return exported;
    }

    /** "Issued as revision 3f2a9c01b7de", "Draft, not issued", "Changed since revision … was issued". */
    public StringBinding stateBinding() {
        return state;
    }

    public ObjectBinding<Composed> composedBinding() {
        return composed;
    }

    /** The issued plan when the file's issued plan is exactly what the steps describe. */
    public Optional<StudyPlan> issuedNow() {
        return issued.get();
    }

    /** {@link #issuedNow()} as a binding for the view. */
    public ObjectBinding<Optional<StudyPlan>> issuedBinding() {
        return issued;
    }

    /**
     * The base, when it is issued and the steps describe exactly it. Equal plans have equal fingerprints, so
     * a plan equal to the base (apart from state and revision) needs no fingerprint; otherwise the
     * fingerprint is taken once per distinct plan (the rail asks on every edit of any step, and most edits
     * leave the plan as it was or return to it).
     */
    private Optional<StudyPlan> computeIssued() {
        StudyPlan base = session.baseProperty().get();
        Optional<StudyPlan> now = composed.get().plan();
        if (base == null || !base.isIssued() || now.isEmpty()) {
            return Optional.empty();
        }
        StudyPlan same = withSupersedes(now.get(), base.supersedes());
        if (same.equals(withSupersedes(base, base.supersedes()))) {
            return Optional.of(base);
        }
        return fingerprintOf(same).equals(base.revision().orElse("")) ? Optional.of(base) : Optional.empty();
    }

    private StudyPlan fingerprinted;
    private String fingerprint;

    private String fingerprintOf(StudyPlan plan) {
        if (!plan.equals(fingerprinted)) {
            fingerprint = PlanFiles.fingerprint(plan);
            fingerprinted = plan;
        }
        return fingerprint;
    }

    private static StudyPlan withSupersedes(StudyPlan p, Optional<String> supersedes) {
        return new StudyPlan(p.id(), p.part(), p.people(), p.characteristics(), p.calendar(), p.span(), p.design(),
                p.spacing(), p.seed(), p.schedule(), PlanState.DRAFT, Optional.empty(), supersedes);
    }

    /** The folder exports go to by default: beside the plan file, else the plans folder. */
    public Path exportFolder() {
        Path f = session.draft().planFileProperty().get();
        return f != null ? f.toAbsolutePath().getParent() : session.home().plansFolder();
    }

    private Composed compose() {
        Optional<Design> design = sizing.designBinding().get();
        Optional<dev.proofrun.design.Requirement> req = goal.requirementBinding().get();
        if (design.isEmpty() || req.isEmpty() || timing.calendarBinding().get().isEmpty()
                || timing.spanBinding().get().isEmpty() || timing.spacing().isEmpty() || timing.seed().isEmpty()
                || timing.busyProperty().get() || timing.schedule().isEmpty()) {
            return new Composed(Optional.empty(), "");
        }
        List<String> lacking = new ArrayList<>();
        for (CharacteristicDraft row : session.draft().characteristics()) {
            if (goal.expectationFor(row).isEmpty() || row.limits().isEmpty()) {
                lacking.add(row.id());
            }
        }
        if (!lacking.isEmpty()) {
            return new Composed(Optional.empty(), AppMessage.HANDOUT_NO_EXPECTATION.format(String.join(", ", lacking)));
        }
        try {
            StudyPlan p = PlanBridge.compose(session.draft(), session.base(), req.get(),
                    row -> goal.expectationFor(row).orElseThrow(), timing.calendarBinding().get().get(),
                    timing.spanBinding().get().get(), design.get(), timing.spacing().get(), timing.seed().get(),
                    timing.schedule().get());
            return new Composed(Optional.of(p), "");
        } catch (UserException | IllegalArgumentException | java.util.NoSuchElementException e) {
            return new Composed(Optional.empty(), e.getMessage());
        }
    }

    private String describeState() {
        StudyPlan base = session.baseProperty().get();
        if (issuedNow().isPresent()) {
            return AppMessage.HANDOUT_ISSUED.format(base.revision().orElse(""));
        }
        if (base != null && base.isIssued()) {
            return AppMessage.HANDOUT_CHANGED.format(base.revision().orElse(""));
        }
        return AppMessage.HANDOUT_DRAFT.format();
    }

    /**
     * Issues what the steps describe and writes it to the plan file; for a new plan the user is asked where
     * ({@link Session#choosePlanFile}, offering {@code <id>.json} in the user's plans folder). A changed issued plan becomes a new revision that supersedes the old one.
     *
     * <p>The fingerprint and the synced write run in the background ({@link #issuingProperty()} is true
     * meanwhile); the revision appears when the file is written, and a failure is said in
     * {@link #messageProperty()}. Edits made meanwhile are kept as unsaved (see {@link Session#adopt}); if
     * another plan was opened meanwhile, only the message tells where the issued plan went.
     *
     * @return true when the issue was started (or the plan is already issued as it stands)
     */
    public boolean issue() {
        if (issuing.get()) {
            return false;
        }
        Optional<StudyPlan> now = composed.get().plan();
        if (now.isEmpty()) {
            message.set(getMissing());
            return false;
        }
        if (issuedNow().isPresent()) {
            message.set(AppMessage.HANDOUT_ALREADY.format(issuedNow().get().revision().orElse("")));
            return true;
        }
        StudyPlan base = session.baseProperty().get();
        StudyPlan draft = base != null && base.isIssued() ? withSupersedes(now.get(), base.revision()) : now.get();
        Path planFile = session.draft().planFileProperty().get();
        Optional<Path> chosen = planFile != null ? Optional.of(planFile)
                : session.choosePlanFile(session.home().plansFolder().resolve(draft.id() + ".json"));
        if (chosen.isEmpty()) {
            message.set(AppMessage.HANDOUT_NOT_SAVED.format());
            return false;
        }
        Path file = chosen.get();
        int editsAtStart = session.draft().editsProperty().get();
        int openedAtStart = session.openedCount();
        issuing.set(true);
        message.set(AppMessage.HANDOUT_ISSUING.format(file.getFileName()));
        files.submit(() -> {
            StudyPlan issued = PlanFiles.issue(draft);
            return new Written(session.write(file, issued), issued);
        }, w -> {
            issuing.set(false);
            String revision = w.plan().revision().orElse("");
            if (session.openedCount() != openedAtStart) {
                message.set(AppMessage.HANDOUT_ISSUED_ELSEWHERE.format(revision, w.file()));
                return;
            }
            session.adopt(w.file(), w.plan(), session.draft().editsProperty().get() != editsAtStart);
            message.set(AppMessage.HANDOUT_ISSUED_NOW.format(revision, w.file().getFileName()));
            refreshPreview();
        }, ex -> {
            issuing.set(false);
            message.set(AppMessage.HANDOUT_ISSUE_FAILED.failure(ex));
        });
        return true;
    }

    private record Written(Path file, StudyPlan plan) {
    }

    /**
     * Save as…: writes the plan as it stands (the issued plan when the steps describe it, else the draft
     * plan) to a file the user chooses, in the background; the draft then belongs to that file. Nothing is
     * written when the user chooses nothing or the plan is incomplete.
     *
     * @return true when the write was started
     */
    public boolean saveAs() {
        if (issuing.get()) {
            return false;
        }
        Optional<StudyPlan> plan = issuedNow().or(() -> composed.get().plan());
        if (plan.isEmpty()) {
            message.set(getMissing());
            return false;
        }
        Optional<Path> chosen = session.choosePlanFile(exportFolder().resolve(plan.get().id() + ".json"));
        if (chosen.isEmpty()) {
            message.set(AppMessage.HANDOUT_NOT_SAVED.format());
            return false;
        }
        StudyPlan p = plan.get();
        int editsAtStart = session.draft().editsProperty().get();
        int openedAtStart = session.openedCount();
        issuing.set(true);
        message.set(AppMessage.HANDOUT_SAVING.format(chosen.get().getFileName()));
        files.submit(() -> session.write(chosen.get(), p), written -> {
            issuing.set(false);
            if (session.openedCount() != openedAtStart) {
                return;
            }
            session.adopt(written, p, session.draft().editsProperty().get() != editsAtStart);
            message.set(AppMessage.HANDOUT_SAVED_AS.format(written));
        }, ex -> {
            issuing.set(false);
            message.set(AppMessage.HANDOUT_SAVE_FAILED.failure(ex));
        });
        return true;
    }

    /** True while the plan is being issued and written. */
    public BooleanProperty issuingProperty() {
        return issuing;
    }

    private String getMissing() {
        return missingProperty().get();
    }

    /**
     * Writes the sheet PDF and both fill-in files of the issued plan into the folder, in the background
     * (the PDF and the workbook take a second or more on a cold start). {@link #exportedProperty()} is set
     * when they are written; {@link #exportingProperty()} is true meanwhile.
     */
    public boolean export(Path dir) {
        Optional<StudyPlan> issued = issuedNow();
        if (issued.isEmpty()) {
            message.set(AppMessage.HANDOUT_ISSUE.format());
            return false;
        }
        StudyPlan plan = issued.get();
        Paper size = paper.get();
        exporting.set(true);
        exported.set(null);
        message.set(AppMessage.HANDOUT_EXPORTING.format(dir));
        int openedAtStart = session.openedCount();
        background.submit(() -> SheetFiles.write(plan, dir, size, false), w -> {
            exporting.set(false);
            if (session.openedCount() != openedAtStart) {
                return; // written for a plan no longer on the desk: nothing of it shows under this one
            }
            exported.set(w);
            message.set(AppMessage.HANDOUT_EXPORTED.format(dir, w.pdf().getFileName(), w.csv().getFileName(),
                    w.xlsx().getFileName()));
        }, ex -> {
            exporting.set(false);
            if (session.openedCount() == openedAtStart) {
                message.set(AppMessage.HANDOUT_EXPORT_FAILED.failure(ex));
            }
        });
        return true;
    }

    /** {@link #export(Path)} into the folder typed by the user; a name that is no path is said inline. */
    public boolean exportTo(String folderText) {
        String text = folderText == null ? "" : folderText.trim();
        if (text.isEmpty()) {
            message.set(AppMessage.HANDOUT_NO_FOLDER.format());
            return false;
        }
        try {
            return export(Path.of(text));
        } catch (java.nio.file.InvalidPathException e) {
            message.set(AppMessage.HANDOUT_BAD_FOLDER.format(text));
            return false;
        }
    }

    /** True while the three files are being written. */
    public BooleanProperty exportingProperty() {
        return exporting;
    }

    /** Opens the exported PDF with the system's viewer. */
    public boolean openPdf() {
        SheetFiles.Written w = exported.get();
        if (w == null) {
            return false;
        }
        opener.accept(w.pdf().toUri().toString());
        return true;
    }

    /** Renders the sheet of the plan as it stands (issued or marked DRAFT) in the background. */
    public void refreshPreview() {
        if (preview != null) {
            preview.cancel();
        }
        long mine = ++generation;
        Optional<StudyPlan> plan = issuedNow().or(() -> composed.get().plan());
        if (plan.isEmpty()) {
            pages.clear();
            busy.set(false);
            return;
        }
        StudyPlan p = plan.get();
        Paper size = paper.get();
        busy.set(true);
        preview = background.submit(() -> {
            ByteArrayOutputStream bytes = new ByteArrayOutputStream();
            SheetPdf.write(p, size, bytes);
            List<Image> out = new ArrayList<>();
            try (PDDocument doc = Loader.loadPDF(bytes.toByteArray())) {
                PDFRenderer r = new PDFRenderer(doc);
                for (int i = 0; i < doc.getNumberOfPages() && !Thread.currentThread().isInterrupted(); i++) {
                    BufferedImage img = r.renderImageWithDPI(i, PREVIEW_DPI);
                    out.add(SwingFXUtils.toFXImage(img, null));
                }
            }
            return out;
        }, images -> {
            if (mine == generation) {
                pages.setAll(images);
                busy.set(false);
            }
        }, ex -> {
            if (mine == generation) {
                busy.set(false);
                message.set(AppMessage.HANDOUT_PREVIEW_FAILED.format(String.valueOf(ex.getMessage())));
            }
        });
    }
}
