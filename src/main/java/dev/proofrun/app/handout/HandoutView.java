package dev.proofrun.app.handout;

import dev.proofrun.app.shell.StepView;
import java.io.File;
import javafx.collections.ListChangeListener;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.image.Image;
import javafx.scene.image.ImageView;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.DirectoryChooser;

/** Issue, preview, export and open the collection sheet. */
public final class HandoutView implements StepView {

    private final VBox root = new VBox(12);
    private final Button issue = new Button("_Issue the plan");
    private final Button export = new Button();

    public HandoutView(HandoutViewModel vm) {
        Label state = new Label();
        state.setId("plan-state");
        state.getStyleClass().add("pr-big");
        state.setWrapText(true);
        state.textProperty().bind(vm.stateBinding());
        issue.setId("issue");
        issue.getStyleClass().add("pr-primary");
        issue.setOnAction(e -> vm.issue());
        issue.disableProperty().bind(vm.canIssueBinding().not());
        Label message = new Label();
        message.setId("handout-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());
        Button saveAs = new Button("Sa_ve as…");
        saveAs.setId("save-as");
        saveAs.disableProperty().bind(vm.canSaveAsBinding().not());
        saveAs.setOnAction(e -> vm.saveAs());
        VBox issueCard = new VBox(state, new HBox(8, issue, saveAs), message);
        issueCard.getStyleClass().add("pr-card");

        ChoiceBox<String> paper = new ChoiceBox<>(vm.papers());
        paper.setId("paper");
        paper.valueProperty().bindBidirectional(vm.paperChoiceProperty());
        TextField folder = new TextField(vm.exportFolder().toString());
        folder.setId("export-folder");
        folder.setPrefColumnCount(28);
        HBox.setHgrow(folder, Priority.ALWAYS);
        Button choose = new Button("Choose…");
        choose.setOnAction(e -> {
            DirectoryChooser dc = new DirectoryChooser();
            File start = new File(folder.getText());
            if (start.isDirectory()) {
                dc.setInitialDirectory(start);
            }
            File f = dc.showDialog(root.getScene().getWindow());
            if (f != null) {
                folder.setText(f.toString());
            }
        });
        export.setId("export");
        export.textProperty().bind(vm.exportLabelBinding());
        export.disableProperty().bind(vm.exportableBinding().not().or(vm.exportingProperty()));
        export.setOnAction(e -> vm.exportTo(folder.getText()));
        Button open = new Button("_Open the PDF");
        open.setId("open-pdf");
        open.disableProperty().bind(vm.exportedProperty().isNull());
        open.setOnAction(e -> vm.openPdf());
        GridPane form = new GridPane();
        form.getStyleClass().add("pr-form");
        Label folderLabel = new Label("Folder");
        folderLabel.setLabelFor(folder);
        form.addRow(0, new Label("Paper"), paper);
        for (javafx.scene.layout.Region r : new javafx.scene.layout.Region[] {choose, export}) {
            r.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        }
        form.addRow(1, folderLabel, new HBox(8, folder, choose));
        form.addRow(2, new Label(""), new HBox(8, export, open));
        Label filesTitle = new Label("Sheet and fill-in files");
        filesTitle.getStyleClass().add("pr-card-title");
        VBox filesCard = new VBox(filesTitle, form);
        filesCard.getStyleClass().add("pr-card");

        HBox strip = new HBox(12);
        strip.setId("preview");
        vm.pages().addListener((ListChangeListener<Image>) c -> {
            strip.getChildren().clear();
            for (Image img : vm.pages()) {
                ImageView v = new ImageView(img);
                v.setPreserveRatio(true);
                // drawn scaled once into a cached bitmap, not scaled again on every frame
                v.setCache(true);
                v.setFitHeight(dev.proofrun.app.shell.FontScale.of(31.5));
                v.getStyleClass().add("pr-page-image");
                strip.getChildren().add(v);
            }
        });
        ScrollPane pages = new ScrollPane(strip);
        pages.setPrefViewportHeight(dev.proofrun.app.shell.FontScale.of(32.3));
        pages.setFitToHeight(true);
        ProgressIndicator spinner = new ProgressIndicator();
        spinner.setMaxSize(dev.proofrun.app.shell.FontScale.of(1.8), dev.proofrun.app.shell.FontScale.of(1.8));
        spinner.visibleProperty().bind(vm.busyProperty());
        Label previewTitle = new Label("Preview of the printed sheet");
        previewTitle.getStyleClass().add("pr-card-title");
        VBox previewCard = new VBox(new HBox(8, previewTitle, spinner), pages);
        previewCard.getStyleClass().add("pr-card");
        root.getChildren().addAll(issueCard, filesCard, previewCard);
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return issue.isDisabled() ? export : issue;
    }
}
