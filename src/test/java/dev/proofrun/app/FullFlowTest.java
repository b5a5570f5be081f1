package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.AppHome;
import dev.proofrun.design.DesignRow;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import dev.proofrun.grade.PlanAdapter;
import dev.proofrun.grade.SimulatedReturn;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.StudyPlan;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The whole job on screen, on the demo plan, driven by the robot: open, change the expected index and see
 * the design table change, pick another design, set the calendar, issue, export the three files, grade a
 * returned file, and read the verdict. An {@link FxProbe} records the FX thread's worst latency.
 */
@ExtendWith(ApplicationExtension.class)
class FullFlowTest {

    private WizardApp app;
    private Path home;
    private FxProbe probe;

    @Start
    void start(Stage stage) throws Exception {
        home = Files.createTempDirectory("proofrun-flow");
        app = new WizardApp();
        app.start(stage, new AppHome(home, home.resolve("plans")));
        probe = new FxProbe();
    }

    @AfterEach
    void report() {
        probe.close();
        System.out.printf(java.util.Locale.ROOT, "FX thread worst latency during the full flow: %.1f ms over %d probes%n",
                probe.worstMillis(), probe.probes());
        System.out.print(probe.blocks());
    }

    private void settle() throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> !app.wizard().busy());
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static void replaceText(FxRobot robot, String query, String text) {
        TextField f = robot.lookup(query).queryAs(TextField.class);
        robot.clickOn(f);
        robot.interact(f::selectAll);
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private List<Integer> subgroupsByRow() {
        return app.wizard().sizing().rows().stream().map(DesignRow::subgroups).toList();
    }

    @Test
    void planIssueExportAndGradeTheDemo(FxRobot robot) throws Exception {
        // open: the first start lands on the Part step of the demo plan
        assertEquals("PR-2027-0311", robot.lookup("#plan-id").queryAs(TextField.class).getText());
        robot.clickOn("#next");
        robot.clickOn("#next");
        settle();
        List<Integer> before = subgroupsByRow();
        assertFalse(before.isEmpty());

        // change the expected index on the Goal step: the design table is recomputed
        robot.clickOn("#back");
        replaceText(robot, "#expected", "2.0");
        robot.clickOn("#next");
        settle();
        List<Integer> after = subgroupsByRow();
        assertNotEquals(before, after, "a better process needs fewer subgroups");

        // pick another design (subgroups of 3) and read what it costs
        TableView<?> designs = robot.lookup("#designs").queryAs(TableView.class);
        Node rowOf3 = robot.lookup("#designs .table-row-cell").match((javafx.scene.control.TableRow<DesignRow> r) ->
                r.getItem() != null && r.getItem().subgroupSize() == 3).query();
        robot.clickOn(rowOf3);
        settle();
        assertEquals(3, app.wizard().sizing().chosenProperty().get().subgroupSize());
        String cost = robot.lookup("#design-cost").queryAs(Label.class).getText();
        assertTrue(cost.contains("subgroups of 3"), cost);
        assertTrue(designs.isVisible());

        // set the calendar: start on another Monday; the frequency sentence comes from the schedule
        robot.clickOn("#next");
        replaceText(robot, "#timing-start", "2027-04-05 06:00");
        robot.type(KeyCode.TAB);
        String sentence = robot.lookup("#frequency").queryAs(Label.class).getText();
        assertTrue(sentence.startsWith("one subgroup of 3"), sentence);
        assertEquals("2027-04-05", app.wizard().timing().schedule().orElseThrow().slots().get(0).start().toLocalDate().toString());

        // issue: the revision appears; export the three files into a temporary folder
        settle();
        robot.clickOn("#next");
        settle();
        String was = robot.lookup("#plan-state").queryAs(Label.class).getText();
        assertTrue(was.startsWith("Changed since revision"), was);
        robot.clickOn("#issue");
        settle();
        String state = robot.lookup("#plan-state").queryAs(Label.class).getText();
        assertTrue(state.matches("Issued as revision [0-9a-f]{12}"), state);
        assertFalse(app.wizard().handout().pages().isEmpty(), "the sheet preview has pages");
        Path out = Files.createDirectories(home.resolve("out"));
        replaceText(robot, "#export-folder", out.toString());
        robot.clickOn("#export");
        WaitForAsyncUtils.waitForFxEvents();
        String id = "PR-2027-0311";
        for (String name : List.of(id + "-sheet.pdf", id + "-fill-in.csv", id + "-fill-in.xlsx")) {
            assertTrue(Files.size(out.resolve(name)) > 0, name);
        }

        // grade: a returned file written by the demo command's code for the plan just issued
        Path returned = out.resolve("returned.csv");
        StudyPlan issued = app.wizard().session().base().orElseThrow();
        SimulatedReturn.writeCsv(PlanAdapter.of(issued), demoProcesses(), 99L, returned);
        robot.clickOn("#next");
        replaceText(robot, "#returned-file", returned.toString());
        robot.clickOn("#grade");
        settle();
        String verdict = robot.lookup("#verdict").queryAs(Label.class).getText();
        assertTrue(verdict.startsWith("Verdict for plan " + id + "@" + issued.revision().orElseThrow() + ": "), verdict);
        Verdict overall = app.wizard().grading().resultProperty().get().verdict();
        assertTrue(verdict.endsWith(dev.proofrun.app.grading.GradingViewModel.verdictWords(overall)), verdict);
        String caution = robot.lookup("#caution").queryAs(Label.class).getText();
        assertTrue(caution.startsWith("Caution: a statistical statement under assumptions"), caution);
        assertTrue(robot.lookup("#char-caution").queryAs(Label.class).isVisible());
        robot.clickOn("#export-report");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(Files.size(out.resolve(id + "-report.pdf")) > 0);
    }

    /** The processes of {@code cli.DemoCommand.processes()} (package-private there), copied as they are. */
    private static Map<String, SimulatedReturn.Process> demoProcesses() {
        return Map.of(
                "D1", SimulatedReturn.Process.stable(22.0012, 0.0021),
                "R4", SimulatedReturn.Process.stable(0.42, 0.086),
                "F7", SimulatedReturn.Process.stepping(6.1, 0.22, 0.6, -0.55));
    }
}
