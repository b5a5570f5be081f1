package dev.proofrun.app.start;

import dev.proofrun.app.AppMessage;

import dev.proofrun.app.shell.StepView;
import java.nio.file.Path;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

/** Recent plans and the ways to begin. */
public final class StartView implements StepView {

    private final VBox root = new VBox();
    private final ListView<Path> recent = new ListView<>();

    public StartView(StartViewModel vm) {
        root.getStyleClass().add("pr-card");
        Label title = new Label("Recent plans");
        title.getStyleClass().add("pr-card-title");
        recent.setId("recent");
        recent.setItems(vm.recent());
        recent.setPrefHeight(dev.proofrun.app.shell.FontScale.of(16.5));
        recent.setPlaceholder(new Label("No plans opened yet."));
        recent.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(Path p, boolean empty) {
                super.updateItem(p, empty);
                setText(empty || p == null ? null : p.getFileName() + "    " + p.getParent());
            }
        });
        Button fresh = new Button("_Start a new plan");
        fresh.setId("new-plan");
        fresh.setMnemonicParsing(true);
        fresh.setOnAction(e -> vm.newPlan());
        Button open = new Button("_Open a plan file…");
        open.setId("open-plan");
        open.setMnemonicParsing(true);
        open.setOnAction(e -> {
            javafx.stage.FileChooser fc = new javafx.stage.FileChooser();
            fc.getExtensionFilters().add(new javafx.stage.FileChooser.ExtensionFilter("proofrun plan", "*.json"));
            if (java.nio.file.Files.isDirectory(vm.plansFolder())) {
                fc.setInitialDirectory(vm.plansFolder().toFile());
            }
            java.io.File f = fc.showOpenDialog(root.getScene().getWindow());
            if (f != null) {
                vm.open(f.toPath());
            }
        });
        Button demo = new Button("Open the _demo plan");
        demo.setId("open-demo");
        demo.setMnemonicParsing(true);
        demo.setOnAction(e -> vm.openDemo());
        Button again = new Button("Open the selected plan");
        again.setId("open-recent");
        again.disableProperty().bind(recent.getSelectionModel().selectedItemProperty().isNull());
        again.setOnAction(e -> vm.open(recent.getSelectionModel().getSelectedItem()));
        recent.setOnMouseClicked(e -> {
            if (e.getClickCount() == 2 && recent.getSelectionModel().getSelectedItem() != null) {
                vm.open(recent.getSelectionModel().getSelectedItem());
            }
        });
        recent.setOnKeyPressed(e -> {
            if (e.getCode() == javafx.scene.input.KeyCode.ENTER && recent.getSelectionModel().getSelectedItem() != null) {
                vm.open(recent.getSelectionModel().getSelectedItem());
            }
        });
        HBox actions = new HBox(again, open, fresh, demo);
        actions.setSpacing(8);
        actions.setAlignment(Pos.CENTER_LEFT);
        Label message = new Label();
        message.setId("start-message");
        message.getStyleClass().add("pr-note");
        message.textProperty().bind(vm.messageProperty());
        Label folder = new Label(AppMessage.WORK_FOLDER.format(vm.plansFolder().getParent()));
        folder.setId("work-folder");
        folder.setWrapText(true);
        folder.getStyleClass().add("pr-note");
        javafx.scene.control.ChoiceBox<String> mark = new javafx.scene.control.ChoiceBox<>(
                javafx.collections.FXCollections.observableArrayList(vm.markChoices()));
        mark.setId("decimal-mark");
        mark.valueProperty().bindBidirectional(vm.markChoiceProperty());
        Label markLabel = new Label(AppMessage.DECIMAL_MARK_LABEL.format());
        markLabel.setLabelFor(mark);
        Label markNote = new Label(vm.localeNote());
        markNote.getStyleClass().add("pr-note");
        HBox marks = new HBox(8, markLabel, mark, markNote);
        marks.setAlignment(Pos.CENTER_LEFT);
        root.getChildren().addAll(title, recent, actions, message, folder, marks);
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return recent;
    }
}
