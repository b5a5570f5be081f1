package dev.proofrun.app.session;

import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.SimpleObjectProperty;

/**
 * The wizard's state for one window: the draft being edited, the plan it was opened from (the base) and
 * where its files go. Opening a plan restores a newer autosaved draft of it, so edits never get lost.
 */
public final class Session {

    private final AppHome home;
    private final StudyDraft draft = new StudyDraft();
    private final RecentPlans recent;
    private final DraftStore drafts;
    private final ObjectProperty<StudyPlan> base = new SimpleObjectProperty<>(this, "base");
    private final ReadOnlyIntegerWrapper opened = new ReadOnlyIntegerWrapper(this, "opened", 0);

    public Session(AppHome home) {
        this.home = Objects.requireNonNull(home, "home");
        this.recent = new RecentPlans(home);
        this.drafts = new DraftStore(home);
    }

    private PlanFileChooser chooser = PlanFileChooser.SUGGESTED;

    /** How the user is asked where a plan file goes (the window installs a file dialog). */
    public void setPlanFileChooser(PlanFileChooser chooser) {
        this.chooser = Objects.requireNonNull(chooser, "chooser");
    }

    /** Asks where a plan file goes, offering {@code suggested}; empty when the user chose nothing. */
    public Optional<Path> choosePlanFile(Path suggested) {
        return chooser.choose(suggested);
    }

    public AppHome home() {
        return home;
    }

    public StudyDraft draft() {
        return draft;
    }

    public RecentPlans recent() {
        return recent;
    }

    public DraftStore drafts() {
        return drafts;
    }

    /** The plan as last read from or written to its file; null for a new plan. */
    public ObjectProperty<StudyPlan> baseProperty() {
        return base;
    }

    public Optional<StudyPlan> base() {
        return Optional.ofNullable(base.get());
    }

    /** Writes the draft's side file now. */
    public void autosave() {
        drafts.write(draft.snapshot());
    }

    /**
     * What opening a plan file found: read by {@link #load} (any thread), put on the desk by {@link #apply}
     * (the FX thread).
     *
     * @param file     the plan file, absolute and normalised
     * @param plan     the plan as read from the file
     * @param snapshot what goes into the draft: the file's content, or a newer autosaved draft of it
     * @param restored whether the snapshot is that newer draft
     * @param recent   the recent plans after this one was put on top
     */
    public record Opening(Path file, StudyPlan plan, DraftSnapshot snapshot, boolean restored, List<Path> recent) {
    }

    /**
     * Opens a plan file into the draft at once ({@link #load} then {@link #apply} on the caller's thread).
     *
     * @return true when a newer autosaved draft of it was restored over the file's content
     * @throws dev.proofrun.text.UserException when the file is not a readable plan
     */
    public boolean open(Path file) {
        Opening o = load(file);
        apply(o);
        return o.restored();
    }

    /**
     * The file work of opening, safe off the FX thread: reads the plan, looks for a newer autosaved draft
     * of it and puts the file on top of the recent plans. The draft is not touched.
     *
     * @throws dev.proofrun.text.UserException when the file is not a readable plan
     */
    public Opening load(Path file) {
        Path p = file.toAbsolutePath().normalize();
        StudyPlan plan = PlanFiles.read(p);
        Optional<DraftSnapshot> newer = drafts.newerDraft(p);
        DraftSnapshot snapshot = newer.orElseGet(() -> PlanDrafts.snapshotOf(plan, p));
        List<Path> now = recent.remember(p);
        return new Opening(p, plan, snapshot, newer.isPresent(), now);
    }

    /** On the FX thread: the plan that {@link #load} read becomes the base and its content the draft. */
    public void apply(Opening o) {
        opened.set(opened.get() + 1);
        base.set(o.plan());
        draft.restore(o.snapshot(), o.restored());
        if (o.restored()) {
            draft.planFileProperty().set(o.file());
        }
    }

    /**
     * The bundled demo plan as a copy in the user's plans folder, written there first if it is not there
     * yet (never the demo file of a checkout or an installation).
     */
    public Path demoFile() {
        Path f = home.plansFolder().resolve(DemoPlan.FILE_NAME);
        if (!Files.exists(f)) {
            PlanFiles.write(f, DemoPlan.create());
        }
        return f;
    }

    /** Starts a new plan (a fresh draft, or the draft of a new plan left unsaved last time). */
    public boolean startNew() {
        opened.set(opened.get() + 1);
        base.set(null);
        Optional<DraftSnapshot> left = drafts.newerDraft(null);
        if (left.isPresent()) {
            draft.restore(left.get(), true);
            draft.planFileProperty().set(null);
            return true;
        }
        draft.restore(new StudyDraft().snapshot(), false);
        return false;
    }

    /**
     * Counts the plans opened or started in this session: a job that began under one count and ends
     * under another belongs to a draft that is no longer on screen.
     */
    public int openedCount() {
        return opened.get();
    }

    /**
     * {@link #openedCount()} as a property: it changes whenever another plan (or a new one) is put on the
     * desk, the moment every step drops what it showed about the plan before (messages, a verdict).
     */
    public ReadOnlyIntegerProperty openedProperty() {
        return opened.getReadOnlyProperty();
    }

    /**
     * Writes a plan to its file, remembers it and drops the autosaved draft.
     *
     * @throws dev.proofrun.text.UserException when the file is protected (an issued plan) or cannot be written
     */
    public void saved(Path file, StudyPlan plan) {
        Path p = write(file, plan);
        adopt(p, plan, false);
    }

    /**
     * The file work of saving, safe off the FX thread: writes the plan file (synced to disk) and puts it
     * on top of the recent plans. The draft and the base are not touched; {@link #adopt} does that after.
     *
     * @return the file written, absolute and normalised
     * @throws dev.proofrun.text.UserException when the file is protected (an issued plan) or cannot be written
     */
    public Path write(Path file, StudyPlan plan) {
        Path p = file.toAbsolutePath().normalize();
        PlanFiles.write(p, plan);
        recent.remember(p);
        return p;
    }

    /**
     * On the FX thread, once {@link #write} has put the plan in its file: the plan becomes the base and
     * the draft belongs to that file. When the user edited the draft while the file was written, those
     * edits are not in the file: the draft stays unsaved and is written at once as the file's side file
     * (so it is restored on opening); otherwise the autosaved drafts are dropped.
     *
     * @param file             the file as returned by {@link #write}
     * @param editedMeanwhile  whether the draft changed after the plan was taken from it
     */
    public void adopt(Path file, StudyPlan plan, boolean editedMeanwhile) {
        Path oldDraft = draft.planFileProperty().get();
        base.set(plan);
        draft.planFileProperty().set(file);
        if (editedMeanwhile) {
            autosave();
            if (!file.equals(oldDraft)) {
                drafts.discard(oldDraft);
            }
            return;
        }
        drafts.discard(oldDraft);
        drafts.discard(file);
        draft.markSaved();
    }
}
