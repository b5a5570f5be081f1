package dev.proofrun.app.timing;

import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.shell.StepView;
import javafx.beans.binding.Bindings;
import javafx.collections.FXCollections;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

/** Calendar and span entry with inline problems, the frequency sentence and the timeline. */
public final class TimingView implements StepView {

    private final VBox root = new VBox(12);
    private final TextField start = new TextField();
    private final Timeline timeline = new Timeline();

    public TimingView(TimingViewModel vm) {
        GridPane form = new GridPane();
        form.getStyleClass().addAll("pr-form");
        int r = 0;
        start.setId("timing-start");
        start.textProperty().bindBidirectional(vm.field(DraftField.START));
        vm.problem(DraftField.START).addListener((o, a, b) -> mark(start, b));
        r = row(form, r, vm, DraftField.START, "Study starts (yyyy-MM-dd HH:mm)", start);
        ChoiceBox<String> kind = new ChoiceBox<>(FXCollections.observableArrayList("days", "shifts"));
        kind.setId("span-kind");
        kind.valueProperty().bindBidirectional(vm.field(DraftField.SPAN_KIND));
        TextField count = text(vm, DraftField.SPAN_COUNT);
        count.setPrefColumnCount(4);
        HBox span = new HBox(8, count, kind);
        Label spanLabel = new Label("Span of the study");
        spanLabel.setLabelFor(count);
        form.addRow(r, spanLabel, span, problem(vm, DraftField.SPAN_COUNT));
        r++;
        r = row(form, r, vm, DraftField.ZONE, "Plant time zone", text(vm, DraftField.ZONE));
        r = row(form, r, vm, DraftField.WORKING_DAYS, "Working days", text(vm, DraftField.WORKING_DAYS));
        r = row(form, r, vm, DraftField.SHIFTS, "Shifts (name start-end, …)", text(vm, DraftField.SHIFTS));
        r = row(form, r, vm, DraftField.BREAKS, "Breaks every working day", text(vm, DraftField.BREAKS));
        r = row(form, r, vm, DraftField.NON_WORKING, "Dates without shifts", text(vm, DraftField.NON_WORKING));
        r = row(form, r, vm, DraftField.RATE, "Rate (40 s per part, or 90/h)", text(vm, DraftField.RATE));
        ChoiceBox<String> spacing = new ChoiceBox<>(FXCollections.observableArrayList("random", "even"));
        spacing.setId("spacing");
        spacing.valueProperty().bindBidirectional(vm.field(DraftField.SPACING));
        spacing.setTooltip(new Tooltip("even: one subgroup in the middle of each equal interval of running time;\n"
                + "random: one subgroup at a random time inside each interval (avoids lining up with a periodic cause)"));
        TextField seed = text(vm, DraftField.SEED);
        seed.setPrefColumnCount(10);
        Button another = new Button("Another s_eed");
        another.setId("next-seed");
        another.setOnAction(e -> vm.nextSeed());
        another.disableProperty().bind(vm.field(DraftField.SPACING).isNotEqualTo("random"));
        Label spacingLabel = new Label("Spacing and seed");
        spacingLabel.setLabelFor(spacing);
        form.addRow(r, spacingLabel, new HBox(8, spacing, seed, another), problem(vm, DraftField.SEED));
        Label calTitle = new Label("Plant calendar and span");
        calTitle.getStyleClass().add("pr-card-title");
        VBox calCard = new VBox(calTitle, form);
        calCard.getStyleClass().add("pr-card");

        Label sentence = new Label();
        sentence.setId("frequency");
        sentence.getStyleClass().add("pr-big");
        sentence.setWrapText(true);
        Label trouble = new Label();
        trouble.setId("schedule-problem");
        trouble.getStyleClass().add("pr-problem");
        trouble.setWrapText(true);
        sentence.textProperty().bind(Bindings.createStringBinding(vm::sentence, vm.scheduleChanges()));
        trouble.textProperty().bind(Bindings.createStringBinding(vm::scheduleProblem, vm.scheduleChanges()));
        vm.scheduleChanges().addListener((o, a, b) -> redraw(vm));
        redraw(vm);
        VBox timeCard = new VBox(sentence, trouble, timeline);
        timeCard.getStyleClass().add("pr-card");
        root.getChildren().addAll(calCard, timeCard);
    }

    private void redraw(TimingViewModel vm) {
        timeline.show(vm.calendarBinding().get().orElse(null), vm.schedule().orElse(null));
    }

    private static int row(GridPane form, int r, TimingViewModel vm, DraftField f, String label, TextField field) {
        Label l = new Label(label);
        l.setLabelFor(field);
        field.setPrefColumnCount(28);
        form.addRow(r, l, field, problem(vm, f));
        return r + 1;
    }

    private static TextField text(TimingViewModel vm, DraftField f) {
        TextField t = new TextField();
        t.setId("timing-" + f.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        t.textProperty().bindBidirectional(vm.field(f));
        vm.problem(f).addListener((o, a, b) -> mark(t, b));
        mark(t, vm.problem(f).get());
        return t;
    }

    private static void mark(TextField t, String problem) {
        t.getStyleClass().remove("pr-invalid");
        if (!problem.isEmpty()) {
            t.getStyleClass().add("pr-invalid");
        }
    }

    private static Label problem(TimingViewModel vm, DraftField f) {
        Label l = new Label();
        l.getStyleClass().add("pr-problem");
        l.setWrapText(true);
        l.setMaxWidth(dev.proofrun.app.shell.FontScale.of(32));
        l.textProperty().bind(vm.problem(f));
        return l;
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return start;
    }
}
