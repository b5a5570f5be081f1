package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TablePosition;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;

/**
 * The characteristics grid by keyboard, on the demo plan: Tab, Shift+Tab, Enter, Escape, Delete, a pasted
 * 3 × 4 block and undo, while the fields above the grid (plan id, part number, name, prepared by) never
 * change and never take the focus.
 */
@UsesToolkit
class GridKeyboardTest extends WizardRobotTest {

    private static final List<String> FIELDS = List.of("#plan-id", "#part-number", "#part-name", "#prepared-by");

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    private List<String> fields(FxRobot robot) throws Exception {
        return fx(() -> FIELDS.stream().map(q -> robot.lookup(q).queryAs(TextField.class).getText()).toList());
    }

    private String cell(int row, CharacteristicField f) throws Exception {
        return fx(() -> rows().get(row).text(f));
    }

    private List<CharacteristicDraft> rows() {
        return app.wizard().session().draft().characteristics();
    }

    /** The cell being edited as (row, column), or null. */
    private int[] editing(TableView<?> table) throws Exception {
        return fx(() -> {
            TablePosition<?, ?> p = table.getEditingCell();
            return p == null ? null : new int[] {p.getRow(), p.getColumn()};
        });
    }

    private int[] focused(TableView<?> table) throws Exception {
        return fx(() -> {
            TablePosition<?, ?> p = table.getFocusModel().getFocusedCell();
            return new int[] {p.getRow(), p.getColumn()};
        });
    }

    private void focusNotOnAField(FxRobot robot) throws Exception {
        Node owner = fx(() -> stage.getScene().getFocusOwner());
        assertTrue(owner == null || !FIELDS.contains("#" + owner.getId()), "focus left the grid for " + owner);
    }

    private TextField editor(FxRobot robot) {
        return robot.lookup(".table-cell .text-field").queryAs(TextField.class);
    }

    @Test
    void theGridTakesTabShiftTabEnterEscapeDeletePasteAndUndo(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        @SuppressWarnings("unchecked")
        TableView<CharacteristicDraft> table = robot.lookup("#characteristics").queryAs(TableView.class);
        List<String> header = fields(robot);
        int rowsAtStart = fx(() -> rows().size());
        int columns = CharacteristicField.values().length;

        // edit the name of row 1; Tab commits and edits the next cell (unit)
        robot.interact(() -> {
            table.requestFocus();
            table.getSelectionModel().select(0);
            TableColumn<CharacteristicDraft, ?> name = table.getColumns().get(CharacteristicField.NAME.ordinal());
            table.getFocusModel().focus(0, name);
            table.edit(0, name);
        });
        robot.interact(() -> editor(robot).setText("Bore diameter A"));
        robot.type(KeyCode.TAB);
        assertEquals("Bore diameter A", cell(0, CharacteristicField.NAME), "Tab commits");
        assertEquals(List.of(0, CharacteristicField.UNIT.ordinal()), List.of(editing(table)[0], editing(table)[1]));
        // Shift+Tab goes back to the name, editing
        robot.press(KeyCode.SHIFT).type(KeyCode.TAB).release(KeyCode.SHIFT);
        assertEquals(CharacteristicField.NAME.ordinal(), editing(table)[1]);

        // Escape cancels what was typed and keeps the focus in the grid
        robot.interact(() -> editor(robot).setText("typed then cancelled"));
        robot.type(KeyCode.ESCAPE);
        assertNull(editing(table));
        assertEquals("Bore diameter A", cell(0, CharacteristicField.NAME), "Escape cancels");
        focusNotOnAField(robot);

        // Enter edits the focused cell; Enter again commits and moves down, not into the plan id
        robot.type(KeyCode.ENTER);
        assertNotNull(editing(table), "Enter edits the focused cell");
        robot.interact(() -> editor(robot).setText("Bore diameter B"));
        robot.type(KeyCode.ENTER);
        assertNull(editing(table));
        assertEquals("Bore diameter B", cell(0, CharacteristicField.NAME));
        assertEquals(List.of(1, CharacteristicField.NAME.ordinal()), List.of(focused(table)[0], focused(table)[1]));
        focusNotOnAField(robot);

        // Delete clears the focused cell; undo puts it back
        String before = cell(1, CharacteristicField.NAME);
        robot.type(KeyCode.DELETE);
        assertEquals("", cell(1, CharacteristicField.NAME));
        robot.press(KeyCode.CONTROL).type(KeyCode.Z).release(KeyCode.CONTROL);
        assertEquals(before, cell(1, CharacteristicField.NAME), "Ctrl+Z undoes the clear");

        // Tab from the last cell of the last row wraps into a new row
        robot.interact(() -> {
            int last = rows().size() - 1;
            table.getSelectionModel().select(last);
            table.getFocusModel().focus(last, table.getColumns().get(columns - 1));
        });
        robot.type(KeyCode.TAB);
        assertEquals(rowsAtStart + 1, (int) fx(() -> rows().size()), "a new row at the end");
        assertEquals(List.of(rowsAtStart, 0), List.of(focused(table)[0], focused(table)[1]));

        // a 3 x 4 block pasted at (row 1, nominal): nominal, lsl, usl, index of rows 1..3
        List<java.util.Map<String, String>> before3x4 = fx(() -> rows().subList(0, 3).stream().map(CharacteristicDraft::values)
                .toList());
        robot.interact(() -> {
            ClipboardContent c = new ClipboardContent();
            c.putString("10.0\t9.9\t10.1\tcpk\n20.0\t19.8\tnot a number\tppk\n30.0\t29.7\t30.3\tPpk\n");
            Clipboard.getSystemClipboard().setContent(c);
            table.getSelectionModel().select(0);
            table.getFocusModel().focus(0, table.getColumns().get(CharacteristicField.NOMINAL.ordinal()));
        });
        robot.press(KeyCode.CONTROL).type(KeyCode.V).release(KeyCode.CONTROL);
        assertEquals("10.0", cell(0, CharacteristicField.NOMINAL));
        assertEquals("cpk", cell(0, CharacteristicField.INDEX));
        assertEquals("not a number", cell(1, CharacteristicField.USL), "pasted as copied, then checked");
        assertEquals("Ppk", cell(2, CharacteristicField.INDEX));
        assertTrue(fx(() -> app.wizard().part().problem(rows().get(1), CharacteristicField.USL)).isPresent(),
                "the bad cell is marked");
        robot.press(KeyCode.CONTROL).type(KeyCode.Z).release(KeyCode.CONTROL);
        assertEquals(before3x4, fx(() -> rows().subList(0, 3).stream().map(CharacteristicDraft::values).toList()),
                "Ctrl+Z undoes the whole paste");

        assertEquals(header, fields(robot), "no field outside the grid changed");
        focusNotOnAField(robot);
    }
}
