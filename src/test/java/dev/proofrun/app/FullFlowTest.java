package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.grading.GradingViewModel;
import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.sizing.SizingRow;
import dev.proofrun.design.DesignRow;
import dev.proofrun.app.chart.CurvePlot;
import dev.proofrun.grade.DemoReturn;
import dev.proofrun.grade.GradingPlans;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.TableRow;
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
@UsesToolkit
@ExtendWith(ApplicationExtension.class)
class FullFlowTest {

    private WizardApp app;
    private Path home;
    private FxProbe probe;

    @Start
    void start(Stage stage) throws Exception {
        home = Files.createTempDirectory("proofrun-flow");
        app = new WizardApp();
        probe = FxProbe.fromShowing(stage);
        app.start(stage, new AppHome(home, home.resolve("plans")));
    }

    @AfterEach
    void report() {
        probe.close();
        System.out.printf(java.util.Locale.ROOT,
                "FX thread worst latency during the full flow: %.1f ms over %d probes (1-min load average %.2f, %d cores)%n",
                probe.worstMillis(), probe.probes(),
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage(),
                Runtime.getRuntime().availableProcessors());
        System.out.println("  worst per phase: " + probe.worstByPhase());
        System.out.printf(java.util.Locale.ROOT, "  most FX-thread CPU time within one wait: %.1f ms%n", probe.worstCpuMillis());
        System.out.print(probe.blocks());
    }

    private static final long TIMEOUT_S = Settle.TIMEOUT_S;

    /** Waits until the condition, evaluated on the FX thread, holds (polled, no fixed sleeps). */
    private static void await(String what, Callable<Boolean> condition) throws TimeoutException {
        try {
            WaitForAsyncUtils.waitFor(TIMEOUT_S, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(condition).get());
        } catch (TimeoutException e) {
            throw new TimeoutException("waited " + TIMEOUT_S + " s for: " + what);
        }
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void idle() throws TimeoutException {
        await("no step computing", () -> !app.wizard().busy());
    }

    private static <T> T fx(Callable<T> read) throws Exception {
        return WaitForAsyncUtils.asyncFx(read).get(TIMEOUT_S, TimeUnit.SECONDS);
    }

    private static void replaceText(FxRobot robot, String query, String text) {
        TextField f = robot.lookup(query).queryAs(TextField.class);
        robot.clickOn(f);
        robot.interact(f::selectAll);
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private List<Integer> subgroupsByRow() throws Exception {
        return fx(() -> app.wizard().sizing().rows().stream().map(DesignRow::subgroups).toList());
    }

    private String text(FxRobot robot, String query) throws Exception {
        Label l = robot.lookup(query).queryAs(Label.class);
        return fx(l::getText);
    }

    private int step() throws Exception {
        return fx(() -> app.wizard().shell().currentProperty().get());
    }

    @Test
    void planIssueExportAndGradeTheDemo(FxRobot robot) throws Exception {
        probe.phase("open");
        // open: the first start lands on the Part step of the demo plan
        Settle.onStep(app, 1); // the demo plan on the Part step
        assertEquals("PR-2027-0311", robot.lookup("#plan-id").queryAs(TextField.class).getText());
        robot.clickOn("#next");
        Settle.onStep(app, 2); // the Goal step
        robot.clickOn("#next");
        await("the Sample size step with its design table", () -> app.wizard().shell().currentProperty().get() == 3
                && !app.wizard().sizing().busyProperty().get() && !app.wizard().sizing().rows().isEmpty());
        List<Integer> before = subgroupsByRow();

        probe.phase("goal→design table");
        // change the expected index on the Goal step: the design table is recomputed
        robot.clickOn("#back");
        Settle.onStep(app, 2); // the Goal step
        // (1.78: better than the demo's 1.67 and still below D1's expected Cp of 1.8, which Cpk cannot exceed)
        replaceText(robot, "#expected", "1.78");
        robot.clickOn("#next");
        await("a recomputed design table (a better process needs fewer subgroups)", () ->
                !app.wizard().sizing().busyProperty().get() && !app.wizard().sizing().rows().isEmpty()
                        && !app.wizard().sizing().rows().stream().map(DesignRow::subgroups).toList().equals(before));
        List<Integer> after = subgroupsByRow();
        assertNotEquals(before, after);
        assertTrue(after.get(0) < before.get(0), "fewer subgroups of 1 for a better process: " + before + " → " + after);
        // the recommendation moved: exactly the row of the new recommended size is marked
        await("only the recommended row marked", () -> {
            int n = app.wizard().sizing().tableProperty().get().recommended().subgroupSize();
            List<Integer> marked = robot.lookup("#designs .table-row-cell").match((TableRow<SizingRow> r) ->
                    r.getStyleClass().contains("pr-recommended")).<TableRow<SizingRow>>queryAll().stream()
                    .map(r -> r.getItem() == null ? -1 : r.getItem().subgroupSize()).toList();
            return marked.equals(List.of(n));
        });

        probe.phase("pick a design");
        // pick another design (subgroups of 3) and read what it costs
        TableView<?> designs = robot.lookup("#designs").queryAs(TableView.class);
        await("the row for subgroups of 3 drawn", () -> robot.lookup("#designs .table-row-cell")
                .match((TableRow<SizingRow> r) -> r.getItem() != null && r.getItem().subgroupSize() == 3).tryQuery().isPresent());
        Node rowOf3 = robot.lookup("#designs .table-row-cell").match((TableRow<SizingRow> r) ->
                r.getItem() != null && r.getItem().subgroupSize() == 3).query();
        robot.clickOn(rowOf3);
        await("subgroups of 3 chosen", () -> app.wizard().sizing().chosenProperty().get() != null
                && app.wizard().sizing().chosenProperty().get().subgroupSize() == 3);
        idle();
        String cost = text(robot, "#design-cost");
        assertTrue(cost.contains("subgroups of 3"), cost);
        assertTrue(designs.isVisible());

        probe.phase("calendar");
        // set the calendar: start on another Monday; the frequency sentence comes from the schedule
        robot.clickOn("#next");
        Settle.onStep(app, 4); // the Timing step
        replaceText(robot, "#timing-start", "2027-04-05 06:00");
        robot.type(KeyCode.TAB);
        await("a schedule starting on 2027-04-05", () -> !app.wizard().timing().busyProperty().get()
                && app.wizard().timing().schedule().map(s -> s.slots().get(0).start().toLocalDate().toString())
                        .orElse("").equals("2027-04-05"));
        String sentence = text(robot, "#frequency");
        assertTrue(sentence.startsWith("one subgroup of 3"), sentence);

        probe.phase("issue");
        // issue: the revision appears; export the three files into a temporary folder
        idle();
        robot.clickOn("#next");
        Settle.onStep(app, 5); // the Hand-out step
        idle();
        String was = text(robot, "#plan-state");
        assertTrue(was.startsWith("Changed since revision"), was);
        // before it is issued the changed plan can be exported as a DRAFT, as `sheet --draft` writes it
        String draftExport = fx(() -> robot.lookup("#export").queryAs(javafx.scene.control.Button.class).getText());
        assertTrue(draftExport.contains("DRAFT"), draftExport);
        assertTrue(fx(() -> !robot.lookup("#export").query().isDisabled()), "a draft can be exported");
        robot.clickOn("#issue");
        await("the plan issued", () -> app.wizard().handout().issuedNow().isPresent());
        idle();
        String state = text(robot, "#plan-state");
        assertTrue(state.matches("Issued as revision 2 \\([0-9a-f]{12}\\)"), state);
        String issuedExport = fx(() -> robot.lookup("#export").queryAs(javafx.scene.control.Button.class).getText());
        assertTrue(!issuedExport.contains("DRAFT"), issuedExport);
        await("the sheet preview has pages", () -> !app.wizard().handout().pages().isEmpty());
        probe.phase("export");
        Path out = Files.createDirectories(home.resolve("out"));
        replaceText(robot, "#export-folder", out.toString());
        robot.clickOn("#export");
        await("the three files written", () -> app.wizard().handout().exportedProperty().get() != null);
        idle();
        String id = "PR-2027-0311";
        for (String name : List.of(id + "-sheet.pdf", id + "-fill-in.csv", id + "-fill-in.xlsx")) {
            assertTrue(Files.size(out.resolve(name)) > 0, name);
        }

        probe.phase("grade");
        // grade: a returned file written as `proofrun demo` writes it (same generator and seed) for the
        // plan just issued (subgroups of 3 now, so not the demo command's own file)
        Path returned = out.resolve("returned.csv");
        StudyPlan issued = fx(() -> app.wizard().session().base().orElseThrow());
        DemoReturn.writeCsv(GradingPlans.of(issued), returned);
        robot.clickOn("#next");
        Settle.onStep(app, 6); // the Grading step
        replaceText(robot, "#returned-file", returned.toString());
        robot.clickOn("#grade");
        await("a verdict", () -> app.wizard().grading().resultProperty().get() != null
                && !app.wizard().grading().busyProperty().get());
        String verdict = text(robot, "#verdict");
        assertTrue(verdict.startsWith("Verdict for plan " + id + ", revision 2 (" + issued.revision().orElseThrow() + "): "), verdict);
        Verdict overall = fx(() -> app.wizard().grading().resultProperty().get().verdict());
        assertTrue(verdict.endsWith(GradingViewModel.verdictWords(overall)), verdict);
        String caution = text(robot, "#caution");
        assertTrue(caution.startsWith("Caution: a statistical statement under assumptions"), caution);
        // the caution once on the page, not once per characteristic
        assertEquals(1, fx(() -> robot.lookup(".pr-caution").queryAll().stream().filter(Node::isVisible).count()));
        // the charts name every line with its value: centre and both control limits, both specification limits
        for (String chart : List.of("#location-chart", "#spread-chart")) {
            List<String> legend = fx(() -> robot.lookup(chart).queryAs(CurvePlot.class).legend());
            assertTrue(legend.size() >= 4 && legend.get(1).startsWith("centre ") && legend.get(2).startsWith("UCL ")
                    && legend.get(3).startsWith("LCL "), chart + " " + legend);
        }
        List<String> limits = fx(() -> robot.lookup("#readings-chart").queryAs(CurvePlot.class).legend());
        assertTrue(limits.stream().anyMatch(n -> n.startsWith("LSL ")) && limits.stream().anyMatch(n -> n.startsWith("USL ")),
                limits.toString());
        // the histogram as in the report: bars, the planned shape's curve, both limits
        List<String> bars = fx(() -> robot.lookup("#histogram-chart").queryAs(CurvePlot.class).legend());
        assertTrue(bars.get(0).startsWith("readings: ") && bars.get(1).startsWith("fitted ")
                && bars.stream().anyMatch(n -> n.startsWith("LSL ")), bars.toString());
        assertEquals(6, step());
        probe.phase("report");
        robot.clickOn("#export-report");
        Path report = out.resolve(id + "-report.pdf");
        await("the report written", () -> Files.isRegularFile(report) && !app.wizard().grading().busyProperty().get()
                && app.wizard().grading().messageProperty().get().startsWith("Report written"));
        assertTrue(Files.size(report) > 0);
    }
}
