package dev.proofrun.app;

import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Waits, in robot tests, until the wizard shows a step and is at rest: the plan file read and no step
 * computing in the background.
 */
final class Settle {

    /** Generous: CI machines have 2 cores and other builds may run beside this one. */
    static final long TIMEOUT_S = 90;

    private Settle() {
    }

    static void onStep(WizardApp app, int step) throws TimeoutException {
        try {
            WaitForAsyncUtils.waitFor(TIMEOUT_S, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(() ->
                    app.wizard().shell().currentProperty().get() == step && !app.wizard().busy()).get());
        } catch (TimeoutException e) {
            throw new TimeoutException("waited " + TIMEOUT_S + " s for step " + (step + 1) + " at rest");
        }
        WaitForAsyncUtils.waitForFxEvents();
    }
}
