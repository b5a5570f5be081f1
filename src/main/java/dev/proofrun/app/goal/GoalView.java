package dev.proofrun.app.goal;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.ExpectationSource;
import dev.proofrun.app.shell.IndexTips;
import dev.proofrun.app.shell.StepView;
import dev.proofrun.stats.IndexKind;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.collections.FXCollections;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.RadioButton;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;

/** The requirement and the expectation, with their inline messages. */
public final class GoalView implements StepView {

    private final VBox root = new VBox(12);
    private final ComboBox<IndexKind> index = new ComboBox<>();
    private final VBox pilotBox = new VBox(6);

    public GoalView(GoalViewModel vm) {
        GridPane req = new GridPane();
        req.getStyleClass().add("pr-form");
        index.setId("index");
        index.setItems(FXCollections.observableArrayList(vm.indices()));
        index.valueProperty().bindBidirectional(vm.indexProperty());
        index.setConverter(new StringConverter<>() {
            @Override
            public String toString(IndexKind k) {
                return k == null ? "" : k.symbol();
            }

            @Override
            public IndexKind fromString(String s) {
                return IndexKind.fromToken(s);
            }
        });
        index.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(IndexKind k, boolean empty) {
                super.updateItem(k, empty);
                setText(empty || k == null ? null : k.symbol());
                setTooltip(empty || k == null ? null : new Tooltip(IndexTips.of(k)));
            }
        });
        index.setTooltip(new Tooltip());
        index.getTooltip().textProperty().bind(Bindings.createStringBinding(
                () -> vm.indexProperty().get() == null ? "" : IndexTips.of(vm.indexProperty().get()), vm.indexProperty()));
        TextField min = field("minimum", vm.minimum());
        TextField conf = field("confidence", vm.confidence());
        req.addRow(0, new Label("Index the customer asks for"), index);
        req.addRow(1, new Label("Smallest acceptable value"), min);
        req.addRow(2, new Label("Confidence (e.g. 0.95)"), conf);
        Label reqTitle = new Label("What the study must show");
        reqTitle.getStyleClass().add("pr-card-title");
        VBox reqCard = new VBox(reqTitle, req);
        reqCard.getStyleClass().add("pr-card");

        ComboBox<CharacteristicDraft> focus = new ComboBox<>(vm.characteristics());
        focus.setId("focus");
        focus.setConverter(new StringConverter<>() {
            @Override
            public String toString(CharacteristicDraft c) {
                return c == null ? "" : c.id() + "  " + c.text(CharacteristicField.NAME);
            }

            @Override
            public CharacteristicDraft fromString(String s) {
                return null;
            }
        });
        focus.setValue(vm.focusBinding().get().orElse(null));
        vm.focusBinding().addListener((obs, was, now) -> focus.setValue(now.orElse(null)));
        focus.valueProperty().addListener((obs, was, now) -> {
            if (now != null) {
                vm.focusId().set(now.id());
            }
        });

        ToggleGroup sources = new ToggleGroup();
        RadioButton byValue = radio("source-value", "An expected value of the index", sources, ExpectationSource.VALUE, vm);
        RadioButton byMean = radio("source-mean-sigma", "An expected mean and sigma", sources, ExpectationSource.MEAN_SIGMA, vm);
        RadioButton byPilot = radio("source-pilot", "Pilot readings from a file", sources, ExpectationSource.PILOT, vm);
        HBox sourceRow = new HBox(16, byValue, byMean, byPilot);

        TextField expected = new TextField();
        expected.setId("expected");
        bindExpected(expected, vm.focusBinding().get());
        vm.focusBinding().addListener((obs, was, now) -> {
            was.ifPresent(w -> expected.textProperty().unbindBidirectional(w.cell(CharacteristicField.EXPECTED)));
            bindExpected(expected, now);
        });
        GridPane valueForm = new GridPane();
        valueForm.getStyleClass().add("pr-form");
        valueForm.addRow(0, new Label("Expected index"), expected);
        valueForm.visibleProperty().bind(vm.sourceProperty().isEqualTo(ExpectationSource.VALUE));
        valueForm.managedProperty().bind(valueForm.visibleProperty());

        GridPane meanForm = new GridPane();
        meanForm.getStyleClass().add("pr-form");
        meanForm.addRow(0, new Label("Expected mean"), field("expected-mean", vm.expectedMean()));
        meanForm.addRow(1, new Label("Expected sigma"), field("expected-sigma", vm.expectedSigma()));
        meanForm.visibleProperty().bind(vm.sourceProperty().isEqualTo(ExpectationSource.MEAN_SIGMA));
        meanForm.managedProperty().bind(meanForm.visibleProperty());

        TextField pilotFile = field("pilot-file", vm.pilotFile());
        pilotFile.setPrefColumnCount(36);
        Button choose = new Button("Choose…");
        choose.setOnAction(e -> {
            javafx.stage.FileChooser fc = new javafx.stage.FileChooser();
            fc.getExtensionFilters().add(new javafx.stage.FileChooser.ExtensionFilter("Readings", "*.csv"));
            java.io.File f = fc.showOpenDialog(root.getScene().getWindow());
            if (f != null) {
                pilotFile.setText(f.toString());
                vm.loadPilot(f.toPath());
            }
        });
        Button load = new Button("_Load");
        load.setId("load-pilot");
        load.setOnAction(e -> vm.loadPilot(java.nio.file.Path.of(pilotFile.getText().trim())));
        Label pilotShown = new Label();
        pilotShown.setId("pilot-estimate");
        pilotShown.setWrapText(true);
        pilotShown.textProperty().bind(vm.pilotMessageProperty());
        Tooltip pilotTip = new Tooltip();
        pilotTip.setWrapText(true);
        pilotTip.setMaxWidth(480);
        pilotTip.textProperty().bind(Bindings.createStringBinding(() -> vm.indexProperty().get() == null ? ""
                : IndexTips.of(vm.indexProperty().get()) + "\n\n" + IndexTips.lowerBound(vm.indexProperty().get(), 0.95)
                        .replace("95 %", "the stated"), vm.indexProperty()));
        pilotShown.setTooltip(pilotTip);
        Label pilotLabel = new Label("Readings file (CSV)");
        pilotLabel.setLabelFor(pilotFile);
        pilotBox.getChildren().addAll(new HBox(8, pilotLabel, pilotFile, choose, load), pilotShown);
        pilotBox.visibleProperty().bind(vm.sourceProperty().isEqualTo(ExpectationSource.PILOT));
        pilotBox.managedProperty().bind(pilotBox.visibleProperty());

        Label result = new Label();
        result.setId("expectation");
        result.getStyleClass().add("pr-fine");
        result.textProperty().bind(Bindings.createStringBinding(() -> vm.expectationBinding().get()
                .map(e -> String.format(java.util.Locale.ROOT, "Designing for a true %s of %.3f%s", vm.indexProperty().get().symbol(),
                        e.index(), e.potential().isPresent()
                                ? String.format(java.util.Locale.ROOT, " (Cp %.3f, off centre)", e.potential().getAsDouble()) : " (centred)"))
                .orElse(""), vm.expectationBinding(), vm.indexProperty()));
        Label problem = new Label();
        problem.setId("goal-problem");
        problem.getStyleClass().add("pr-problem");
        problem.textProperty().bind(vm.missingProperty());

        GridPane focusRow = new GridPane();
        focusRow.getStyleClass().add("pr-form");
        focusRow.addRow(0, new Label("Characteristic"), focus);
        Label expTitle = new Label("What you expect of the process");
        expTitle.getStyleClass().add("pr-card-title");
        VBox expCard = new VBox(expTitle, focusRow, sourceRow, valueForm, meanForm, pilotBox, result, problem);
        expCard.getStyleClass().add("pr-card");
        root.getChildren().addAll(reqCard, expCard);
    }

    private static void bindExpected(TextField field, Optional<CharacteristicDraft> row) {
        row.ifPresent(r -> field.textProperty().bindBidirectional(r.cell(CharacteristicField.EXPECTED)));
    }

    private static RadioButton radio(String id, String text, ToggleGroup group, ExpectationSource s, GoalViewModel vm) {
        RadioButton b = new RadioButton(text);
        b.setId(id);
        b.setToggleGroup(group);
        b.setSelected(vm.sourceProperty().get() == s);
        b.selectedProperty().addListener((obs, was, now) -> {
            if (now) {
                vm.sourceProperty().set(s);
            }
        });
        vm.sourceProperty().addListener((obs, was, now) -> b.setSelected(now == s));
        return b;
    }

    private static TextField field(String id, javafx.beans.property.StringProperty p) {
        TextField f = new TextField();
        f.setId(id);
        f.textProperty().bindBidirectional(p);
        return f;
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return index;
    }
}
