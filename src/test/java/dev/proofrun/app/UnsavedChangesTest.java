package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.Session;
import java.nio.file.Path;
import javafx.application.Platform;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import javafx.stage.WindowEvent;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** Typing into a table cell is checked as typed; closing with changes asks, and no answer loses the edit. */
@UsesToolkit
class UnsavedChangesTest extends WizardRobotTest {

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    @Test
    void aBadLimitIsMarkedInlineAndClosingAsksThenKeepsTheDraft(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        // edit the USL of D1 in the table: the problem shows under the table while typing, no dialog
        @SuppressWarnings("unchecked")
        TableView<dev.proofrun.app.session.CharacteristicDraft> table =
                robot.lookup("#characteristics").queryAs(TableView.class);
        robot.interact(() -> {
            table.getSelectionModel().select(0);
            table.edit(0, table.getColumns().get(CharacteristicField.USL.ordinal()));
        });
        robot.clickOn("#editing-usl");
        robot.interact(() -> robot.lookup("#editing-usl").queryAs(javafx.scene.control.TextField.class).selectAll());
        robot.write("21.9");
        WaitForAsyncUtils.waitForFxEvents();
        String problem = robot.lookup("#row-problem").queryAs(Label.class).getText();
        assertEquals("row 1 (D1): Nominal 22.0 lies outside the limits", problem, "checked while typing");
        robot.type(javafx.scene.input.KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("21.9", app.wizard().session().draft().characteristics().get(0).text(CharacteristicField.USL));
        assertTrue(robot.lookup("#next").queryButton().isDisabled());
        assertTrue(robot.lookup(".table-cell.pr-invalid").tryQuery().isPresent(), "the cell is marked");
        assertTrue(app.wizard().session().draft().dirtyProperty().get());

        // close: the question comes; "Stay" keeps the window
        Platform.runLater(() -> stage.fireEvent(new WindowEvent(stage, WindowEvent.WINDOW_CLOSE_REQUEST)));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#close-question").tryQuery().isPresent(), "the close question is shown");
        robot.clickOn("Stay");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(stage.isShowing());

        // close again and keep the draft: the window closes and the edit is in the side file
        Platform.runLater(() -> stage.fireEvent(new WindowEvent(stage, WindowEvent.WINDOW_CLOSE_REQUEST)));
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("Keep as a draft");
        WaitForAsyncUtils.waitForFxEvents();
        Path plan = home.resolve("plans").resolve("demo-valve-body.json");
        Session again = new Session(new AppHome(home, home.resolve("plans")));
        assertTrue(again.open(plan), "the newer draft is restored over the plan file");
        assertEquals("21.9", again.draft().characteristics().get(0).text(CharacteristicField.USL));
        assertFalse(again.draft().characteristics().isEmpty());
    }
}
