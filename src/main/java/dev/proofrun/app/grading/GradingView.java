package dev.proofrun.app.grading;

import dev.proofrun.app.chart.CurvePlot;
import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.chart.CurvePlot.Pen;
import dev.proofrun.app.shell.IndexTip;
import dev.proofrun.app.shell.IndexTooltips;
import dev.proofrun.app.shell.StepView;
import dev.proofrun.control.ControlChart;
import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.GradeResult;
import dev.proofrun.grade.IndexEvidence;
import dev.proofrun.grade.Problem;
import dev.proofrun.grade.Step;
import dev.proofrun.grade.Verdict;
import java.io.File;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;

/** The returned file, its problems, and per characteristic the evidence chain, verdict, caution and charts. */
public final class GradingView implements StepView {

    private final VBox root = new VBox(12);
    private final TextField file = new TextField();
    private final Label verdict = new Label();
    private final Label charVerdict = new Label();
    private final VBox chain = new VBox(6);
    private final CurvePlot location = CurvePlot.spanning("location-chart", "Location chart", "subgroup", "value");
    private final CurvePlot spread = CurvePlot.spanning("spread-chart", "Spread chart", "subgroup", "value");
    private final CurvePlot readings = CurvePlot.spanning("readings-chart", "Readings against the limits", "reading", "value");

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
        spinner.setMaxSize(dev.proofrun.app.shell.Em.of(1.8), dev.proofrun.app.shell.Em.of(1.8));
        spinner.visibleProperty().bind(vm.busyProperty().or(vm.reportingProperty()));
        Label message = new Label();
        message.setId("grading-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());
        Button report = new Button("Export the _report PDF");
        report.setId("export-report");
        report.disableProperty().bind(vm.resultProperty().isNull().or(vm.reportingProperty()));
        report.setOnAction(e -> vm.exportReport(vm.defaultReport()));
        Label fileLabel = new Label("Returned _file");
        fileLabel.setMnemonicParsing(true);
        fileLabel.setLabelFor(file);
        HBox fileRow = new HBox(8, fileLabel, file, browse, grade, spinner, report);
        fileRow.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        // with a large system font the path field gives way, not the label and buttons
        for (javafx.scene.layout.Region r : new javafx.scene.layout.Region[] {fileLabel, browse, grade, report}) {
            r.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        }
        VBox fileCard = new VBox(fileRow, message);
        fileCard.getStyleClass().add("pr-card");

        verdict.setId("verdict");
        verdict.getStyleClass().add("pr-verdict");
        Label caution = caution(vm, "caution");
        VBox verdictCard = new VBox(verdict, caution);
        verdictCard.getStyleClass().add("pr-card");
        verdictCard.visibleProperty().bind(vm.resultProperty().isNotNull());
        verdictCard.managedProperty().bind(verdictCard.visibleProperty());

        TableView<Problem> problems = new TableView<>(vm.problems());
        problems.setId("problems");
        double em = javafx.scene.text.Font.getDefault().getSize();
        problems.prefHeightProperty().bind(javafx.beans.binding.Bindings.when(javafx.beans.binding.Bindings.isEmpty(vm.problems()))
                .then(5 * em).otherwise(13 * em));
        problems.setPlaceholder(new Label("No problems in the file."));
        problems.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        problems.getColumns().add(col("Row", p -> p.location().row() > 0 ? Long.toString(p.location().row()) : ""));
        problems.getColumns().add(col("Column", p -> p.location().column() == null ? "" : p.location().column()));
        problems.getColumns().add(col("Kind", p -> p.severity().id()));
        problems.getColumns().add(col("Characteristic", p -> p.characteristic() == null ? "" : p.characteristic()));
        problems.getColumns().add(col("Problem", Problem::message));
        problems.getColumns().get(0).setPrefWidth(dev.proofrun.app.shell.Em.of(4));
        problems.getColumns().get(4).setPrefWidth(dev.proofrun.app.shell.Em.of(40));
        Label problemsTitle = new Label("Problems in the file");
        problemsTitle.getStyleClass().add("pr-card-title");
        VBox problemsCard = new VBox(problemsTitle, problems);
        problemsCard.getStyleClass().add("pr-card");
        problemsCard.visibleProperty().bind(vm.resultProperty().isNotNull());
        problemsCard.managedProperty().bind(problemsCard.visibleProperty());

        TableView<CharacteristicGrade> grades = new TableView<>(vm.grades());
        grades.setId("grades");
        grades.setPrefHeight(dev.proofrun.app.shell.Em.of(10));
        grades.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        grades.getColumns().add(col("Id", CharacteristicGrade::id));
        grades.getColumns().add(col("Name", CharacteristicGrade::name));
        grades.getColumns().get(0).setPrefWidth(dev.proofrun.app.shell.Em.of(4));
        grades.getColumns().get(1).setPrefWidth(dev.proofrun.app.shell.Em.of(14));
        grades.getColumns().add(col("Verdict", g -> GradingViewModel.verdictWords(g.verdict())));
        TableColumn<CharacteristicGrade, String> est = col("Estimate", g -> g.judged() == null ? "—"
                : g.judged().index().symbol() + " " + GradingViewModel.fmt(g.judged().estimate()));
        est.setGraphic(tipped("Estimate", "The index computed from the returned readings; hover an index in the "
                + "evidence below for its formula."));
        est.setText(null);
        grades.getColumns().add(est);
        TableColumn<CharacteristicGrade, String> low = col("Lower bound", g -> g.judged() == null ? "—"
                : GradingViewModel.fmt(g.judged().lower()) + " vs " + GradingViewModel.fmt(g.judged().required()));
        low.setGraphic(tipped("Lower bound vs required", "The lower confidence bound of the index; the requirement is "
                + "demonstrated when it reaches the required minimum."));
        low.setText(null);
        grades.getColumns().add(low);
        // widths of their own, so the last title is not cut short (the policy spreads what is left)
        grades.getColumns().get(2).setPrefWidth(dev.proofrun.app.shell.Em.of(9));
        est.setPrefWidth(dev.proofrun.app.shell.Em.of(9));
        low.setPrefWidth(dev.proofrun.app.shell.Em.of(15));
        grades.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                vm.selectedProperty().set(b);
            }
        });
        charVerdict.setId("char-verdict");
        charVerdict.getStyleClass().add("pr-verdict");
        Label charCaution = caution(vm, "char-caution");
        chain.setId("evidence");
        HBox charts = new HBox(12, location, spread, readings);
        for (Node c : charts.getChildren()) {
            HBox.setHgrow(c, Priority.ALWAYS);
        }
        Label gradesTitle = new Label("Per characteristic");
        gradesTitle.getStyleClass().add("pr-card-title");
        VBox gradesCard = new VBox(gradesTitle, grades, charVerdict, charCaution, chain, charts);
        gradesCard.getStyleClass().add("pr-card");
        gradesCard.visibleProperty().bind(vm.resultProperty().isNotNull());
        gradesCard.managedProperty().bind(gradesCard.visibleProperty());

        vm.resultProperty().addListener((o, a, r) -> showResult(r));
        vm.selectedProperty().addListener((o, a, g) -> {
            showCharacteristic(g);
            if (g != null && grades.getSelectionModel().getSelectedItem() != g) {
                grades.getSelectionModel().select(g);
            }
        });
        root.getChildren().addAll(fileCard, verdictCard, problemsCard, gradesCard);
    }

    private void showResult(GradeResult r) {
        if (r == null) {
            verdict.setText("");
            return;
        }
        verdict.setText("Verdict for plan " + r.planId() + "@" + r.revision() + ": " + GradingViewModel.verdictWords(r.verdict())
                + r.look().map(l -> "\n" + l.line(r.verdict())).orElse(""));
        style(verdict, r.verdict());
    }

    private void showCharacteristic(CharacteristicGrade g) {
        chain.getChildren().clear();
        List<CurvePlot.Line> lines = new ArrayList<>();
        if (g == null) {
            charVerdict.setText("");
            location.show(List.of());
            spread.show(List.of());
            readings.show(List.of());
            return;
        }
        charVerdict.setText(g.id() + " " + g.name() + ": " + GradingViewModel.verdictWords(g.verdict())
                + (g.additionalSubgroups().isPresent()
                        ? " (about " + g.additionalSubgroups().getAsInt() + " more subgroups would settle it: a planning figure)" : ""));
        style(charVerdict, g.verdict());
        String[] titles = {"1 Complete?", "2 Stable?", "3 Shape", "4 Capable?"};
        Step[] steps = {Step.COMPLETENESS, Step.STABILITY, Step.SHAPE, Step.CAPABILITY};
        for (int i = 0; i < steps.length; i++) {
            Label head = new Label(titles[i]);
            head.getStyleClass().add("pr-card-title");
            Label body = IndexTooltips.follow(new Label(String.join("\n", GradingViewModel.reasons(g, steps[i]))));
            body.setWrapText(true);
            body.setId("evidence-" + steps[i].id());
            chain.getChildren().addAll(head, body);
        }
        IndexEvidence e = g.judged();
        if (e != null) {
            // what the verdict rests on, in the words the command line and the report use
            Label idx = IndexTooltips.follow(new Label(e.summary()));
            idx.setWrapText(true);
            idx.setId("index-evidence");
            chain.getChildren().add(idx);
        }
        if (g.capability() != null) {
            chain.getChildren().add(indexGrid(g.capability()));
        }
        if (g.stability() != null) {
            chart(location, g.stability().charts().location(), g.unit());
            chart(spread, g.stability().charts().spread(), g.unit());
        } else {
            location.show(List.of());
            spread.show(List.of());
        }
        List<double[]> pts = new ArrayList<>();
        int i = 1;
        for (double[] sub : g.subgroups()) {
            for (double v : sub) {
                pts.add(new double[] {i++, v});
            }
        }
        if (!pts.isEmpty()) {
            lines.add(line("readings", Pen.CURVE, pts));
            double span = g.limits().upper().orElse(pts.stream().mapToDouble(p -> p[1]).max().orElse(0))
                    - g.limits().lower().orElse(pts.stream().mapToDouble(p -> p[1]).min().orElse(0));
            readings.setTitle("Readings against the limits" + (g.unit().isEmpty() ? "" : " (" + g.unit() + ")"));
            if (g.limits().lower().isPresent()) {
                lines.add(Line.horizontal("LSL " + num(g.limits().lower().getAsDouble(), span), Pen.LIMIT,
                        g.limits().lower().getAsDouble(), 1, pts.size()));
            }
            if (g.limits().upper().isPresent()) {
                lines.add(Line.horizontal("USL " + num(g.limits().upper().getAsDouble(), span), Pen.LIMIT,
                        g.limits().upper().getAsDouble(), 1, pts.size()));
            }
        }
        readings.show(lines);
    }

    private static Line line(String name, Pen pen, List<double[]> pts) {
        double[] xs = new double[pts.size()];
        double[] ys = new double[pts.size()];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = pts.get(i)[0];
            ys[i] = pts.get(i)[1];
        }
        return new Line(name, pen, xs, ys);
    }

    private static void chart(CurvePlot c, ControlChart cc, String unit) {
        c.setTitle(cc.statistic().name().toLowerCase(Locale.ROOT).replace('_', ' ') + " chart" + (unit.isEmpty() ? "" : " (" + unit + ")"));
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < cc.points().length; i++) {
            pts.add(new double[] {cc.subgroupOf(i) + 1, cc.points()[i]});
        }
        if (pts.isEmpty()) {
            c.show(List.of());
            return;
        }
        double x0 = pts.get(0)[0];
        double x1 = pts.get(pts.size() - 1)[0];
        double span = cc.ucl() - cc.lcl();
        List<Line> shown = new ArrayList<>(List.of(line(cc.statistic().name().toLowerCase(Locale.ROOT), Pen.CURVE, pts),
                Line.horizontal("centre " + num(cc.center(), span), Pen.CENTRE, cc.center(), x0, x1),
                Line.horizontal("UCL " + num(cc.ucl(), span), Pen.LIMIT, cc.ucl(), x0, x1),
                Line.horizontal("LCL " + num(cc.lcl(), span), Pen.LIMIT, cc.lcl(), x0, x1)));
        List<double[]> flagged = new ArrayList<>();
        for (dev.proofrun.control.Signal sig : cc.signals()) {
            if (sig.index() < pts.size() && flagged.stream().noneMatch(p -> p == pts.get(sig.index()))) {
                flagged.add(pts.get(sig.index()));
            }
        }
        if (!flagged.isEmpty()) {
            shown.add(line("signal (" + flagged.size() + ")", Pen.FLAGGED, flagged));
        }
        c.show(shown);
    }

    /** Every index the readings define, with its lower bound where the core gives one. */
    private static Node indexGrid(dev.proofrun.capability.CapabilityResult c) {
        javafx.scene.layout.GridPane grid = new javafx.scene.layout.GridPane();
        grid.setId("index-grid");
        grid.getStyleClass().addAll("pr-form", "pr-index-grid");
        Label head = new Label("All indices (normal model)");
        head.getStyleClass().add("pr-card-title");
        Label lowerHead = IndexTooltips.follow(new Label(String.format(Locale.ROOT, "lower %.0f %% bound", 100 * c.confidence())));
        lowerHead.setTooltip(IndexTooltips.tooltip(IndexTip.LOWER_BOUND.english()));
        grid.addRow(0, head, new Label("estimate"), lowerHead);
        int row = 1;
        for (dev.proofrun.stats.IndexKind k : dev.proofrun.stats.IndexKind.values()) {
            java.util.OptionalDouble v = c.index(k);
            if (v.isPresent()) {
                java.util.OptionalDouble lo = c.lowerBound(k);
                grid.addRow(row++, IndexTooltips.follow(new Label(k.symbol())), new Label(GradingViewModel.fmt(v.getAsDouble())),
                        new Label(lo.isPresent() ? GradingViewModel.fmt(lo.getAsDouble()) : "—"));
            }
        }
        if (c.indices().cpm().isPresent()) {
            grid.addRow(row, IndexTooltips.follow(new Label("Cpm")), new Label(GradingViewModel.fmt(c.indices().cpm().getAsDouble())),
                    new Label("—"));
        }
        return grid;
    }

    /** Limits printed to a precision that fits the chart: two digits below the spread between them. */
    private static String num(double v, double span) {
        int decimals = span > 0 ? (int) Math.max(0, Math.min(8, 2 - Math.floor(Math.log10(span)))) : 4;
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    private static void style(Label l, Verdict v) {
        l.getStyleClass().removeAll("pr-verdict-good", "pr-verdict-short", "pr-verdict-open");
        l.getStyleClass().add(switch (v) {
            case DEMONSTRATED -> "pr-verdict-good";
            case INCONCLUSIVE, CONTINUE -> "pr-verdict-open";
            default -> "pr-verdict-short";
        });
    }

    private static Label caution(GradingViewModel vm, String id) {
        Label c = new Label(vm.caution());
        c.setId(id);
        c.getStyleClass().add("pr-caution");
        c.setWrapText(true);
        vm.resultProperty().addListener((o, a, b) -> c.setText(vm.caution()));
        return c;
    }

    private static Label tipped(String text, String tip) {
        Label l = new Label(text);
        Tooltip t = new Tooltip(tip);
        t.setWrapText(true);
        t.setMaxWidth(dev.proofrun.app.shell.Em.of(32));
        l.setTooltip(t);
        return l;
    }

    private static <T> TableColumn<T, String> col(String title, Function<T, String> text) {
        TableColumn<T, String> c = new TableColumn<>(title);
        c.setSortable(false);
        // a width of its own: the default width makes the skin measure every cell on the first showing
        // (hundreds of ms on a loaded machine); the constrained policy spreads the columns anyway
        c.setPrefWidth(dev.proofrun.app.shell.Em.of(7));
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(text.apply(cd.getValue())));
        c.setCellFactory(tc -> new javafx.scene.control.TableCell<>() {
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
