package dev.proofrun.app.start;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.shell.StepViewModel;
import java.nio.file.Path;
import javafx.beans.binding.Bindings;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/** The start screen: recent plans, a new plan, the demo plan. Complete once a plan is on the desk. */
public final class StartViewModel extends StepViewModel {

    private final Session session;
    private final Background files;
    private Background.Job reading;
    private long generation;
    private final BooleanProperty opening = new SimpleBooleanProperty(this, "opening", false);
    private final ObservableList<Path> recent = FXCollections.observableArrayList();
    private final BooleanProperty loaded = new SimpleBooleanProperty(this, "loaded", false);
    private final StringProperty message = new SimpleStringProperty(this, "message", "");

    /** A view-model that reads plan files on the caller's thread (plain tests). */
    public StartViewModel(Session session) {
        this(session, Background.inline());
    }

    /** Plan files are read by {@code files}; the draft changes on the FX thread when the reading is done. */
    public StartViewModel(Session session, Background files) {
        this.session = session;
        this.files = files;
        bindMissing(Bindings.when(loaded).then("").otherwise(AppMessage.NO_PLAN.english()));
        refresh();
    }

    @Override
    public String title() {
        return AppMessage.STEP_START.english();
    }

    @Override
    public String hint() {
        return AppMessage.STEP_START_HINT.english();
    }

    public ObservableList<Path> recent() {
        return recent;
    }

    public BooleanProperty loadedProperty() {
        return loaded;
    }

    /** What happened last (a restored draft, a file that could not be read). */
    public StringProperty messageProperty() {
        return message;
    }

    public Path plansFolder() {
        return session.home().plansFolder();
    }

    public void refresh() {
        recent.setAll(session.recent().list());
    }

    /**
     * Begins a new plan. If a draft of an unsaved plan was left behind, it is restored instead of lost. A
     * plan file still being read is dropped: the latest request wins.
     */
    public void newPlan() {
        if (reading != null) {
            reading.cancel();
            reading = null;
            generation++;
            opening.set(false);
        }
        boolean restored = session.startNew();
        message.set(restored ? AppMessage.DRAFT_RESTORED.format(session.drafts().sideFile(null).getFileName()) : "");
        loaded.set(true);
    }

    /** True while a plan file is being read. */
    public BooleanProperty openingProperty() {
        return opening;
    }

    /** Opens a plan file; a problem with the file is shown as one line and nothing changes. */
    public void open(Path file) {
        open(() -> session.load(file), () -> { });
    }

    /** Opens the bundled demo plan (written to the plans folder the first time). */
    public void openDemo() {
        openDemo(() -> { });
    }

    /** Opens the bundled demo plan, then runs {@code then} on the FX thread if it opened. */
    public void openDemo(Runnable then) {
        open(() -> session.load(session.demoFile()), then);
    }

    /**
     * Reads the plan file off the FX thread and puts it on the desk when read; the latest request wins
     * (an earlier one still reading is cancelled and its answer dropped).
     */
    private void open(java.util.concurrent.Callable<Session.Opening> read, Runnable then) {
        if (reading != null) {
            reading.cancel();
        }
        long mine = ++generation;
        opening.set(true);
        message.set(AppMessage.OPENING.english());
        reading = files.submit(read, o -> {
            if (mine != generation) {
                return;
            }
            reading = null;
            opening.set(false);
            session.apply(o);
            message.set(o.restored() ? AppMessage.DRAFT_RESTORED.format(session.drafts().sideFile(o.file()).getFileName())
                    : AppMessage.OPENED.format(o.file().getFileName()));
            loaded.set(true);
            recent.setAll(o.recent());
            then.run();
        }, failure -> {
            if (mine != generation) {
                return;
            }
            reading = null;
            opening.set(false);
            message.set(AppMessage.OPEN_FAILED.failure(failure));
        });
        if (!opening.get()) {
            reading = null; // answered at once (a worker that runs jobs on the caller's thread)
        }
    }
}
