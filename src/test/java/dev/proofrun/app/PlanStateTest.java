package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.grade.DemoReturn;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Labeled;
import javafx.scene.control.TextField;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * What a step shows belongs to the plan on the desk and the returned file just graded: a failed grade
 * leaves no verdict and nothing to export, and after switching plans no word of the other plan remains.
 */
@UsesToolkit
class PlanStateTest extends WizardRobotTest {

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    private void gradeFile(FxRobot robot, Path file) throws Exception {
        robot.interact(() -> robot.lookup("#returned-file").queryAs(TextField.class).setText(file.toString()));
        robot.clickOn("#grade");
        await(() -> !app.wizard().grading().busyProperty().get());
    }

    /**
     * Every text the window shows, hidden pages included (a hidden step shows again when visited), but
     * the list of recent plans on the Start step, which names other plans by design.
     */
    private List<String> texts() throws Exception {
        return fx(() -> {
            List<String> out = new ArrayList<>();
            collect(stage.getScene().getRoot(), out);
            return out;
        });
    }

    /** Visible with every parent visible. */
    private static boolean shown(Node n) {
        for (Node p = n; p != null; p = p.getParent()) {
            if (!p.isVisible()) {
                return false;
            }
        }
        return true;
    }

    private static void collect(Node n, List<String> out) {
        if (n instanceof Labeled l && l.getText() != null) {
            out.add(l.getText());
        }
        if (n instanceof Parent p && !"recent".equals(n.getId())) {
            p.getChildrenUnmodifiable().forEach(c -> collect(c, out));
        }
    }

    @Test
    void aFailedGradeClearsTheVerdictAndSwitchingPlansLeavesNoWordOfTheOther(FxRobot robot) throws Exception {
        Settle.onStep(app, 1); // the demo plan, issued, on the Part step
        StudyPlan demo = fx(() -> app.wizard().session().base().orElseThrow());
        Path returned = home.resolve("returned.csv");
        DemoReturn.writeCsv(GradingPlans.of(demo), returned);
        robot.interact(() -> app.wizard().shell().goTo(6));
        Settle.onStep(app, 6);

        gradeFile(robot, returned);
        assertTrue(fx(() -> app.wizard().grading().resultProperty().get() != null), "the demo's return is graded");
        assertFalse(robot.lookup("#export-report").queryButton().isDisabled());
        assertTrue(fx(() -> shown(robot.lookup("#verdict").query())));

        // a file that cannot be graded: no verdict of the earlier file stays, nothing to export
        Path garbage = home.resolve("garbage.csv");
        Files.writeString(garbage, "this is not,a returned file\n\u0001\u0002,\n");
        gradeFile(robot, garbage);
        assertNull(fx(() -> app.wizard().grading().resultProperty().get()), "the failed grade left no result");
        assertTrue(robot.lookup("#export-report").queryButton().isDisabled(), "export is disabled");
        assertFalse(fx(() -> shown(robot.lookup("#verdict").query())), "no verdict shown");
        assertEquals("", fx(() -> robot.lookup("#verdict").queryAs(Labeled.class).getText()));
        String refusal = fx(() -> app.wizard().grading().messageProperty().get());
        assertTrue(refusal.contains("garbage.csv"), "the refusal names the file: " + refusal);

        // the verdict comes back for the good file, and leaves once the field names another file
        gradeFile(robot, returned);
        assertTrue(fx(() -> app.wizard().grading().resultProperty().get() != null));
        robot.interact(() -> robot.lookup("#returned-file").queryAs(TextField.class).setText(garbage.toString()));
        assertNull(fx(() -> app.wizard().grading().resultProperty().get()), "a verdict of the file named before");

        // an edit autosaved: the status line names the demo's draft file
        robot.interact(() -> {
            app.wizard().session().draft().field(dev.proofrun.app.session.DraftField.PART_NAME).set("Valve body X");
            app.wizard().shell().autosave();
        });
        assertTrue(texts().stream().anyMatch(t -> t.contains("demo-valve-body")), "the status names the draft");
        gradeFile(robot, returned);

        // another plan: nothing on any step speaks of the demo plan any more
        robot.interact(() -> app.wizard().start().newPlan());
        WaitForAsyncUtils.waitForFxEvents();
        List<String> stale = texts().stream()
                .filter(t -> t.contains("demo-valve-body") || t.contains(demo.id()) || t.contains("returned.csv")
                        || t.contains("graded"))
                .toList();
        assertEquals(List.of(), stale, "texts of the demo plan left after starting a new plan");
        assertNull(fx(() -> app.wizard().grading().resultProperty().get()));
        assertEquals("", fx(() -> app.wizard().grading().messageProperty().get()));
        assertEquals("", fx(() -> app.wizard().shell().statusProperty().get()));
    }
}
