package dev.proofrun.app.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.Settle;
import dev.proofrun.app.UsesToolkit;
import dev.proofrun.app.WizardRobotTest;
import dev.proofrun.app.chart.CurvePlot;
import dev.proofrun.app.session.DraftField;
import java.util.List;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The Sample-size step's looks on the demo plan: choosing two looks is refused in words while a characteristic is
 * planned with a skewed shape; for one normal characteristic the looks, their figures and the expected-readings
 * chart beside the operating characteristic appear, the choice is in the draft, and at 1280 × 800 and 1024 × 640 the
 * three charts lie side by side within the page without overlapping.
 */
@UsesToolkit
class SizingLooksScreenTest extends WizardRobotTest {

    private static final int SIZING = 3;

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    @Test
    void twoLooksShowTheirFiguresAndTheReadingsChartBesideTheOc(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        robot.interact(() -> app.wizard().shell().goTo(SIZING));
        Settle.onStep(app, SIZING);
        ComboBox<?> looks = robot.lookup("#looks").queryAs(ComboBox.class);
        Label text = robot.lookup("#looks-text").queryAs(Label.class);
        CurvePlot readings = robot.lookup("#expected-readings-chart").queryAs(CurvePlot.class);
        assertFalse(readings.isVisible(), "no readings chart for a single stage");
        robot.interact(() -> looks.getSelectionModel().select(1));
        Settle.onStep(app, SIZING);
        assertEquals("2", app.wizard().session().draft().text(DraftField.STAGES));
        // the demo's R4 is planned lognormal: the looks are refused in words, and the step is not complete
        assertTrue(text.getText().contains("R4 is planned lognormal"), text.getText());
        assertFalse(app.wizard().sizing().completeBinding().get());

        // one normal characteristic (D1): the looks are computed on their worker
        robot.interact(() -> app.wizard().session().draft().characteristics().removeIf(c -> !c.id().equals("D1")));
        Settle.onStep(app, SIZING, 300);
        assertTrue(app.wizard().sizing().completeBinding().get(), app.wizard().sizing().missingProperty().get());
        assertTrue(text.getText().startsWith("Look 1: "), text.getText());
        assertTrue(text.getText().contains("Look 2: "), text.getText());
        assertTrue(text.getText().contains("Single stage: "), text.getText());
        assertTrue(readings.isVisible());
        assertEquals(List.of("staged, 2 looks"), readings.legend().subList(0, 1));
        CurvePlot oc = robot.lookup("#oc-chart").queryAs(CurvePlot.class);
        assertTrue(oc.legend().stream().anyMatch(l -> l.startsWith("staged: 2 looks")), oc.legend().toString());

        CurvePlot power = robot.lookup("#power-chart").queryAs(CurvePlot.class);
        // larger size first: the headless screen's pixel buffer is only ever made smaller
        for (int[] size : new int[][] {{1280, 800}, {1024, 640}}) {
            Settle.resize(robot, stage, size[0], size[1]);
            Bounds p = bounds(power);
            Bounds o = bounds(oc);
            Bounds r = bounds(readings);
            assertTrue(p.getMaxX() <= o.getMinX() && o.getMaxX() <= r.getMinX(), "side by side at " + size[0]);
            assertTrue(r.getMaxX() <= size[0], "within the window at " + size[0] + ": " + r);
            assertTrue(r.getWidth() >= readings.minWidth(-1) - 0.5, "not squeezed below its least width");
            assertTrue(text.getHeight() >= text.prefHeight(text.getWidth()) - 0.5, "the looks' words not cut");
        }
    }

    private static Bounds bounds(Node n) throws Exception {
        return WaitForAsyncUtils.asyncFx(() -> n.localToScene(n.getBoundsInLocal())).get();
    }
}
