package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.grade.DemoReturn;
import dev.proofrun.grade.GradingPlans;
import java.nio.file.Path;
import javafx.scene.Node;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The wizard without a mouse: the documented keys move between steps (Alt+→/←, Ctrl+Page Down/Up,
 * Ctrl+1…7), each step puts the focus in its first field, Tab stays in the step (the rail is not in the
 * Tab order), a label's mnemonic focuses its field, and Enter in the returned-file field grades.
 */
@UsesToolkit
class KeyboardTest extends WizardRobotTest {

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    private int step() throws Exception {
        return WaitForAsyncUtils.asyncFx(() -> app.wizard().shell().currentProperty().get()).get();
    }

    private Node focused() throws Exception {
        return WaitForAsyncUtils.asyncFx(() -> app.wizard().view().root().getScene().getFocusOwner()).get();
    }

    /** True when the node lies inside the page of the current step. */
    private boolean inPage(Node n) throws Exception {
        Node page = WaitForAsyncUtils.asyncFx(() -> app.wizard().view().root()
                .lookup("#page-" + app.wizard().shell().currentProperty().get())).get();
        for (Node p = n; p != null; p = p.getParent()) {
            if (p == page) {
                return true;
            }
        }
        return false;
    }

    @Test
    void everyStepIsReachedAndWorkedFromTheKeyboard(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        assertEquals("plan-id", focused().getId(), "the Part step starts in its first field");
        robot.type(KeyCode.TAB);
        assertTrue(inPage(focused()), "Tab moves within the step, not into the rail: " + focused());

        robot.press(KeyCode.ALT).type(KeyCode.RIGHT).release(KeyCode.ALT);
        Settle.onStep(app, 2);
        assertTrue(inPage(focused()), "the Goal step has the focus: " + focused());
        robot.press(KeyCode.ALT).type(KeyCode.E).release(KeyCode.ALT);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("expected", focused().getId(), "Alt+E focuses the expected index");

        robot.press(KeyCode.CONTROL).type(KeyCode.PAGE_DOWN).release(KeyCode.CONTROL);
        Settle.onStep(app, 3);
        robot.press(KeyCode.ALT).type(KeyCode.LEFT).release(KeyCode.ALT);
        Settle.onStep(app, 2);
        robot.press(KeyCode.CONTROL).type(KeyCode.PAGE_UP).release(KeyCode.CONTROL);
        Settle.onStep(app, 1);

        for (int i = 1; i <= 7; i++) {
            int want = i - 1;
            robot.press(KeyCode.CONTROL).type(KeyCode.getKeyCode(Integer.toString(i))).release(KeyCode.CONTROL);
            Settle.onStep(app, want);
            Node f = focused();
            assertNotNull(f, "step " + i + " has a focus owner");
            assertTrue(inPage(f), "Ctrl+" + i + " puts the focus in the step, not on " + f);
        }

        // Grading: type the returned file's name and press Enter
        assertEquals(6, step());
        assertEquals("returned-file", focused().getId());
        Path returned = home.resolve("returned.csv");
        DemoReturn.writeCsv(GradingPlans.of(WaitForAsyncUtils.asyncFx(() -> app.wizard().session().base().orElseThrow()).get()),
                returned);
        TextField file = robot.lookup("#returned-file").queryAs(TextField.class);
        robot.interact(() -> file.setText(returned.toString()));
        robot.type(KeyCode.ENTER);
        await(() -> app.wizard().grading().resultProperty().get() != null && !app.wizard().grading().busyProperty().get());
    }
}
