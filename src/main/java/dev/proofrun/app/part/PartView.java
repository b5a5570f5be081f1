package dev.proofrun.app.part;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.shell.StepView;
import java.io.File;
import java.nio.file.Files;
import javafx.beans.binding.Bindings;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TablePosition;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.control.cell.TextFieldTableCell;
import javafx.scene.input.Clipboard;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;

/** The part's header fields and the editable table of characteristics. */
public final class PartView implements StepView {

    private final VBox root = new VBox();
    private final TextField planId = new TextField();

    public PartView(PartViewModel vm) {
        root.setSpacing(12);
        GridPane form = new GridPane();
        form.getStyleClass().addAll("pr-card", "pr-form");
        planId.setId("plan-id");
        planId.textProperty().bindBidirectional(vm.planId());
        TextField number = new TextField();
        number.setId("part-number");
        number.textProperty().bindBidirectional(vm.partNumber());
        TextField name = new TextField();
        name.setId("part-name");
        name.textProperty().bindBidirectional(vm.partName());
        TextField by = new TextField();
        by.setId("prepared-by");
        by.textProperty().bindBidirectional(vm.preparedBy());
        for (TextField f : new TextField[] {planId, number, name, by}) {
            f.setPrefColumnCount(22);
            f.setMinWidth(dev.proofrun.app.shell.FontScale.of(8)); // a narrow window narrows the fields, not the page
        }
        form.addRow(0, label("_Plan id", planId), planId, label("Part n_umber", number), number);
        form.addRow(1, label("Part na_me", name), name, label("Prepared b_y", by), by);

        TableView<CharacteristicDraft> table = new TableView<>(vm.rows());
        table.setId("characteristics");
        table.setEditable(true);
        // as tall as its rows: at least 6, at most 12 (then it scrolls); fewer blank rows to make and style
        dev.proofrun.app.shell.Tables.fitHeight(table, 2.2, 6, 12);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        // as wide as the card, not as the columns' widths added up: the columns share what there is
        table.setPrefWidth(dev.proofrun.app.shell.FontScale.of(40));
        Grid grid = new Grid(table, vm);
        table.addEventFilter(KeyEvent.KEY_PRESSED, grid::keyOnTable);
        for (CharacteristicField f : CharacteristicField.values()) {
            TableColumn<CharacteristicDraft, String> c = new TableColumn<>();
            String title = PartHeaders.header(f);
            if (dev.proofrun.app.shell.IndexTooltips.tipsFor(title).isEmpty()) {
                Label head = new Label(title);
                PartHeaders.headerTip(f).ifPresent(t -> head.setTooltip(wrapping(t)));
                c.setGraphic(head);
            } else {
                // a title naming an index carries its tooltip, as every label naming one does
                c.setGraphic(dev.proofrun.app.shell.IndexTooltips.follow(new Label(title)));
            }
            c.setId("col-" + f.header());
            // a width of its own: the default width makes the skin measure every cell on the first showing
            // (hundreds of ms on a loaded machine); the constrained policy spreads the rest
            c.setPrefWidth(dev.proofrun.app.shell.FontScale.of(switch (f) {
                case NAME -> 8;
                case GAUGE, SHAPE -> 6.5;
                case ID, UNIT, INDEX, TARGET, CONFIDENCE -> 4;
                case EXPECTED, EXPECTED_CP, RESOLUTION -> 5.5;
                default -> 5.5;
            }));
            // never narrower than its header's longest line (bold), so a narrow window does not cut a title
            int longest = java.util.Arrays.stream(title.split("\n")).mapToInt(String::length).max().orElse(1);
            boolean limit = f == CharacteristicField.LSL || f == CharacteristicField.USL || f == CharacteristicField.NOMINAL;
            // limits: "21.987"; shape: "lognormal3"; a name stays readable ("Bore diameter")
            double least = limit ? 5 : f == CharacteristicField.SHAPE ? 6.5 : f == CharacteristicField.NAME ? 7 : 0;
            c.setMinWidth(dev.proofrun.app.shell.FontScale.of(Math.max(0.62 * longest + 1, least)));
            c.setCellValueFactory(cd -> cd.getValue().cell(f));
            c.setCellFactory(col -> new CheckedCell(vm, f, grid));
            c.setOnEditCommit(e -> vm.setCell(e.getTablePosition().getRow(), f, e.getNewValue()));
            table.getColumns().add(c);
        }
        // never narrower than its columns' least widths: a narrow window scrolls the page sideways instead of
        // hiding the last columns
        table.setMinWidth(table.getColumns().stream().mapToDouble(TableColumn::getMinWidth).sum()
                + dev.proofrun.app.shell.FontScale.of(0.5));
        table.getSelectionModel().selectedIndexProperty().addListener((obs, was, now) -> vm.selectedProperty().set(now.intValue()));
        vm.selectedProperty().addListener((obs, was, now) -> {
            if (table.getSelectionModel().getSelectedIndex() != now.intValue()) {
                table.getSelectionModel().select(now.intValue());
            }
        });

        Label rowProblem = new Label();
        rowProblem.setId("row-problem");
        rowProblem.getStyleClass().add("pr-problem");
        rowProblem.setWrapText(true);
        rowProblem.textProperty().bind(Bindings.when(vm.typingProblemProperty().isNotEmpty())
                .then(vm.typingProblemProperty())
                .otherwise(Bindings.when(vm.selectedProblemBinding().isEmpty())
                        .then(vm.firstProblemBinding()).otherwise(vm.selectedProblemBinding())));

        Button add = new Button("_Add characteristic");
        add.setId("add-row");
        add.setOnAction(e -> {
            vm.addRow();
            // after the button's own handling: fired by its mnemonic (Alt+A) the button takes the focus once the action
            // has run, and the new row's name would be in edit with nowhere for the typing to go
            int row = vm.rows().size() - 1;
            javafx.application.Platform.runLater(() -> grid.go(row, CharacteristicField.NAME.ordinal(), true));
        });
        Button remove = new Button("_Remove");
        remove.setId("remove-row");
        remove.disableProperty().bind(table.getSelectionModel().selectedIndexProperty().lessThan(0));
        remove.setOnAction(e -> vm.removeRow(table.getSelectionModel().getSelectedIndex()));
        Button importCsv = new Button("_Import list…");
        importCsv.setId("import-list");
        importCsv.setTooltip(new Tooltip("A CSV file with the columns "
                + dev.proofrun.app.session.CharacteristicField.headers() + " (the command line's characteristics CSV)"));
        importCsv.setOnAction(e -> {
            FileChooser fc = new FileChooser();
            fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("CSV list", "*.csv"));
            File f = fc.showOpenDialog(root.getScene().getWindow());
            if (f != null && Files.isRegularFile(f.toPath())) {
                vm.importList(f.toPath());
            }
        });
        Label imported = new Label();
        imported.setId("import-message");
        imported.getStyleClass().add("pr-note");
        imported.setWrapText(true);
        imported.textProperty().bind(vm.importMessageProperty());
        imported.managedProperty().bind(imported.textProperty().isNotEmpty());
        for (Button b : new Button[] {add, remove, importCsv}) {
            b.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE); // a long message never squeezes a label to "…"
        }
        HBox actions = new HBox(8, add, remove, importCsv);
        Label keys = new Label("Characteristics (Enter or double-click to edit a cell; Tab to the next cell,"
                + " Ctrl+V pastes cells copied from a spreadsheet, Ctrl+Z undoes)");
        keys.setWrapText(true); // a narrow window wraps it instead of widening the page
        keys.setMinWidth(0);
        VBox card = new VBox(keys, table, rowProblem, actions, imported);
        card.getStyleClass().add("pr-card");
        root.getChildren().addAll(form, card);
    }

    /** A tooltip that wraps at a readable width instead of running off the screen. */
    private static Tooltip wrapping(String text) {
        Tooltip t = new Tooltip(text);
        t.setWrapText(true);
        t.setMaxWidth(dev.proofrun.app.shell.FontScale.of(30));
        return t;
    }

    private static Label label(String text, Node field) {
        Label l = new Label(text);
        l.setMnemonicParsing(true);
        l.setLabelFor(field);
        return l;
    }

    @Override
    public Node root() {
        return root;
    }

    @Override
    public Node firstFocus() {
        return planId;
    }

    /** A text cell that is marked when the view-model finds a problem in it, with the problem as tooltip. */
    private static final class CheckedCell extends TextFieldTableCell<CharacteristicDraft, String> {
        private final PartViewModel vm;
        private final CharacteristicField field;

        private final Grid grid;

        CheckedCell(PartViewModel vm, CharacteristicField field, Grid grid) {
            super(new javafx.util.converter.DefaultStringConverter());
            this.vm = vm;
            this.field = field;
            this.grid = grid;
            vm.rows().addListener((javafx.collections.ListChangeListener<CharacteristicDraft>) c -> mark());
        }

        /** Checks each keystroke (the view-model's rules on the text as typed); commits on Enter or leaving the cell. */
        @Override
        public void startEdit() {
            CharacteristicDraft row = getTableRow() == null ? null : getTableRow().getItem();
            if (row != null && !vm.cellOpen(row, field)) {
                return; // nothing to hold here (a threshold on a shape that takes none)
            }
            super.startEdit();
            if (isEditing() && row != null && getGraphic() instanceof TextField tf) {
                tf.setId("editing-" + field.header());
                tf.textProperty().addListener((obs, was, now) -> {
                    if (isEditing()) {
                        vm.typing(row, field, now);
                    }
                });
                tf.addEventFilter(KeyEvent.KEY_PRESSED, k -> {
                    int at = getIndex();
                    switch (k.getCode()) {
                        case TAB -> {
                            k.consume();
                            commitEdit(tf.getText());
                            grid.step(at, field.ordinal(), k.isShiftDown() ? -1 : 1, true);
                        }
                        case ENTER -> {
                            k.consume();
                            commitEdit(tf.getText());
                            grid.go(Math.min(at + 1, vm.rows().size() - 1), field.ordinal(), false);
                        }
                        case ESCAPE -> {
                            k.consume();
                            cancelEdit();
                            grid.go(at, field.ordinal(), false);
                        }
                        default -> { }
                    }
                });
                tf.focusedProperty().addListener((obs, was, now) -> {
                    if (!now && isEditing()) {
                        commitEdit(tf.getText());
                    }
                });
            }
        }

        @Override
        public void commitEdit(String value) {
            super.commitEdit(value);
            vm.typingDone();
        }

        @Override
        public void cancelEdit() {
            super.cancelEdit();
            vm.typingDone();
        }

        @Override
        public void updateItem(String item, boolean empty) {
            super.updateItem(item, empty);
            mark();
        }

        private String shown = "";
        private boolean closed;

        /**
         * Marks the cell when its problem changed (cheap when nothing changed: no new tooltip, no restyle), and
         * greys it while it has nothing to hold.
         */
        private void mark() {
            CharacteristicDraft row = getTableRow() == null ? null : getTableRow().getItem();
            boolean shut = row != null && !isEmpty() && !vm.cellOpen(row, field);
            if (shut != closed) {
                closed = shut;
                getStyleClass().remove("pr-unused");
                if (shut) {
                    getStyleClass().add("pr-unused");
                }
            }
            String now = row == null || isEmpty() ? "" : vm.problem(row, field).orElse("");
            if (now.equals(shown)) {
                return;
            }
            shown = now;
            getStyleClass().remove("pr-invalid");
            setTooltip(null);
            if (!now.isEmpty()) {
                getStyleClass().add("pr-invalid");
                setTooltip(new Tooltip(now));
            }
        }
    }

    /**
     * The characteristics table as a grid people type into: Tab / Shift+Tab to the next / previous cell
     * (wrapping to the next row; a new row after the last cell), Enter edits the focused cell and, while
     * editing, commits and moves down, Escape cancels, Delete clears, Ctrl+V pastes a tab-separated block,
     * Ctrl+Z undoes the last grid edit. Keys never reach a field outside the grid (Ctrl+Tab leaves it).
     */
    private static final class Grid {
        private final TableView<CharacteristicDraft> table;
        private final PartViewModel vm;

        Grid(TableView<CharacteristicDraft> table, PartViewModel vm) {
            this.table = table;
            this.vm = vm;
        }

        /**
         * Moves one cell forward or back from (row, col), wrapping rows, past cells that hold nothing; past the last
         * cell adds a row.
         */
        void step(int row, int col, int direction, boolean edit) {
            int last = table.getColumns().size() - 1;
            int r = Math.max(row, 0);
            int c = col;
            do { // past the cells that hold nothing (a threshold on a shape that takes none)
                c += direction;
                if (c > last) {
                    c = 0;
                    r++;
                } else if (c < 0) {
                    c = r == 0 ? 0 : last;
                    r = Math.max(r - 1, 0);
                }
            } while (r < vm.rows().size() && !vm.cellOpen(vm.rows().get(r), CharacteristicField.values()[c]));
            if (r >= vm.rows().size()) {
                vm.addRow();
            }
            go(r, c, edit);
        }

        /** Focuses the cell (row, col) in the table, editing it if asked. */
        void go(int row, int col, boolean edit) {
            if (row < 0 || row >= vm.rows().size()) {
                table.requestFocus();
                return;
            }
            TableColumn<CharacteristicDraft, ?> column = table.getColumns().get(col);
            table.requestFocus();
            table.getSelectionModel().clearAndSelect(row);
            table.getFocusModel().focus(row, column);
            table.scrollTo(row);
            if (edit) {
                table.edit(row, column);
            }
        }

        void keyOnTable(KeyEvent k) {
            if (table.getEditingCell() != null) {
                return; // the cell's own field handles its keys
            }
            TablePosition<CharacteristicDraft, ?> at = table.getFocusModel().getFocusedCell();
            int row = at == null ? -1 : at.getRow();
            int col = at == null || at.getColumn() < 0 ? 0 : at.getColumn();
            CharacteristicField field = CharacteristicField.values()[col];
            if (k.getCode() == KeyCode.TAB && !k.isShortcutDown()) {
                step(row, col, k.isShiftDown() ? -1 : 1, false);
            } else if (k.getCode() == KeyCode.ENTER && row >= 0) {
                go(row, col, true);
            } else if ((k.getCode() == KeyCode.DELETE || k.getCode() == KeyCode.BACK_SPACE) && row >= 0) {
                vm.setCell(row, field, "");
            } else if (k.getCode() == KeyCode.V && k.isShortcutDown()) {
                String text = Clipboard.getSystemClipboard().getString();
                vm.paste(row < 0 ? vm.rows().size() : row, col, text);
            } else if (k.getCode() == KeyCode.Z && k.isShortcutDown()) {
                vm.undo();
            } else {
                return;
            }
            k.consume();
        }
    }
}
