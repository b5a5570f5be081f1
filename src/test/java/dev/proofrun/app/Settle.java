package dev.proofrun.app;

import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.stage.Stage;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Waits, in robot tests, until the wizard shows a step and is at rest: the plan file read and no step
 * computing in the background.
 */
public final class Settle {

    /** Generous: CI machines have 2 cores and other builds may run beside this one. */
    public static final long TIMEOUT_S = 90;

    private Settle() {
    }

    /** Waits up to {@link #TIMEOUT_S} seconds until the wizard shows {@code step} at rest. */
    public static void onStep(WizardApp app, int step) throws TimeoutException {
        onStep(app, step, TIMEOUT_S);
    }

    /** Waits up to {@code seconds} until the wizard shows {@code step} at rest (for a step that computes long). */
    public static void onStep(WizardApp app, int step, long seconds) throws TimeoutException {
        try {
            WaitForAsyncUtils.waitFor(seconds, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() ->
                    app.wizard().shell().currentProperty().get() == step && !app.wizard().busy()).get());
        } catch (TimeoutException e) {
            throw new TimeoutException("waited " + seconds + " s for step " + (step + 1) + " at rest");
        }
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Sets the window to {@code w} × {@code h}, below the smallest size it normally keeps, and waits for the layout. */
    public static void resize(FxRobot robot, Stage stage, int w, int h) {
        robot.interact(() -> {
            stage.setMinWidth(0);
            stage.setMinHeight(0);
            stage.setWidth(w);
            stage.setHeight(h);
        });
        WaitForAsyncUtils.waitForFxEvents();
    }
}
