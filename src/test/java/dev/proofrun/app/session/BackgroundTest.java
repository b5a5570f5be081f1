package dev.proofrun.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.UsesToolkit;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The two kinds of worker: {@link Background#fx} may be cut off when the window closes (previews, designs),
 * {@link Background#fxFinishing} may not (a plan file being written), yet must not keep the JVM alive when idle.
 */
@UsesToolkit
class BackgroundTest {

    @BeforeAll
    static void toolkit() throws Exception {
        FxToolkit.registerPrimaryStage();
    }

    private static Thread workerOf(Background b) throws Exception {
        CompletableFuture<Thread> worker = new CompletableFuture<>();
        CompletableFuture<String> answer = new CompletableFuture<>();
        b.submit(() -> {
            worker.complete(Thread.currentThread());
            return "written";
        }, answer::complete, answer::completeExceptionally);
        assertEquals("written", answer.get(60, TimeUnit.SECONDS), "the answer arrives on the FX thread");
        return worker.get();
    }

    @Test
    void aPlanFileWorkerFinishesItsJobBeforeTheJvmMayExitAndEndsWhenIdle() throws Exception {
        Thread t = workerOf(Background.fxFinishing("test-plan-file"));
        assertFalse(t.isDaemon(), "a started write holds the JVM until it is done");
        // an idle worker ends itself after IDLE_SECONDS; 60 s is only the bound of the wait, not a timing claim
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> !t.isAlive());
    }

    @Test
    void otherWorkersAreDaemons() throws Exception {
        assertTrue(workerOf(Background.fx("test-preview")).isDaemon());
    }
}
