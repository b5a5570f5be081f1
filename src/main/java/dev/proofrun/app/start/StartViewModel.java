package dev.proofrun.app.start;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.DecimalSetting;
import dev.proofrun.app.session.FieldNumbers;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.shell.StepViewModel;
import dev.proofrun.text.DecimalMark;
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
    private final LatestJob reading;
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
        super(AppMessage.STEP_START.english(), AppMessage.STEP_START_HINT.english());
        this.session = session;
        this.files = files;
        this.reading = new LatestJob(files);
        bindMissing(Bindings.when(loaded).then("").otherwise(AppMessage.NO_PLAN.english()));
        refresh();
        FieldNumbers.decimalMarkProperty().set(DecimalSetting.load(session.home()));
        markChoice.set(choiceOf(FieldNumbers.decimalMarkProperty().get()));
        markChoice.addListener((obs, was, now) -> {
            for (DecimalMark m : DecimalMark.values()) {
                if (choiceOf(m).equals(now) && FieldNumbers.decimalMarkProperty().get() != m) {
                    FieldNumbers.decimalMarkProperty().set(m);
                    files.submit(() -> {
                        DecimalSetting.save(session.home(), m);
                        return m;
                    }, done -> { }, ex -> message.set(AppMessage.DECIMAL_MARK_NOT_KEPT.failure(ex)));
                }
            }
        });
    }

    private final StringProperty markChoice = new SimpleStringProperty(this, "markChoice");

    private static String choiceOf(DecimalMark m) {
        return m.token() + "  " + m.example();
    }

    /** The decimal marks the fields can take, as the choice shows them ("point  1.33", "comma  1,33"). */
    public java.util.List<String> markChoices() {
        return java.util.Arrays.stream(DecimalMark.values()).map(StartViewModel::choiceOf).toList();
    }

    /**
     * The decimal mark of every number field in the wizard, as chosen here (kept in the user's folder;
     * a point to start with, as on the command line).
     */
    public StringProperty markChoiceProperty() {
        return markChoice;
    }

    /** "this computer's language writes 1,33": the locale's own mark, beside the choice. */
    public String localeNote() {
        return AppMessage.DECIMAL_MARK_LOCALE.format(DecimalMark.of(java.util.Locale.getDefault(java.util.Locale.Category.FORMAT)).example());
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
        if (reading.forget()) {
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
        opening.set(true);
        message.set(AppMessage.OPENING.english());
        reading.submit(read, o -> {
            opening.set(false);
            session.apply(o);
            message.set(o.restored() ? AppMessage.DRAFT_RESTORED.format(session.drafts().sideFile(o.file()).getFileName())
                    : AppMessage.OPENED.format(o.file().getFileName()));
            loaded.set(true);
            recent.setAll(o.recent());
            then.run();
        }, failure -> {
            opening.set(false);
            message.set(AppMessage.OPEN_FAILED.failure(failure));
        });
    }
}
