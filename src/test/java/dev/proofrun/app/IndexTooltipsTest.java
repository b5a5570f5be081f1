package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.shell.IndexTip;
import dev.proofrun.app.shell.IndexTooltips;
import dev.proofrun.grade.DemoReturn;
import dev.proofrun.grade.GradingPlans;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Control;
import javafx.scene.control.Labeled;
import javafx.scene.control.Tooltip;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Every label on screen that names an index (Cp, Cpk, …, Cpm) or its lower bound carries a tooltip with
 * that index's formula and meaning, taken from {@link IndexTip} (the one source of those words). Walks
 * every step of the demo plan, the Grading step after grading the demo's returned file.
 */
@UsesToolkit
class IndexTooltipsTest extends WizardRobotTest {

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    @Test
    void theWordsComeFromOneSourceAndNameTheFormula() {
        for (dev.proofrun.stats.IndexKind k : dev.proofrun.stats.IndexKind.values()) {
            IndexTip t = IndexTip.of(k);
            assertTrue(t.english().startsWith(k.symbol() + " = "), t.english());
        }
        assertTrue(IndexTip.CPM.english().startsWith("Cpm = "));
        assertEquals(List.of(IndexTip.CPK, IndexTip.CP), IndexTooltips.tipsFor("Designing for a true Cpk of 1.670 (Cp 1.800, off centre)"));
        assertEquals(List.of(IndexTip.CPK, IndexTip.LOWER_BOUND),
                IndexTooltips.tipsFor("Cpk = 1.749, lower 95 % bound 1.528, required 1.330 (model: normal)"));
        assertEquals(List.of(), IndexTooltips.tipsFor("Cpkx and the lower bound alone name no index"));
    }

    @Test
    void everyIndexShownOnEveryStepHasItsTooltip() throws Exception {
        Set<IndexTip> seen = EnumSet.noneOf(IndexTip.class);
        List<String> bare = new ArrayList<>();
        int steps = WaitForAsyncUtils.asyncFx(() -> app.wizard().shell().steps().size()).get();
        Settle.onStep(app, 1); // the demo plan read and its first step shown
        for (int i = 0; i < steps; i++) {
            int index = i;
            WaitForAsyncUtils.asyncFx(() -> app.wizard().shell().currentProperty().set(index)).get();
            if (index == steps - 1) {
                Path returned = home.resolve("returned.csv");
                DemoReturn.writeCsv(GradingPlans.of(WaitForAsyncUtils.asyncFx(() ->
                        app.wizard().session().base().orElseThrow()).get()), returned);
                WaitForAsyncUtils.asyncFx(() -> {
                    app.wizard().grading().returnedFile().set(returned.toString());
                    return app.wizard().grading().grade();
                }).get();
                WaitForAsyncUtils.waitFor(90, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() ->
                        app.wizard().grading().resultProperty().get() != null).get());
            }
            WaitForAsyncUtils.waitFor(90, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() -> !app.wizard().busy()).get());
            WaitForAsyncUtils.waitForFxEvents();
            WaitForAsyncUtils.asyncFx(() -> {
                check(app.wizard().view().root(), seen, bare, "step " + (index + 1));
                return null;
            }).get();
        }
        assertTrue(bare.isEmpty(), "labels naming an index without its tooltip: " + bare);
        // the demo's two-sided bore shows all nine indices and a bound on the Grading step
        assertEquals(EnumSet.allOf(IndexTip.class), seen, "indices seen on screen");
    }

    private static void check(Node node, Set<IndexTip> seen, List<String> bare, String where) {
        if (!node.isVisible()) {
            return;
        }
        if (node instanceof Labeled l && l.getText() != null) {
            List<IndexTip> tips = IndexTooltips.tipsFor(l.getText());
            if (!tips.isEmpty()) {
                String tip = tooltipText(node);
                for (IndexTip t : tips) {
                    seen.add(t);
                    if (!tip.contains(t.english())) {
                        bare.add(where + ": '" + l.getText() + "' lacks the " + t.name() + " tip");
                    }
                }
            }
        }
        if (node instanceof Parent p) {
            for (Node c : p.getChildrenUnmodifiable()) {
                check(c, seen, bare, where);
            }
        }
    }

    /** The tooltip the user sees on hovering the node: its own, else the nearest control's around it. */
    private static String tooltipText(Node node) {
        for (Node n = node; n != null; n = n.getParent()) {
            if (n instanceof Control c && c.getTooltip() != null) {
                Tooltip t = c.getTooltip();
                return t.getText() == null ? "" : t.getText();
            }
        }
        return "";
    }
}
