package dev.proofrun.app.sizing;

import dev.proofrun.app.chart.CurvePlot;
import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.chart.CurvePlot.Pen;
import dev.proofrun.app.shell.StepView;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.OcPoint;
import dev.proofrun.design.PowerPoint;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import javafx.beans.InvalidationListener;
import javafx.beans.WeakInvalidationListener;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;

/** The candidate designs, the recommendation, the chosen design's cost and its curves. */
public final class SizingView implements StepView {

    private final VBox root = new VBox(12);
    private final TableView<DesignRow> table = new TableView<>();
    private final CurvePlot powerChart =
            new CurvePlot("power-chart", "Power against the number of subgroups", "subgroups k", "power");
    private final CurvePlot ocChart =
            new CurvePlot("oc-chart", "Chance to demonstrate against the true index", "true index", "probability");

    public SizingView(SizingViewModel vm) {
        TextField power = new TextField();
        power.setId("power");
        power.setPrefColumnCount(6);
        power.textProperty().bindBidirectional(vm.power());
        ProgressIndicator spinner = new ProgressIndicator();
        spinner.setId("design-busy");
        spinner.setMaxSize(dev.proofrun.app.shell.Em.of(1.8), dev.proofrun.app.shell.Em.of(1.8));
        spinner.visibleProperty().bind(vm.busyProperty());
        Label refusal = new Label();
        refusal.setId("design-refusal");
        refusal.getStyleClass().add("pr-problem");
        refusal.setWrapText(true);
        refusal.textProperty().bind(vm.refusalProperty());
        GridPane form = new GridPane();
        form.getStyleClass().add("pr-form");
        Label powerLabel = new Label("Wanted power (chance to show the goal if the process is as expected)");
        powerLabel.setLabelFor(power);
        form.addRow(0, powerLabel, power, spinner);

        table.setId("designs");
        table.setItems(vm.rows());
        // two-line column headers; as tall as the candidate designs, no empty rows to make and style
        dev.proofrun.app.shell.Tables.fitToRows(table, 3.6, 3, 10);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.getColumns().addAll(List.of(
                column("n", "Subgroup size n: consecutive parts taken at each slot", r -> Integer.toString(r.subgroupSize())),
                column("k", "Number of subgroups k", r -> Integer.toString(r.subgroups())),
                column("N", "Readings N = n·k", r -> Integer.toString(r.readings())),
                column("Power", "Chance that grading returns 'demonstrated' when the process is as expected: the lower "
                        + "bound reaches the required minimum and no check (shape, stability, lost subgroups) voids "
                        + "the study", r -> SizingViewModel.fmt(r.power())),
                column("Bound alone", "Chance that the lower bound alone reaches the required minimum (no checks "
                        + "counted)", r -> SizingViewModel.fmt(r.boundPower())),
                column("ĉ* to pass", "ĉ*: the smallest estimated index whose lower bound reaches the "
                        + "required minimum, at the expected centring", r -> SizingViewModel.fmt(r.criticalEstimate())),
                column("ν", "Degrees of freedom of the within-sigma estimate (effective, after Patnaik 1950, for "
                        + "R̄/d2, S̄/c4 and moving range)", r -> String.format(java.util.Locale.ROOT, "%.1f", r.degreesOfFreedom())),
                column("Set by", "What fixed k: the wanted power, or a practice floor (25 subgroups, 100 readings)",
                        r -> r.limitedBy().token()),
                column("Called unstable\nwhen stable", "Chance that grading calls a stable process unstable (and the "
                        + "study not valid), with grading's own stability rule at this number of subgroups",
                        r -> SizingViewModel.fmt(r.falseAlarm())),
                column("Called unstable\nafter a shift", "Chance that grading calls the process unstable when its mean "
                        + "moves by δ·σ_w for the second half of the study (grading's own rule)",
                        r -> SizingViewModel.fmt(r.detection())),
                column("Some rule fires\nstable / shift", "Chance that some chart rule fires at least once in the "
                        + "study (all eight run rules), on a stable process / after the shift: what a chart shows, "
                        + "not what grading decides",
                        r -> SizingViewModel.fmtOrDash(r.anySignalFalseAlarm().allRules()) + " / "
                                + SizingViewModel.fmtOrDash(r.anySignalDetection().allRules()))));
        // each row marks itself when it shows the recommended design, and again when the recommendation
        // changes (a table refresh would remake every row and cell)
        table.setRowFactory(t -> new TableRow<>() {
            private final InvalidationListener restyle = o -> mark();

            {
                vm.tableProperty().addListener(new WeakInvalidationListener(restyle));
            }

            @Override
            protected void updateItem(DesignRow r, boolean empty) {
                super.updateItem(r, empty);
                mark();
            }

            private void mark() {
                DesignRow r = getItem();
                DesignTable dt = vm.tableProperty().get();
                boolean recommended = !isEmpty() && r != null && dt != null
                        && dt.recommended().subgroupSize() == r.subgroupSize();
                if (recommended != getStyleClass().contains("pr-recommended")) {
                    if (recommended) {
                        getStyleClass().add("pr-recommended");
                    } else {
                        getStyleClass().remove("pr-recommended");
                    }
                }
            }
        });
        table.getSelectionModel().selectedItemProperty().addListener((obs, was, now) -> {
            if (now != null && (vm.chosenProperty().get() == null || vm.chosenProperty().get().subgroupSize() != now.subgroupSize())) {
                vm.choose(now);
            }
        });
        vm.chosenProperty().addListener((obs, was, now) -> selectChosen(vm));

        Label reason = new Label();
        reason.setId("design-reason");
        reason.setWrapText(true);
        reason.getStyleClass().add("pr-fine");
        reason.textProperty().bind(Bindings.createStringBinding(() -> vm.tableProperty().get() == null ? ""
                : "Recommended: " + vm.tableProperty().get().reason(), vm.tableProperty()));
        Label cost = new Label();
        cost.setId("design-cost");
        cost.setWrapText(true);
        cost.textProperty().bind(vm.costBinding());
        Label together = new Label();
        together.setId("design-together");
        together.setWrapText(true);
        together.textProperty().bind(vm.togetherProperty());
        together.visibleProperty().bind(vm.togetherProperty().isNotEmpty());
        together.managedProperty().bind(together.visibleProperty());
        Label warnings = new Label();
        warnings.setId("design-warnings");
        warnings.setWrapText(true);
        warnings.getStyleClass().add("pr-note");
        warnings.textProperty().bind(Bindings.createStringBinding(() -> vm.tableProperty().get() == null ? ""
                : String.join("\n", vm.tableProperty().get().warnings()), vm.tableProperty()));

        vm.chosenTableProperty().addListener((obs, was, now) -> drawCurves(vm, now));
        vm.designBinding().addListener((obs, was, now) -> drawCurves(vm, vm.chosenTableProperty().get()));
        HBox charts = new HBox(12, powerChart, ocChart);
        HBox.setHgrow(powerChart, Priority.ALWAYS);
        HBox.setHgrow(ocChart, Priority.ALWAYS);

        Label hint = new Label("Pick a row to use another subgroup size; the line below says what it costs.");
        hint.getStyleClass().add("pr-note");
        VBox card = new VBox(form, refusal, table, hint, reason, cost, together, warnings);
        card.getStyleClass().add("pr-card");
        root.getChildren().addAll(card, charts);
    }

    private void selectChosen(SizingViewModel vm) {
        DesignRow c = vm.chosenProperty().get();
        if (c == null) {
            return;
        }
        for (int i = 0; i < table.getItems().size(); i++) {
            if (table.getItems().get(i).subgroupSize() == c.subgroupSize()) {
                if (table.getSelectionModel().getSelectedIndex() != i) {
                    table.getSelectionModel().select(i);
                }
                return;
            }
        }
    }

    private void drawCurves(SizingViewModel vm, DesignTable t) {
        List<Line> power = new ArrayList<>();
        List<Line> ocLines = new ArrayList<>();
        if (t != null) {
            DesignRow c = t.recommended();
            List<PowerPoint> pc = t.powerCurve();
            if (!pc.isEmpty()) {
                power.add(new Line("power, n = " + c.subgroupSize(), Pen.CURVE,
                        pc.stream().mapToDouble(PowerPoint::subgroups).toArray(),
                        pc.stream().mapToDouble(PowerPoint::power).toArray()));
                double wanted = vm.request().map(r -> r.power()).orElse(0.9);
                power.add(Line.horizontal("wanted " + SizingViewModel.fmt(wanted), Pen.WANTED, wanted,
                        pc.get(0).subgroups(), pc.get(pc.size() - 1).subgroups()));
                // the k the plan will use: the plan file's own k until a row is picked, else the row's
                int k = vm.design().map(d -> d.subgroups()).orElse(c.subgroups());
                power.add(Line.vertical((k == c.subgroups() ? "chosen k = " : "plan's k = ") + k, Pen.CHOSEN, k));
            }
            List<OcPoint> oc = t.operatingCharacteristic();
            if (!oc.isEmpty()) {
                ocLines.add(new Line(c.subgroups() + " × " + c.subgroupSize(), Pen.CURVE,
                        oc.stream().mapToDouble(OcPoint::trueIndex).toArray(),
                        oc.stream().mapToDouble(OcPoint::probability).toArray()));
                vm.request().ifPresent(r -> {
                    ocLines.add(Line.vertical("required " + r.requirement().minimum(), Pen.WANTED, r.requirement().minimum()));
                    ocLines.add(Line.vertical("expected " + SizingViewModel.fmt(r.expectation().index()), Pen.CHOSEN,
                            r.expectation().index()));
                });
            }
        }
        powerChart.show(power);
        ocChart.show(ocLines);
    }

    private static TableColumn<DesignRow, String> column(String title, String tip, Function<DesignRow, String> text) {
        TableColumn<DesignRow, String> c = new TableColumn<>();
        Label header = new Label(title);
        header.setTooltip(new Tooltip(tip));
        header.setWrapText(true);
        c.setGraphic(header);
        c.setSortable(false);
        // a width of its own: the default width makes the skin measure every cell on the first showing
        // (hundreds of ms on a loaded machine); the constrained policy spreads the columns anyway
        c.setPrefWidth(dev.proofrun.app.shell.Em.of(7));
        c.setCellValueFactory(cd -> new ReadOnlyStringWrapper(text.apply(cd.getValue())));
        return c;
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return table;
    }
}
