package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.DraftField;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Path;
import java.util.Optional;
import javafx.application.Platform;
import javafx.stage.Stage;
import javafx.stage.WindowEvent;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * "Save the plan" on close writes the plan the steps describe and closes the window; when there is no plan
 * to write yet, nothing is written, the window stays open and the status line says why.
 */
@UsesToolkit
class SaveOnCloseTest extends WizardRobotTest {

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    private void closeAndAnswer(FxRobot robot, String answer) {
        Platform.runLater(() -> stage.fireEvent(new WindowEvent(stage, WindowEvent.WINDOW_CLOSE_REQUEST)));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#close-question").tryQuery().isPresent(), "the close question is shown");
        robot.clickOn(answer);
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void savingAChangedIssuedDemoAsksWhereWritesThePlanAndCloses(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        Path chosen = home.resolve("elsewhere").resolve("valve-body-changed.json");
        robot.interact(() -> {
            app.wizard().session().setPlanFileChooser(s -> Optional.of(chosen));
            app.wizard().session().draft().field(DraftField.PART_NAME).set("Valve body, second tooling");
        });
        Settle.onStep(app, 1);
        assertTrue(app.wizard().session().draft().dirtyProperty().get());
        closeAndAnswer(robot, "Save the plan");
        assertFalse(stage.isShowing(), "saved, so the window closes");
        StudyPlan written = PlanFiles.read(chosen);
        assertEquals("Valve body, second tooling", written.part().name());
        assertFalse(app.wizard().session().draft().dirtyProperty().get(), "the draft is the saved state now");
        // the issued demo is not touched: an issued file is only replaced by its next revision
        StudyPlan demo = PlanFiles.read(home.resolve("plans").resolve("demo-valve-body.json"));
        assertTrue(demo.isIssued());
        assertFalse(demo.part().name().equals("Valve body, second tooling"));
    }

    @Test
    void anIncompletePlanIsNotSavedAndTheWindowStaysWithTheReason(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        robot.interact(() -> app.wizard().session().draft().field(DraftField.MINIMUM).set("not a number"));
        Settle.onStep(app, 1);
        closeAndAnswer(robot, "Save the plan");
        assertTrue(stage.isShowing(), "nothing to save, so the window stays");
        String status = app.wizard().shell().statusProperty().get();
        assertTrue(status.startsWith("The plan was not saved and the window stays open: "), status);
        assertTrue(app.wizard().session().draft().dirtyProperty().get(), "the edit is still unsaved, and in the draft file");
    }
}
