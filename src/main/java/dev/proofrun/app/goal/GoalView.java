package dev.proofrun.app.goal;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.ExpectationSource;
import dev.proofrun.app.shell.IndexTooltips;
import dev.proofrun.app.shell.StepView;
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
    private final ComboBox<String> index = new ComboBox<>();
    private final VBox pilotBox = new VBox(6);

    public GoalView(GoalViewModel vm) {
        GridPane req = new GridPane();
        req.getStyleClass().add("pr-form");
        index.setId("index");
        index.setItems(FXCollections.observableArrayList(vm.indexSymbols()));
        index.valueProperty().bindBidirectional(vm.indexSymbolProperty());
        index.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(String symbol, boolean empty) {
                super.updateItem(symbol, empty);
                setText(empty || symbol == null ? null : symbol);
                if (empty || symbol == null) {
                    setTooltip(null);
                } else if (getTooltip() == null) {
                    setTooltip(IndexTooltips.tooltip(vm.tipFor(symbol)));
                } else {
                    // the cell's own tooltip, not a new one on every update
                    getTooltip().setText(vm.tipFor(symbol));
                }
            }
        });
        index.setTooltip(IndexTooltips.tooltip(""));
        index.getTooltip().textProperty().bind(Bindings.createStringBinding(
                () -> vm.tipFor(vm.indexSymbolProperty().get()), vm.indexSymbolProperty()));
        TextField min = field("minimum", vm.minimum());
        TextField conf = field("confidence", vm.confidence());
        req.addRow(0, mnemonic("_Index the customer asks for", index), index);
        req.addRow(1, mnemonic("Smallest acceptable _value", min), min);
        req.addRow(2, mnemonic("C_onfidence (e.g. 0.95)", conf), conf);
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
        Label expectedLabel = IndexTooltips.follow(mnemonic("_Expected index", expected));
        expectedLabel.textProperty().bind(Bindings.createStringBinding(() -> "_Expected "
                + (vm.indexSymbolProperty().get() == null || vm.indexSymbolProperty().get().isEmpty() ? "index"
                        : vm.indexSymbolProperty().get()), vm.indexSymbolProperty()));
        valueForm.addRow(0, expectedLabel, expected);
        valueForm.visibleProperty().bind(vm.sourceProperty().isEqualTo(ExpectationSource.VALUE));
        valueForm.managedProperty().bind(valueForm.visibleProperty());

        GridPane meanForm = new GridPane();
        meanForm.getStyleClass().add("pr-form");
        TextField mean = field("expected-mean", vm.expectedMean());
        TextField sigma = field("expected-sigma", vm.expectedSigma());
        Label meanLabel = mnemonic("Expected _mean", mean);
        Label sigmaLabel = mnemonic("Expected _sigma", sigma);
        javafx.beans.binding.StringBinding unit = vm.unitBinding();
        meanLabel.textProperty().bind(Bindings.concat("Expected _mean", unit));
        sigmaLabel.textProperty().bind(Bindings.concat("Expected _sigma", unit));
        meanForm.addRow(0, meanLabel, mean);
        meanForm.addRow(1, sigmaLabel, sigma);
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
        load.disableProperty().bind(vm.pilotLoadingProperty());
        Label pilotShown = new Label();
        pilotShown.setId("pilot-estimate");
        pilotShown.setWrapText(true);
        pilotShown.textProperty().bind(vm.pilotMessageProperty());
        IndexTooltips.follow(pilotShown);
        Label pilotLabel = new Label("Readings file (CSV)");
        pilotLabel.setLabelFor(pilotFile);
        for (javafx.scene.layout.Region r : new javafx.scene.layout.Region[] {pilotLabel, choose, load}) {
            r.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        }
        HBox pilotRow = new HBox(8, pilotLabel, pilotFile, choose, load);
        pilotRow.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        pilotBox.getChildren().addAll(pilotRow, pilotShown);
        pilotBox.visibleProperty().bind(vm.sourceProperty().isEqualTo(ExpectationSource.PILOT));
        pilotBox.managedProperty().bind(pilotBox.visibleProperty());

        Label result = IndexTooltips.follow(new Label());
        result.setId("expectation");
        result.getStyleClass().add("pr-fine");
        result.textProperty().bind(vm.expectationText());
        Label problem = new Label();
        problem.setId("goal-problem");
        problem.getStyleClass().add("pr-problem");
        problem.textProperty().bind(vm.missingProperty());

        GridPane focusRow = new GridPane();
        focusRow.getStyleClass().add("pr-form");
        focusRow.addRow(0, mnemonic("_Characteristic", focus), focus);
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

    /** A label whose underlined letter (Alt+letter) moves the focus to the field. */
    private static Label mnemonic(String text, javafx.scene.Node field) {
        Label l = new Label(text);
        l.setMnemonicParsing(true);
        l.setLabelFor(field);
        return l;
    }
}
