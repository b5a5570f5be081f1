package dev.proofrun.app.timing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.Settle;
import dev.proofrun.app.UsesToolkit;
import dev.proofrun.app.WizardRobotTest;
import dev.proofrun.app.session.DraftField;
import java.util.List;
import javafx.geometry.BoundingBox;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The Timing step on the demo plan at the two window sizes the wizard is checked at (1280 × 800 and
 * 1024 × 640): slot ids never overlap, the step comes back at its top, an empty start says what to enter.
 */
@UsesToolkit
class TimingScreenTest extends WizardRobotTest {

    private static final int TIMING = 4;

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    private void goTo(FxRobot robot, int step) throws Exception {
        robot.interact(() -> app.wizard().shell().goTo(step));
        Settle.onStep(app, step);
    }

    private static boolean overlap(BoundingBox a, BoundingBox b) {
        return a.getMinX() < b.getMaxX() && b.getMinX() < a.getMaxX() && a.getMinY() < b.getMaxY() && b.getMinY() < a.getMaxY();
    }

    @Test
    void slotIdsNeverOverlapAt1280And1024(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        goTo(robot, TIMING);
        String demoDays = app.wizard().session().draft().text(DraftField.SPAN_COUNT);
        // larger size first: the headless screen's pixel buffer is only ever made smaller
        for (int[] size : new int[][] {{1280, 800}, {1024, 640}}) {
            for (String days : new String[] {demoDays, "1", "1 shift"}) {
                // "1": the demo's 25 subgroups in one day instead of three, marks about 40 minutes apart;
                // "1 shift": all 25 in one shift, marks about 15 minutes apart, closer than an id is wide
                robot.interact(() -> {
                    app.wizard().session().draft().field(DraftField.SPAN_KIND).set(days.endsWith("shift") ? "shifts" : "days");
                    app.wizard().session().draft().field(DraftField.SPAN_COUNT).set(days.substring(0, 1));
                });
                Settle.onStep(app, TIMING);
                checkAt(robot, size, days);
            }
        }
    }

    private void checkAt(FxRobot robot, int[] size, String days) throws Exception {
        {
            Settle.resize(robot, stage, size[0], size[1]);
            Timeline t = robot.lookup("#timeline").queryAs(Timeline.class);
            List<BoundingBox> boxes = WaitForAsyncUtils.asyncFx(t::labelBoxes).get();
            int leftOut = WaitForAsyncUtils.asyncFx(t::labelsLeftOut).get();
            assertEquals(t.slotsDrawn(), boxes.size() + leftOut, "every slot has its id or is counted as left out");
            assertFalse(boxes.isEmpty());
            for (int i = 0; i < boxes.size(); i++) {
                for (int j = i + 1; j < boxes.size(); j++) {
                    assertFalse(overlap(boxes.get(i), boxes.get(j)), "ids " + i + " and " + j + " overlap at " + size[0]);
                }
            }
            // the measurement the decision record quotes
            System.out.printf("timeline %d x %d, span %s (days unless said): %d slots, %d ids drawn, %d left out%n", size[0], size[1],
                    days, t.slotsDrawn(), boxes.size(), leftOut);
        }
    }

    @Test
    void aStepComesBackAtItsTop(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        goTo(robot, TIMING);
        Settle.resize(robot, stage, 1024, 640);
        Node page = robot.lookup("#page-" + TIMING).query();
        ScrollPane scroll = (ScrollPane) page.getParent().getParent().getParent();
        robot.interact(() -> scroll.setVvalue(scroll.getVmax()));
        assertTrue(scroll.getVvalue() > 0);
        goTo(robot, TIMING - 1);
        goTo(robot, TIMING);
        assertEquals(scroll.getVmin(), scroll.getVvalue(), 0, "scrolled back to the title");
    }

    @Test
    void anEmptyStartSaysWhatToEnter(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        goTo(robot, TIMING);
        robot.interact(() -> app.wizard().session().draft().field(DraftField.START).set(""));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("enter a start such as 2027-03-24 06:00", app.wizard().timing().problem(DraftField.START).get());
        assertTrue(robot.lookup(".pr-problem").queryAllAs(Label.class).stream()
                .anyMatch(l -> l.getText().equals("enter a start such as 2027-03-24 06:00")));
    }
}
