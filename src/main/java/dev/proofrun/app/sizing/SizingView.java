package dev.proofrun.app.sizing;

import dev.proofrun.app.chart.CurvePlot;
import dev.proofrun.app.shell.FontScale;
import dev.proofrun.app.shell.StepView;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
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

/**
 * The characteristic the table sizes, the candidate designs, the recommendation, the chosen design's cost, the
 * design for all characteristics and the two curves. It binds display rows, texts and chart lines the view-model
 * provides; it imports nothing of the core.
 */
public final class SizingView implements StepView {

    private final VBox root = new VBox(12);
    private final TableView<SizingRow> table = new TableView<>();
    private final CurvePlot powerChart =
            new CurvePlot("power-chart", "Power against subgroups", "subgroups k", "power");
    private final CurvePlot ocChart =
            new CurvePlot("oc-chart", "Chance to demonstrate", "true index", "probability");
    private final CurvePlot readingsChart =
            CurvePlot.spanning("expected-readings-chart", SizingMessage.READINGS_TITLE.format(), "true index", "readings");

    public SizingView(SizingViewModel vm) {
        TextField power = new TextField();
        power.setId("power");
        power.setPrefColumnCount(6);
        power.textProperty().bindBidirectional(vm.power());
        ProgressIndicator spinner = new ProgressIndicator();
        spinner.setId("design-busy");
        spinner.setMaxSize(FontScale.of(1.8), FontScale.of(1.8));
        spinner.visibleProperty().bind(vm.busyProperty());
        Label refusal = note("design-refusal", "pr-problem");
        refusal.textProperty().bind(vm.refusalProperty());
        ComboBox<String> focus = new ComboBox<>(vm.characteristicIds());
        focus.setId("sizing-focus");
        focus.setValue(shownFocus(vm));
        vm.focusId().addListener((obs, was, now) -> focus.setValue(shownFocus(vm)));
        vm.characteristicIds().addListener((javafx.collections.ListChangeListener<String>) c -> focus.setValue(shownFocus(vm)));
        focus.valueProperty().addListener((obs, was, now) -> {
            if (now != null && !now.equalsIgnoreCase(shownFocus(vm))) {
                vm.focusId().set(now);
            }
        });
        // a chooser only when there is a choice; the sentence under it says which one is sized either way
        focus.disableProperty().bind(Bindings.size(vm.characteristicIds()).lessThan(2));
        GridPane form = new GridPane();
        form.getStyleClass().add("pr-form");
        Label powerLabel = new Label("Wanted power (chance to show the goal if the process is as expected)");
        powerLabel.setLabelFor(power);
        Label focusLabel = new Label(SizingMessage.SIZED_FOR.format());
        focusLabel.setLabelFor(focus);
        form.addRow(0, focusLabel, focus);
        form.addRow(1, powerLabel, power, spinner);
        LooksChoice choice = vm.staged().choice();
        ComboBox<String> looks = chooser("looks", choice.looksChoices(), choice.looksIndex().get(), choice::chooseLooks);
        choice.looksIndex().addListener((obs, was, now) -> looks.getSelectionModel().select(now.intValue()));
        ComboBox<String> spending = chooser("spending", choice.spendingChoices(), choice.spendingIndex().get(),
                choice::chooseSpending);
        choice.spendingIndex().addListener((obs, was, now) -> spending.getSelectionModel().select(now.intValue()));
        spending.disableProperty().bind(choice.staged().not());
        ProgressIndicator looksBusy = new ProgressIndicator();
        looksBusy.setId("looks-busy");
        looksBusy.setMaxSize(FontScale.of(1.8), FontScale.of(1.8));
        looksBusy.visibleProperty().bind(vm.staged().busy());
        Label looksLabel = new Label(SizingMessage.LOOKS_LABEL.format());
        looksLabel.setLabelFor(looks);
        Label spendingLabel = new Label(SizingMessage.SPENDING_LABEL.format());
        spendingLabel.setLabelFor(spending);
        form.addRow(2, looksLabel, looks, looksBusy);
        form.addRow(3, spendingLabel, spending);
        for (Label l : List.of(focusLabel, powerLabel, looksLabel, spendingLabel)) {
            l.setWrapText(true);
        }
        Label sizedFor = dev.proofrun.app.shell.IndexTooltips.follow(note("sizing-for", "pr-note"));
        sizedFor.textProperty().bind(vm.sizedForBinding());

        table.setId("designs");
        table.setItems(vm.shownRows());
        // grouped headers take two lines; as tall as the candidate designs, no empty rows to make and style
        dev.proofrun.app.shell.Tables.fitToRows(table, 4.2, 3, 10);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        Map<String, TableColumn<SizingRow, String>> groups = new LinkedHashMap<>();
        for (SizingColumn c : vm.columns()) {
            TableColumn<SizingRow, String> column = column(c);
            if (c.group().isEmpty()) {
                table.getColumns().add(column);
            } else {
                TableColumn<SizingRow, String> group = groups.computeIfAbsent(c.group().get(), g -> {
                    TableColumn<SizingRow, String> made = new TableColumn<>(g);
                    table.getColumns().add(made);
                    return made;
                });
                group.getColumns().add(column);
            }
        }
        table.setRowFactory(t -> new TableRow<>() {
            @Override
            protected void updateItem(SizingRow r, boolean empty) {
                super.updateItem(r, empty);
                boolean recommended = !empty && r != null && r.recommended();
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
            if (now != null) {
                vm.choose(now.subgroupSize());
            }
        });
        vm.chosenSizeBinding().addListener((obs, was, now) -> selectChosen(vm));
        vm.shownRows().addListener((javafx.collections.ListChangeListener<SizingRow>) c -> selectChosen(vm));

        Label reason = note("design-reason", "pr-fine");
        reason.textProperty().bind(vm.reasonBinding());
        Label cost = note("design-cost", null);
        cost.textProperty().bind(vm.costBinding());
        Label together = note("design-together", null);
        together.textProperty().bind(vm.togetherProperty());
        showWhenSet(together);
        Label shared = note("design-shared", null);
        shared.textProperty().bind(vm.sharedLineProperty());
        Button useShared = new Button(SizingMessage.USE_SHARED.format());
        useShared.setId("use-shared");
        useShared.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        useShared.disableProperty().bind(vm.sharedReadyBinding().not());
        useShared.setOnAction(e -> vm.useShared());
        HBox sharedRow = new HBox(8, shared, useShared);
        HBox.setHgrow(shared, Priority.ALWAYS);
        sharedRow.visibleProperty().bind(vm.sharedLineProperty().isNotEmpty());
        sharedRow.managedProperty().bind(sharedRow.visibleProperty());
        Label warnings = note("design-warnings", "pr-note");
        warnings.textProperty().bind(vm.warningsBinding());
        Label stagedText = note("looks-text", null);
        stagedText.textProperty().bind(vm.staged().text());
        showWhenSet(stagedText);

        powerChart.show(vm.powerLinesProperty().get());
        ocChart.show(vm.ocLinesProperty().get());
        vm.powerLinesProperty().addListener((obs, was, now) -> powerChart.show(now));
        vm.ocLinesProperty().addListener((obs, was, now) -> ocChart.show(now));
        readingsChart.show(vm.staged().readings().get());
        vm.staged().readings().addListener((obs, was, now) -> readingsChart.show(now));
        // the expected readings beside the operating characteristic, only when looks are planned
        readingsChart.visibleProperty().bind(vm.staged().readings().isNotEqualTo(List.of()));
        readingsChart.managedProperty().bind(readingsChart.visibleProperty());
        HBox charts = new HBox(12, powerChart, ocChart, readingsChart);
        HBox.setHgrow(powerChart, Priority.ALWAYS);
        HBox.setHgrow(ocChart, Priority.ALWAYS);
        HBox.setHgrow(readingsChart, Priority.ALWAYS);

        Label hint = new Label(SizingMessage.HINT.format());
        hint.getStyleClass().add("pr-note");
        hint.setWrapText(true);
        VBox card = new VBox(form, sizedFor, refusal, table, hint, reason, cost, sharedRow, together, stagedText, warnings);
        card.getStyleClass().add("pr-card");
        root.getChildren().addAll(card, charts);
    }

    private static String shownFocus(SizingViewModel vm) {
        String id = vm.focusId().get();
        for (String s : vm.characteristicIds()) {
            if (s.equalsIgnoreCase(id)) {
                return s;
            }
        }
        return vm.characteristicIds().isEmpty() ? null : vm.characteristicIds().get(0);
    }

    private static Label note(String id, String style) {
        Label l = new Label();
        l.setId(id);
        l.setWrapText(true);
        if (style != null) {
            l.getStyleClass().add(style);
        }
        return l;
    }

    private static void showWhenSet(Label l) {
        l.visibleProperty().bind(l.textProperty().isNotEmpty());
        l.managedProperty().bind(l.visibleProperty());
    }

    private static ComboBox<String> chooser(String id, List<String> items, int selected,
            java.util.function.IntConsumer chosen) {
        ComboBox<String> box = new ComboBox<>(javafx.collections.FXCollections.observableArrayList(items));
        box.setId(id);
        // its words whole: the labels beside it wrap instead
        box.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        box.getSelectionModel().select(selected);
        box.getSelectionModel().selectedIndexProperty().addListener((obs, was, now) -> {
            if (now.intValue() >= 0) {
                chosen.accept(now.intValue());
            }
        });
        return box;
    }

    private void selectChosen(SizingViewModel vm) {
        int n = vm.chosenSizeBinding().get();
        if (n == 0) {
            return;
        }
        List<SizingRow> items = table.getItems();
        for (int i = 0; i < items.size(); i++) {
            if (items.get(i).subgroupSize() == n) {
                if (table.getSelectionModel().getSelectedIndex() != i) {
                    table.getSelectionModel().select(i);
                }
                return;
            }
        }
    }

    private static TableColumn<SizingRow, String> column(SizingColumn c) {
        TableColumn<SizingRow, String> column = new TableColumn<>();
        Label header = new Label(c.header());
        Tooltip tip = new Tooltip(c.tip());
        tip.setWrapText(true); // a long explanation wraps instead of running off the screen
        tip.setMaxWidth(FontScale.of(28));
        header.setTooltip(tip);
        column.setGraphic(header);
        column.setSortable(false);
        // a width of its own: the default width makes the skin measure every cell on the first showing; the
        // constrained policy spreads the columns anyway
        column.setPrefWidth(FontScale.of(switch (c) {
            case N, K -> 3;
            case LIMITED_BY -> 8.5;
            default -> 4.5;
        }));
        column.setCellValueFactory(cd -> new ReadOnlyStringWrapper(c.text(cd.getValue())));
        return column;
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
