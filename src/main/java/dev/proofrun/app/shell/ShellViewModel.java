package dev.proofrun.app.shell;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Session;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;
import javafx.beans.Observable;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

/**
 * The frame around the steps: which step is on screen, whether Back and Next can be used, what the
 * current step still misses, autosave of the draft and the question asked on close.
 *
 * <p>Next is enabled when the current step is complete; otherwise {@link #missingBinding()} says what to do.
 * Back is enabled everywhere but on the first step. A step on the rail can be reached directly when every
 * step before it is complete.
 */
public final class ShellViewModel {

    private final Session session;
    private final List<StepViewModel> steps;
    private final IntegerProperty current = new SimpleIntegerProperty(this, "current", 0);
    private final StringProperty status = new SimpleStringProperty(this, "status", "");
    private final BooleanBinding canGoBack;
    private final BooleanBinding canGoForward;
    private final StringBinding missing;
    private BooleanSupplier saver = () -> false;

    public ShellViewModel(Session session, List<StepViewModel> steps) {
        if (steps.isEmpty()) {
            throw new IllegalArgumentException("the wizard needs at least one step");
        }
        this.session = session;
        this.steps = List.copyOf(steps);
        List<Observable> deps = new ArrayList<>();
        deps.add(current);
        this.steps.forEach(s -> deps.add(s.missingProperty()));
        Observable[] all = deps.toArray(new Observable[0]);
        canGoBack = Bindings.createBooleanBinding(() -> current.get() > 0, current);
        canGoForward = Bindings.createBooleanBinding(
                () -> current.get() < this.steps.size() - 1 && currentStep().missingProperty().get().isEmpty(), all);
        missing = Bindings.createStringBinding(() -> {
            String m = currentStep().missingProperty().get();
            return m.isEmpty() ? "" : AppMessage.MISSING_PREFIX.format(m);
        }, all);
        current.addListener((obs, was, now) -> currentStep().entered());
        session.openedProperty().addListener((obs, was, now) -> status.set(""));
    }

    /** How the shell saves the plan file (set once the plan core is wired); returns true when saved. */
    public void setSaver(BooleanSupplier saver) {
        this.saver = saver;
    }

    public List<StepViewModel> steps() {
        return steps;
    }

    public IntegerProperty currentProperty() {
        return current;
    }

    public StepViewModel currentStep() {
        return steps.get(current.get());
    }

    public BooleanBinding canGoBackBinding() {
        return canGoBack;
    }

    public BooleanBinding canGoForwardBinding() {
        return canGoForward;
    }

    /** "Before going on: ..." for an incomplete step, empty for a complete one. */
    public StringBinding missingBinding() {
        return missing;
    }

    public StringProperty statusProperty() {
        return status;
    }

    public Session session() {
        return session;
    }

    public boolean next() {
        if (!canGoForward.get()) {
            return false;
        }
        current.set(current.get() + 1);
        return true;
    }

    public boolean back() {
        if (!canGoBack.get()) {
            return false;
        }
        current.set(current.get() - 1);
        return true;
    }

    /** True when step i can be shown: it is behind the current one, or every step before it is complete. */
    public boolean canGoTo(int i) {
        if (i < 0 || i >= steps.size()) {
            return false;
        }
        for (int j = 0; j < i; j++) {
            if (!steps.get(j).missingProperty().get().isEmpty()) {
                return i <= current.get();
            }
        }
        return true;
    }

    public boolean goTo(int i) {
        if (!canGoTo(i)) {
            return false;
        }
        current.set(i);
        return true;
    }

    /** Writes the draft side file if there are unsaved edits; reports in the status line. */
    public void autosave() {
        if (!session.draft().dirtyProperty().get()) {
            return;
        }
        try {
            session.autosave();
            status.set(AppMessage.DRAFT_SAVED.format(session.drafts().sideFile(session.draft().planFileProperty().get()).getFileName())
                    + " · " + LocalTime.now().format(DateTimeFormatter.ofPattern("HH:mm:ss", Locale.ROOT)));
        } catch (RuntimeException e) {
            status.set(AppMessage.DRAFT_FAILED.format(e.getMessage()));
        }
    }

    /** True when closing needs the user's answer (there are unsaved changes). */
    public boolean closeNeedsAnswer() {
        return session.draft().dirtyProperty().get();
    }

    /**
     * Acts on the answer to the close question; returns true when the window may close. The draft is
     * autosaved before anything else, so no answer loses an edit.
     */
    public boolean close(CloseChoice choice) {
        if (!closeNeedsAnswer()) {
            return true;
        }
        autosave();
        return switch (choice) {
            case STAY -> false;
            case KEEP_DRAFT -> true;
            case SAVE -> saver.getAsBoolean();
        };
    }
}
