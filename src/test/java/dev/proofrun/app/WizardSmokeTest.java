package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** Proves the headless (Monocle) JavaFX set-up works in the test run. */
@ExtendWith(ApplicationExtension.class)
class WizardSmokeTest {

    @Start
    void start(Stage stage) {
        new WizardApp().start(stage);
    }

    @Test
    void windowShows(FxRobot robot) {
        Label label = robot.lookup("#placeholder").queryAs(Label.class);
        assertTrue(label.getText().startsWith("proofrun"));
    }
}
