package dev.proofrun.app.shell;

import javafx.beans.binding.Bindings;
import javafx.scene.control.TableView;

/** Sizes for the wizard's read-only tables. */
public final class Tables {

    /** The height of one row: one line of text and the cell's padding. */
    public static final double ROW_EM = 2.0;

    private Tables() {
    }

    /**
     * Rows of one fixed height, and a table as tall as its rows (between {@code minRows} and
     * {@code maxRows}, then it scrolls). The table then makes cells only for the rows there are and
     * measures none of them; a table of a fixed tall height fills its viewport with empty rows, each with
     * a cell per column, all made and styled on the first showing.
     *
     * @param headerEm the height of the column headers, in em
     */
    public static void fitToRows(TableView<?> table, double headerEm, int minRows, int maxRows) {
        table.setFixedCellSize(FontScale.of(ROW_EM));
        fitHeight(table, headerEm, minRows, maxRows);
    }

    /**
     * {@link #fitToRows} without fixing the row height, for tables edited in place (the editing field
     * keeps its own height): only the height follows the rows.
     */
    public static void fitHeight(TableView<?> table, double headerEm, int minRows, int maxRows) {
        double row = FontScale.of(ROW_EM);
        table.prefHeightProperty().bind(Bindings.createDoubleBinding(
                () -> FontScale.of(headerEm) + row * Math.max(minRows, Math.min(maxRows, table.getItems().size())) + 2,
                Bindings.size(table.getItems())));
        table.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
    }
}
