package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The wizard in a real (headless) window: the first start opens the demo plan; fields validate as typed. */
@UsesToolkit
class WizardSmokeTest extends WizardRobotTest {

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    @Test
    void theFirstStartOpensTheDemoPlanAndTypingIsCheckedInline(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        assertEquals(1, app.wizard().shell().currentProperty().get(), "the first start opens the demo plan");
        assertEquals("PR-2027-0311", robot.lookup("#plan-id").queryAs(TextField.class).getText());
        Button next = robot.lookup("#next").queryAs(Button.class);
        assertFalse(next.isDisabled());
        TextField planId = robot.lookup("#plan-id").queryAs(TextField.class);
        robot.clickOn(planId);
        robot.interact(planId::clear);
        WaitForAsyncUtils.waitForFxEvents();
        Label missing = robot.lookup("#missing").queryAs(Label.class);
        assertEquals("Before going on: give the plan an id", missing.getText());
        assertTrue(next.isDisabled());
        robot.write("PR-2027-0042");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("", missing.getText());
        assertFalse(next.isDisabled());
    }
}
