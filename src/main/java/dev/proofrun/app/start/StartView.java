package dev.proofrun.app.start;

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
        recent.setPrefHeight(220);
        recent.setPlaceholder(new Label("No plans opened yet. Plans are kept in " + vm.plansFolder()));
        recent.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(Path p, boolean empty) {
                super.updateItem(p, empty);
                setText(empty || p == null ? null : p.getFileName() + "    " + p.getParent());
            }
        });
        Button fresh = new Button("Start a _new plan");
        fresh.setId("new-plan");
        fresh.setMnemonicParsing(true);
        fresh.setOnAction(e -> vm.newPlan());
        HBox actions = new HBox(fresh);
        actions.setSpacing(8);
        actions.setAlignment(Pos.CENTER_LEFT);
        Label message = new Label();
        message.setId("start-message");
        message.getStyleClass().add("pr-note");
        message.textProperty().bind(vm.messageProperty());
        root.getChildren().addAll(title, recent, actions, message);
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return recent;
    }

    /** The actions row, for the steps wired later (open, demo) to add their buttons. */
    HBox actions() {
        return (HBox) root.getChildren().get(2);
    }
}
