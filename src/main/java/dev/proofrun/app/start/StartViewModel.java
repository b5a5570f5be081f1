package dev.proofrun.app.start;

import dev.proofrun.app.AppMessage;
import dev.proofrun.text.UserException;
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
    private final ObservableList<Path> recent = FXCollections.observableArrayList();
    private final BooleanProperty loaded = new SimpleBooleanProperty(this, "loaded", false);
    private final StringProperty message = new SimpleStringProperty(this, "message", "");

    public StartViewModel(Session session) {
        this.session = session;
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
     * Begins a new plan. If a draft of an unsaved plan was left behind, it is restored instead of lost.
     */
    public void newPlan() {
        boolean restored = session.startNew();
        message.set(restored ? AppMessage.DRAFT_RESTORED.format(session.drafts().sideFile(null).getFileName()) : "");
        loaded.set(true);
    }

    /** Opens a plan file; a problem with the file is shown as one line and nothing changes. */
    public boolean open(Path file) {
        try {
            boolean restored = session.open(file);
            message.set(restored ? AppMessage.DRAFT_RESTORED.format(session.drafts().sideFile(file).getFileName())
                    : AppMessage.OPENED.format(file.getFileName()));
            loaded.set(true);
            refresh();
            return true;
        } catch (UserException | java.io.UncheckedIOException e) {
            message.set(e.getMessage());
            return false;
        }
    }

    /** Opens the bundled demo plan (written to the plans folder the first time). */
    public boolean openDemo() {
        try {
            return open(session.demoFile());
        } catch (UserException e) {
            message.set(e.getMessage());
            return false;
        }
    }
}
