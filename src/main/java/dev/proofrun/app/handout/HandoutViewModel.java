package dev.proofrun.app.handout;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.app.sizing.SizingViewModel;
import dev.proofrun.app.timing.TimingViewModel;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.sheet.SheetFiles;
import dev.proofrun.sheet.SheetPreview;
import dev.proofrun.paper.Paper;
import java.nio.file.Path;
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

/**
 * Issues the plan (the core fingerprints it and the file is written), previews the collection sheet
 * (the core writes the PDF, PDFBox renders its pages in a JavaFX Task, see {@link Background}), exports the three files and
 * opens the PDF with the system viewer.
 */
public final class HandoutViewModel extends StepViewModel {

    private static final float PREVIEW_DPI = 60f;
    private final Session session;
    private final ComposedPlan plans;
    private final PlanWrites writes;
    private final ObjectBinding<Composed> composed;
    private final ObservableList<String> papers = FXCollections.observableArrayList(paperNames());
    private final StringProperty paperChoice = new SimpleStringProperty(this, "paper", papers.get(0));
    private final ObservableList<Image> pages = FXCollections.observableArrayList();
    private final BooleanProperty busy = new SimpleBooleanProperty(this, "busy", false);
    private final BooleanProperty exporting = new SimpleBooleanProperty(this, "exporting", false);
    private final BooleanProperty issuing = new SimpleBooleanProperty(this, "issuing", false);
    private final StringProperty message = new SimpleStringProperty(this, "message", "");
    private final ObjectProperty<SheetFiles.Written> exported = new SimpleObjectProperty<>(this, "exported");
    private final StringBinding state;
    private final StringBinding exportLabel;
    private final javafx.beans.binding.BooleanBinding exportable;
    private final ObjectBinding<Optional<StudyPlan>> issued;
    private Consumer<String> opener = uri -> { };
    private final Background background;
    private final LatestJob preview;

    /** The plan the steps describe now, or why there is none. */
    public record Composed(Optional<StudyPlan> plan, String problem) {
    }

    /**
     * @param background renders the sheet preview and writes the exported files
     * @param files      issues and writes the plan file (apart, so an issue does not wait for a preview)
     */
    public HandoutViewModel(Session session, GoalViewModel goal, SizingViewModel sizing, TimingViewModel timing,
            Background background, Background files) {
        super(AppMessage.STEP_HANDOUT.english(), AppMessage.STEP_HANDOUT_HINT.english());
        this.session = session;
        this.background = background;
        this.preview = new LatestJob(background);
        plans = new ComposedPlan(session, goal, sizing, timing);
        writes = new PlanWrites(session, plans, files, issuing, message, this::getMissing, this::refreshPreview);
        composed = plans.composed();
        issued = plans.issued();
        paperChoice.addListener((o, a, b) -> refreshPreview());
        exportable = Bindings.createBooleanBinding(() -> issued.get().isPresent() || composed.get().plan().isPresent(),
                issued, composed);
        exportLabel = Bindings.createStringBinding(() -> (issued.get().isPresent() || !exportable.get()
                ? AppMessage.HANDOUT_EXPORT : AppMessage.HANDOUT_EXPORT_DRAFT).format(), issued, exportable);
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
    public void entered() {
        refreshPreview();
    }

    /** How the PDF is opened (the window passes HostServices.showDocument). */
    public void setOpener(Consumer<String> opener) {
        this.opener = opener;
    }

    /** The paper sizes offered, by name ("A4", "Letter"). */
    public ObservableList<String> papers() {
        return papers;
    }

    /** The paper chosen, one of {@link #papers()}; a change draws the preview again. */
    public StringProperty paperChoiceProperty() {
        return paperChoice;
    }

    private static List<String> paperNames() {
        return java.util.Arrays.stream(Paper.values()).map(HandoutViewModel::paperName).toList();
    }

    private static String paperName(Paper p) {
        String token = p.name();
        return token.length() <= 2 ? token : token.charAt(0) + token.substring(1).toLowerCase(java.util.Locale.ROOT);
    }

    private Paper paper() {
        for (Paper p : Paper.values()) {
            if (paperName(p).equals(paperChoice.get())) {
                return p;
            }
        }
        return Paper.A4;
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

    /** "Issued as revision 2 (3f2a9c01b7de)", "Draft of revision 1, not issued yet", "Changed since revision … was issued". */
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

    /** The folder exports go to by default: beside the plan file, else the plans folder. */
    public Path exportFolder() {
        Path f = session.draft().planFileProperty().get();
        return f != null ? f.toAbsolutePath().getParent() : session.home().plansFolder();
    }

    private String describeState() {
        StudyPlan base = session.baseProperty().get();
        if (issuedNow().isPresent()) {
            return AppMessage.HANDOUT_ISSUED.format(base.revisionWords());
        }
        if (base != null && base.isIssued()) {
            return AppMessage.HANDOUT_CHANGED.format(base.revisionWords(), base.revisionNumber() + 1);
        }
        return AppMessage.HANDOUT_DRAFT.format(base == null ? 1 : base.revisionNumber());
    }

    /**
     * Issues what the steps describe and writes it to the plan file, in the background; see
     * {@link PlanWrites#issue()}.
     *
     * @return true when the issue was started (or the plan is already issued as it stands)
     */
    public boolean issue() {
        return writes.issue();
    }

    /**
     * Save as…: writes the plan as it stands to a file the user chooses, in the background; see
     * {@link PlanWrites#saveAs(Path)}.
     *
     * @return true when the write was started
     */
    public boolean saveAs() {
        return writes.saveAs(exportFolder());
    }

    /** True while the plan is being issued and written. */
    public BooleanProperty issuingProperty() {
        return issuing;
    }

    private String getMissing() {
        return missingProperty().get();
    }

    /**
     * Writes the sheet PDF and both fill-in files into the folder, in the background (the PDF and the workbook
     * take a second or more on a cold start): the issued plan's, or, before it is issued, the plan as the steps
     * describe it, marked DRAFT on every page as {@code proofrun sheet --draft} writes it (for review; the
     * grader refuses a draft's returned file). {@link #exportedProperty()} is set when they are written;
     * {@link #exportingProperty()} is true meanwhile.
     */
    public boolean export(Path dir) {
        Optional<StudyPlan> chosen = issuedNow().or(plans::nextIssue);
        if (chosen.isEmpty()) {
            message.set(getMissing());
            return false;
        }
        StudyPlan plan = chosen.get();
        boolean draft = !plan.isIssued();
        Paper size = paper();
        exporting.set(true);
        exported.set(null);
        message.set(AppMessage.HANDOUT_EXPORTING.format(dir));
        int openedAtStart = session.openedCount();
        background.submit(() -> SheetFiles.write(plan, dir, size, draft), w -> {
            exporting.set(false);
            if (session.openedCount() != openedAtStart) {
                return; // written for a plan no longer on the desk: nothing of it shows under this one
            }
            exported.set(w);
            message.set((draft ? AppMessage.HANDOUT_EXPORTED_DRAFT : AppMessage.HANDOUT_EXPORTED).format(dir,
                    w.pdf().getFileName(), w.csv().getFileName(), w.xlsx().getFileName()));
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

    /** Whether Issue can be pressed: a complete plan, not issued as it stands, no write under way. */
    public javafx.beans.binding.BooleanBinding canIssueBinding() {
        return Bindings.createBooleanBinding(() -> composed.get().plan().isPresent() && issued.get().isEmpty()
                && !issuing.get(), composed, issued, issuing);
    }

    /** Whether Save as… can be pressed: a complete or issued plan, no write under way. */
    public javafx.beans.binding.BooleanBinding canSaveAsBinding() {
        return Bindings.createBooleanBinding(() -> (composed.get().plan().isPresent() || issued.get().isPresent())
                && !issuing.get(), composed, issued, issuing);
    }

    /** What the export button says: the issued plan's files, or a DRAFT's before it is issued. */
    public StringBinding exportLabelBinding() {
        return exportLabel;
    }

    /** Whether there is something to export: the issued plan, or a complete draft. */
    public javafx.beans.binding.BooleanBinding exportableBinding() {
        return exportable;
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
        Optional<StudyPlan> plan = issuedNow().or(() -> composed.get().plan());
        if (plan.isEmpty()) {
            preview.forget();
            pages.clear();
            busy.set(false);
            return;
        }
        StudyPlan p = plan.get();
        Paper size = paper();
        busy.set(true);
        preview.submit(() -> {
            List<Image> out = new java.util.ArrayList<>();
            for (java.awt.image.BufferedImage page : SheetPreview.pages(p, size, PREVIEW_DPI,
                    () -> Thread.currentThread().isInterrupted())) {
                out.add(SwingFXUtils.toFXImage(page, null));
            }
            return out;
        }, images -> {
            pages.setAll(images);
            busy.set(false);
        }, ex -> {
            busy.set(false);
            message.set(AppMessage.HANDOUT_PREVIEW_FAILED.format(String.valueOf(ex.getMessage())));
        });
    }
}
