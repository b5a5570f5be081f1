package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import java.nio.file.Files;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.TablePosition;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * A new plan typed from scratch by keyboard sets the shape lognormal3 and its threshold in the grid: Tab from the
 * Shape cell edits the Threshold cell once the shape takes one, and passes over it (greyed) while the shape takes
 * none.
 */
@UsesToolkit
@ExtendWith(ApplicationExtension.class)
class ThresholdGridTest {

    private WizardApp app;

    @Start
    void start(Stage stage) throws Exception {
        var home = Files.createTempDirectory("proofrun-threshold");
        app = new WizardApp();
        app.start(stage, new AppHome(home, home.resolve("plans")));
    }

    private static <T> T fx(Callable<T> read) throws Exception {
        return WaitForAsyncUtils.asyncFx(read).get(Settle.TIMEOUT_S, TimeUnit.SECONDS);
    }

    private List<CharacteristicDraft> rows() {
        return app.wizard().session().draft().characteristics();
    }

    /** The column being edited, or -1. */
    private int editingColumn(TableView<?> table) throws Exception {
        return fx(() -> {
            TablePosition<?, ?> p = table.getEditingCell();
            return p == null ? -1 : p.getColumn();
        });
    }

    /** Types text into the cell being edited, then Tab. */
    private void typeAndTab(FxRobot robot, String text) {
        robot.write(text);
        robot.type(KeyCode.TAB);
    }

    @Test
    void aNewPlanByKeyboardTakesLognormal3AndItsThreshold(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        robot.press(KeyCode.CONTROL).type(KeyCode.DIGIT1).release(KeyCode.CONTROL);
        Settle.onStep(app, 0);
        robot.press(KeyCode.ALT).type(KeyCode.S).release(KeyCode.ALT); // Start a new plan
        WaitForAsyncUtils.waitFor(Settle.TIMEOUT_S, TimeUnit.SECONDS, () -> fx(() -> rows().isEmpty()));
        robot.press(KeyCode.CONTROL).type(KeyCode.DIGIT2).release(KeyCode.CONTROL);
        Settle.onStep(app, 1);
        @SuppressWarnings("unchecked")
        TableView<CharacteristicDraft> table = robot.lookup("#characteristics").queryAs(TableView.class);

        // Add characteristic (Alt+A) edits the new row's name; Tab on to the shape, typing as we go
        robot.press(KeyCode.ALT).type(KeyCode.A).release(KeyCode.ALT);
        WaitForAsyncUtils.waitFor(Settle.TIMEOUT_S, TimeUnit.SECONDS,
                () -> editingColumn(table) == CharacteristicField.NAME.ordinal());
        for (String cell : new String[] {"Runout", "mm", "", "", "0.080", "ppu", "1.33", "0.95", "1.8", ""}) {
            typeAndTab(robot, cell);
        }
        assertEquals(CharacteristicField.SHAPE.ordinal(), editingColumn(table));
        typeAndTab(robot, "lognormal3");
        assertEquals(CharacteristicField.THRESHOLD.ordinal(), editingColumn(table),
                "Tab from lognormal3 edits the threshold");
        typeAndTab(robot, "0.005");
        assertEquals(CharacteristicField.FLOOR.ordinal(), editingColumn(table), "the floor, the other way to give it, is next");
        typeAndTab(robot, "");
        assertEquals(CharacteristicField.GAUGE.ordinal(), editingColumn(table));
        CharacteristicDraft row = fx(() -> rows().get(0));
        assertEquals("lognormal3", fx(() -> row.text(CharacteristicField.SHAPE)));
        assertEquals("0.005", fx(() -> row.text(CharacteristicField.THRESHOLD)));
        assertEquals("0.080", fx(() -> row.text(CharacteristicField.USL)));
        assertFalse(fx(() -> app.wizard().part().problem(row, CharacteristicField.THRESHOLD)).isPresent());

        // on past gauge and resolution into a new row, left normal: Tab passes its greyed threshold, Shape to Gauge
        typeAndTab(robot, "");
        typeAndTab(robot, "");
        assertEquals(2, (int) fx(() -> rows().size()), "a new row after the last cell");
        assertEquals(CharacteristicField.ID.ordinal(), editingColumn(table));
        for (String cell : new String[] {"", "Length", "mm", "40", "39.9", "40.1", "", "", "", "1.6", ""}) {
            typeAndTab(robot, cell);
        }
        assertEquals(CharacteristicField.SHAPE.ordinal(), editingColumn(table));
        robot.type(KeyCode.TAB);
        assertEquals(CharacteristicField.GAUGE.ordinal(), editingColumn(table), "the shut threshold and floor are passed over");
        robot.type(KeyCode.ESCAPE);
        assertTrue(fx(() -> robot.lookup(".pr-unused").queryAll().size()) >= 1, "the shut cell is greyed");
        assertEquals("", fx(() -> rows().get(1).text(CharacteristicField.THRESHOLD)));

        // after Escape, Add characteristic by its mnemonic takes the typing into the new row's name
        robot.press(KeyCode.ALT).type(KeyCode.A).release(KeyCode.ALT);
        WaitForAsyncUtils.waitFor(Settle.TIMEOUT_S, TimeUnit.SECONDS,
                () -> fx(() -> rows().size()) == 3 && editingColumn(table) == CharacteristicField.NAME.ordinal());
        robot.write("Seat height");
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Seat height", fx(() -> rows().get(2).text(CharacteristicField.NAME)));
    }
}
