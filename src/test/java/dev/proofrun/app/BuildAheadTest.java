package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Control;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The page after the current step is built ahead while nobody types or clicks: it is in the scene, hidden,
 * styled (its controls have their skins) and laid out, and showing the step later shows that very page.
 * The page after it is not built until that step has been shown.
 */
@UsesToolkit
class BuildAheadTest extends WizardRobotTest {

    @Start
    void start(Stage stage) throws Exception {
        startWizard(stage);
    }

    private Node page(int index) throws Exception {
        return WaitForAsyncUtils.asyncFx(() -> app.wizard().view().root().lookup("#page-" + index))
                .get(Settle.TIMEOUT_S, TimeUnit.SECONDS);
    }

    /** The scroll pane the shell puts a page in; the shell hides and shows that. */
    private static javafx.scene.control.ScrollPane scroll(Node page) {
        Node n = page;
        while (!(n instanceof javafx.scene.control.ScrollPane)) {
            n = n.getParent();
        }
        return (javafx.scene.control.ScrollPane) n;
    }

    private static boolean styledAndLaidOut(Node page) {
        if (page.getLayoutBounds().getWidth() <= 0) {
            return false;
        }
        return controls(page).allMatch(c -> c.getSkin() != null);
    }

    private static java.util.stream.Stream<Control> controls(Node n) {
        java.util.stream.Stream<Control> own = n instanceof Control c ? java.util.stream.Stream.of(c)
                : java.util.stream.Stream.empty();
        if (n instanceof Parent p && !(n instanceof Control)) {
            return java.util.stream.Stream.concat(own,
                    p.getChildrenUnmodifiable().stream().flatMap(BuildAheadTest::controls));
        }
        return own;
    }

    @Test
    void theNextPageIsReadyBeforeItsStepIsShown() throws Exception {
        Settle.onStep(app, 1); // the demo plan on the Part step
        WaitForAsyncUtils.waitFor(Settle.TIMEOUT_S, TimeUnit.SECONDS, () -> page(2) != null);
        Node goal = page(2);
        assertTrue(WaitForAsyncUtils.asyncFx(() -> styledAndLaidOut(goal)).get(Settle.TIMEOUT_S, TimeUnit.SECONDS),
                "the Goal page's controls have their skins and the page has a size");
        assertFalse(WaitForAsyncUtils.asyncFx(() -> scroll(goal).isVisible()).get(Settle.TIMEOUT_S, TimeUnit.SECONDS),
                "built ahead, the page stays hidden");
        assertNull(page(3), "only the page after the current one is built ahead");

        WaitForAsyncUtils.asyncFx(() -> app.wizard().shell().goTo(2)).get(Settle.TIMEOUT_S, TimeUnit.SECONDS);
        Settle.onStep(app, 2);
        assertSame(goal, page(2), "showing the step shows the page built ahead");
        assertTrue(WaitForAsyncUtils.asyncFx(() -> scroll(goal).isVisible()).get(Settle.TIMEOUT_S, TimeUnit.SECONDS));
    }
}
