package dev.proofrun.app.shell;

import java.util.List;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.scene.Group;
import javafx.scene.Scene;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.RadioButton;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.control.cell.TextFieldTableCell;
import javafx.scene.image.ImageView;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;

/**
 * Runs JavaFX's code for the kinds of controls the pages use once, on the FX thread, before the window
 * shows. The first table, text field or combo box a JavaFX application makes runs its skin's code for the
 * first time (each lambda linked, each class initialised); on a cold start that made the first showing of
 * a page hold the FX thread. Done here, on a throwaway scene that never shows, it costs a fraction of a
 * second before the window appears and none after. {@link Primer} loads the classes beforehand on another
 * thread; this does what only the FX thread may do (style and lay out controls).
 */
public final class WarmUp {

    private WarmUp() {
    }

    /**
     * Builds, styles and lays out the throwaway scene. Call on the FX thread before the window shows.
     *
     * @param styleSheet the wizard's style sheet, as a URL string
     * @return the throwaway scene's height (tests check it was laid out)
     */
    public static double run(String styleSheet) {
        VBox root = new VBox(8, controls(), table(), new ListView<>(FXCollections.observableArrayList("a.json", "b.json")),
                drawing());
        Group top = new Group(new ScrollPane(root));
        Scene scene = new Scene(top, 1000, 800);
        scene.getStylesheets().add(styleSheet);
        top.applyCss();
        top.layout();
        return root.getHeight();
    }

    private static GridPane controls() {
        GridPane g = new GridPane();
        TextField f = new TextField("12.5");
        f.getStyleClass().add("pr-invalid");
        ToggleGroup group = new ToggleGroup();
        RadioButton a = new RadioButton("a");
        RadioButton b = new RadioButton("b");
        a.setToggleGroup(group);
        b.setToggleGroup(group);
        a.setSelected(true);
        Label l = new Label("Label");
        l.setWrapText(true);
        l.setTooltip(new Tooltip("tip"));
        ChoiceBox<String> choice = new ChoiceBox<>(FXCollections.observableArrayList("x", "y"));
        ComboBox<String> combo = new ComboBox<>(FXCollections.observableArrayList("x", "y"));
        choice.getSelectionModel().select(0);
        combo.getSelectionModel().select(0);
        g.addRow(0, l, f, new Button("Go"));
        g.addRow(1, a, b, new CheckBox("c"));
        g.addRow(2, new ProgressIndicator(0.5), new ImageView(), choice, combo);
        return g;
    }

    private static TableView<String[]> table() {
        TableView<String[]> t = new TableView<>(FXCollections.observableArrayList(
                List.of(new String[] {"D1", "9.95"}, new String[] {"R4", "10.05"})));
        for (int i = 0; i < 2; i++) {
            int column = i;
            TableColumn<String[], String> c = new TableColumn<>();
            c.setGraphic(new Label("c" + i));
            c.setCellValueFactory(d -> new ReadOnlyStringWrapper(d.getValue()[column]));
            c.setCellFactory(TextFieldTableCell.forTableColumn());
            t.getColumns().add(c);
        }
        t.setEditable(true);
        t.setPrefHeight(120);
        t.getSelectionModel().select(1);
        return t;
    }

    private static HBox drawing() {
        Canvas c = new Canvas(200, 100);
        GraphicsContext g = c.getGraphicsContext2D();
        g.setStroke(Color.BLACK);
        g.setLineDashes(4, 4);
        g.strokeLine(0, 0, 200, 100);
        g.fillText("1.33", 10, 10);
        return new HBox(c);
    }
}
