package dev.proofrun.app.grading;

import dev.proofrun.app.chart.CurvePlot;
import dev.proofrun.app.grading.GradingDisplay.Chart;
import dev.proofrun.app.grading.GradingDisplay.GradeRow;
import dev.proofrun.app.grading.GradingDisplay.IndexRow;
import dev.proofrun.app.grading.GradingDisplay.ProblemRow;
import dev.proofrun.app.grading.GradingDisplay.StepEvidence;
import dev.proofrun.app.grading.GradingDisplay.Tone;
import dev.proofrun.app.shell.FontScale;
import dev.proofrun.app.shell.IndexTip;
import dev.proofrun.app.shell.IndexTooltips;
import dev.proofrun.app.shell.StepView;
import java.io.File;
import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;

/**
 * The returned file, its problems, the verdict with the caution (once on the page), and per characteristic the
 * steps of the argument, every index, the control charts, the readings and their histogram. It binds to what
 * {@link GradingViewModel} displays and draws it; it reads no grade itself.
 */
public final class GradingView implements StepView {

    private final VBox root = new VBox(12);
    private final TextField file = new TextField();
    private final Label charVerdict = new Label();
    private final VBox chain = new VBox(6);
    private final CurvePlot location = CurvePlot.spanning("location-chart", "Location chart", "subgroup", "value");
    private final CurvePlot spread = CurvePlot.spanning("spread-chart", "Spread chart", "subgroup", "value");
    private final CurvePlot readings = CurvePlot.spanning("readings-chart", "Readings against the limits", "reading", "value");
    private final CurvePlot histogram = CurvePlot.spanning("histogram-chart", "Histogram of the readings", "reading", "count");

    public GradingView(GradingViewModel vm) {
        file.setId("returned-file");
        file.setPrefColumnCount(24);
        file.textProperty().bindBidirectional(vm.returnedFile());
        file.setOnAction(e -> vm.grade());
        HBox.setHgrow(file, Priority.ALWAYS);
        Button browse = new Button("Choose…");
        browse.setOnAction(e -> {
            FileChooser fc = new FileChooser();
            fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("Fill-in file", "*.csv", "*.xlsx"));
            File f = fc.showOpenDialog(root.getScene().getWindow());
            if (f != null) {
                file.setText(f.toString());
            }
        });
        Button grade = new Button("_Grade");
        grade.setId("grade");
        grade.getStyleClass().add("pr-primary");
        grade.setOnAction(e -> vm.grade());
        grade.disableProperty().bind(vm.busyProperty());
        ProgressIndicator spinner = new ProgressIndicator();
        spinner.setMaxSize(FontScale.of(1.8), FontScale.of(1.8));
        spinner.visibleProperty().bind(vm.busyProperty().or(vm.reportingProperty()));
        Label message = new Label();
        message.setId("grading-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());
        Button report = new Button("Export the _report PDF");
        report.setId("export-report");
        report.disableProperty().bind(vm.gradedBinding().not().or(vm.reportingProperty()));
        report.setOnAction(e -> vm.exportReport(vm.defaultReport()));
        Label fileLabel = new Label("Returned _file");
        fileLabel.setMnemonicParsing(true);
        fileLabel.setLabelFor(file);
        HBox fileRow = new HBox(8, fileLabel, file, browse, grade, spinner, report);
        fileRow.setAlignment(Pos.CENTER_LEFT);
        // with a large system font the path field gives way, not the label and buttons
        for (Region r : new Region[] {fileLabel, browse, grade, report}) {
            r.setMinWidth(Region.USE_PREF_SIZE);
        }
        VBox fileCard = new VBox(fileRow, message);
        fileCard.getStyleClass().add("pr-card");

        Label verdict = new Label();
        verdict.setId("verdict");
        verdict.getStyleClass().add("pr-verdict");
        verdict.textProperty().bind(vm.verdictLineBinding());
        vm.toneBinding().addListener((o, a, t) -> style(verdict, t));
        // the caution once on the page, under the part's verdict: it covers every characteristic below
        Label caution = new Label(vm.caution());
        caution.setId("caution");
        caution.getStyleClass().add("pr-caution");
        caution.setWrapText(true);
        VBox verdictCard = new VBox(verdict, caution);
        verdictCard.getStyleClass().add("pr-card");
        shownWith(verdictCard, vm);

        TableView<ProblemRow> problems = new TableView<>(vm.problemRows());
        problems.setId("problems");
        double em = FontScale.of(1);
        problems.prefHeightProperty().bind(Bindings.when(Bindings.isEmpty(vm.problemRows())).then(5 * em).otherwise(13 * em));
        problems.setPlaceholder(new Label("No problems in the file."));
        problems.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        problems.getColumns().add(col("Row", ProblemRow::row));
        problems.getColumns().add(col("Column", ProblemRow::column));
        problems.getColumns().add(col("Kind", ProblemRow::kind));
        problems.getColumns().add(col("Characteristic", ProblemRow::characteristic));
        problems.getColumns().add(col("Problem", ProblemRow::problem));
        problems.getColumns().get(0).setPrefWidth(FontScale.of(4));
        problems.getColumns().get(4).setPrefWidth(FontScale.of(40));
        Label problemsTitle = new Label("Problems in the file");
        problemsTitle.getStyleClass().add("pr-card-title");
        VBox problemsCard = new VBox(problemsTitle, problems);
        problemsCard.getStyleClass().add("pr-card");
        shownWith(problemsCard, vm);

        TableView<GradeRow> grades = new TableView<>(vm.gradeRows());
        grades.setId("grades");
        grades.setPrefHeight(FontScale.of(10));
        grades.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        grades.getColumns().add(col("Id", GradeRow::id));
        grades.getColumns().add(col("Name", GradeRow::name));
        grades.getColumns().get(0).setPrefWidth(FontScale.of(4));
        grades.getColumns().get(1).setPrefWidth(FontScale.of(14));
        grades.getColumns().add(col("Verdict", GradeRow::verdict));
        TableColumn<GradeRow, String> est = col("Estimate", GradeRow::estimate);
        est.setGraphic(tipped("Estimate", "The index computed from the returned readings; hover an index in the "
                + "evidence below for its formula."));
        est.setText(null);
        grades.getColumns().add(est);
        TableColumn<GradeRow, String> low = col("Lower bound", GradeRow::lowerVsRequired);
        low.setGraphic(tipped("Lower bound vs required", "The lower confidence bound of the index; the requirement is "
                + "demonstrated when it reaches the required minimum."));
        low.setText(null);
        grades.getColumns().add(low);
        // widths of their own, so the last title is not cut short (the policy spreads what is left)
        grades.getColumns().get(2).setPrefWidth(FontScale.of(9));
        est.setPrefWidth(FontScale.of(9));
        low.setPrefWidth(FontScale.of(15));
        grades.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                vm.selectedProperty().set(b.id());
            }
        });
        charVerdict.setId("char-verdict");
        charVerdict.getStyleClass().add("pr-verdict");
        chain.setId("evidence");
        HBox charts = new HBox(12, location, spread);
        HBox readingCharts = new HBox(12, readings, histogram);
        for (HBox row : new HBox[] {charts, readingCharts}) {
            for (Node c : row.getChildren()) {
                HBox.setHgrow(c, Priority.ALWAYS);
            }
        }
        Label gradesTitle = new Label("Per characteristic");
        gradesTitle.getStyleClass().add("pr-card-title");
        VBox gradesCard = new VBox(gradesTitle, grades, charVerdict, chain, charts, readingCharts);
        gradesCard.getStyleClass().add("pr-card");
        shownWith(gradesCard, vm);

        vm.shownProperty().addListener((o, a, c) -> {
            showCharacteristic(c);
            int row = c == null ? -1 : vm.gradeRows().indexOf(vm.gradeRows().stream()
                    .filter(r -> r.id().equals(vm.selectedProperty().get())).findFirst().orElse(null));
            if (row >= 0 && grades.getSelectionModel().getSelectedIndex() != row) {
                grades.getSelectionModel().select(row);
            }
        });
        root.getChildren().addAll(fileCard, verdictCard, problemsCard, gradesCard);
    }

    private void showCharacteristic(GradingDisplay.Characteristic c) {
        chain.getChildren().clear();
        if (c == null) {
            charVerdict.setText("");
            for (CurvePlot p : new CurvePlot[] {location, spread, readings, histogram}) {
                p.show(java.util.List.of());
            }
            return;
        }
        charVerdict.setText(c.heading());
        style(charVerdict, c.tone());
        for (StepEvidence s : c.steps()) {
            Label head = new Label(s.title());
            head.getStyleClass().add("pr-card-title");
            Label body = IndexTooltips.follow(new Label(s.text()));
            body.setWrapText(true);
            body.setId("evidence-" + s.id());
            chain.getChildren().addAll(head, body);
        }
        if (!c.notReached().isEmpty()) {
            Label not = new Label(c.notReached());
            not.setId("not-reached");
            not.setWrapText(true);
            chain.getChildren().add(not);
        }
        if (!c.summary().isEmpty()) {
            // what the verdict rests on, in the words the command line and the report use
            Label idx = IndexTooltips.follow(new Label(c.summary()));
            idx.setWrapText(true);
            idx.setId("index-evidence");
            chain.getChildren().add(idx);
        }
        if (c.indices() != null) {
            chain.getChildren().add(indexGrid(c.indices()));
        }
        draw(location, c.location());
        draw(spread, c.spread());
        draw(readings, c.readings());
        draw(histogram, c.histogram());
    }

    private static void draw(CurvePlot plot, Chart chart) {
        plot.setTitle(chart.title());
        plot.show(chart.lines());
    }

    private static Node indexGrid(GradingDisplay.IndexTable t) {
        GridPane grid = new GridPane();
        grid.setId("index-grid");
        grid.getStyleClass().addAll("pr-form", "pr-index-grid");
        Label head = new Label(t.title());
        head.getStyleClass().add("pr-card-title");
        Label lowerHead = IndexTooltips.follow(new Label(t.lowerHead()));
        lowerHead.setTooltip(IndexTooltips.tooltip(IndexTip.LOWER_BOUND.english()));
        grid.addRow(0, head, new Label("estimate"), lowerHead);
        int row = 1;
        for (IndexRow r : t.rows()) {
            grid.addRow(row++, IndexTooltips.follow(new Label(r.symbol())), new Label(r.estimate()), new Label(r.lower()));
        }
        return grid;
    }

    private static void shownWith(VBox card, GradingViewModel vm) {
        card.visibleProperty().bind(vm.gradedBinding());
        card.managedProperty().bind(card.visibleProperty());
    }

    private static void style(Label l, Tone t) {
        for (Tone any : Tone.values()) {
            l.getStyleClass().remove(any.styleClass());
        }
        if (t != null) {
            l.getStyleClass().add(t.styleClass());
        }
    }

    private static Label tipped(String text, String tip) {
        Label l = new Label(text);
        Tooltip t = new Tooltip(tip);
        t.setWrapText(true);
        t.setMaxWidth(FontScale.of(32));
        l.setTooltip(t);
        return l;
    }

    private static <T> TableColumn<T, String> col(String title, Function<T, String> text) {
        TableColumn<T, String> c = new TableColumn<>(title);
        c.setSortable(false);
        // a width of its own: the default width makes the skin measure every cell on the first showing
        // (hundreds of ms on a loaded machine); the constrained policy spreads the columns anyway
        c.setPrefWidth(FontScale.of(7));
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(text.apply(cd.getValue())));
        c.setCellFactory(tc -> new TableCell<>() {
            @Override
            protected void updateItem(String item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty ? null : item);
                IndexTooltips.apply(this);
            }
        });
        return c;
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return file;
    }
}
