package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.AppHome;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The shell in a real (headless) window: it opens on the Part step and validates as typed. */
@ExtendWith(ApplicationExtension.class)
class WizardSmokeTest {

    private Path home;
    private WizardApp app;

    @Start
    void start(Stage stage) throws Exception {
        home = Files.createTempDirectory("proofrun-home");
        app = new WizardApp();
        app.start(stage, new AppHome(home, home.resolve("plans")));
    }

    @Test
    void nextStaysOffUntilThePartStepIsComplete(FxRobot robot) {
        assertEquals(1, app.wizard().shell().currentProperty().get(), "the first start opens a plan");
        Button next = robot.lookup("#next").queryAs(Button.class);
        assertTrue(next.isDisabled());
        Label missing = robot.lookup("#missing").queryAs(Label.class);
        assertEquals("Before going on: give the plan an id", missing.getText());
        robot.clickOn("#plan-id").write("PR-2027-0042");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Before going on: name the part", missing.getText());
        robot.clickOn("#part-name").write("Valve body");
        robot.clickOn("#add-row");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(missing.getText().contains("row 1 (C1)"), missing.getText());
        assertTrue(next.isDisabled());
        assertFalse(robot.lookup("#row-problem").queryAs(Label.class).getText().isEmpty());
        assertEquals("PR-2027-0042", robot.lookup("#plan-id").queryAs(TextField.class).getText());
    }
}
