package dev.proofrun.app.shell;

import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.value.ObservableValue;

/**
 * What every step's view-model offers the shell: a title, a one-line hint, and what is missing before
 * the user can go on (empty when the step is complete). Subclasses bind {@link #missing} to their own
 * validation.
 */
public abstract class StepViewModel {

    private final ReadOnlyStringWrapper missing = new ReadOnlyStringWrapper(this, "missing", "");
    private final BooleanBinding complete = Bindings.createBooleanBinding(() -> missing.get().isEmpty(), missing);

    private final String title;
    private final String hint;

    /** A step with its title (a word or two) and its one-line hint. */
    protected StepViewModel(String title, String hint) {
        this.title = title;
        this.hint = hint;
    }

    public final String title() {
        return title;
    }

    public final String hint() {
        return hint;
    }

    /** Empty when the step is complete, else a short sentence of what to do. */
    public final ReadOnlyStringProperty missingProperty() {
        return missing.getReadOnlyProperty();
    }

    public final BooleanBinding completeBinding() {
        return complete;
    }

    protected final void bindMissing(ObservableValue<String> source) {
        missing.bind(source);
    }

    /** Called when the step comes on screen. */
    public void entered() {
    }
}
