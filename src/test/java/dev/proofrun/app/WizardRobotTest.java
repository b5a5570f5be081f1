package dev.proofrun.app;

import dev.proofrun.app.session.AppHome;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.util.WaitForAsyncUtils;

/**
 * A robot test of the whole wizard: before each test the wizard starts in a new window with a fresh temporary
 * home (so the first start opens the demo plan), as a user's first start would. TestFX calls only the
 * {@code @Start} method a test class declares itself, so each test declares one that calls {@link #startWizard}.
 */
@ExtendWith(ApplicationExtension.class)
public abstract class WizardRobotTest {

    /** The wizard under test. */
    protected WizardApp app;
    /** Its window. */
    protected Stage stage;
    /** Its home folder, new for each test; plans go in {@code plans} below it. */
    protected Path home;

    /** Starts the wizard in {@code stage} with a new temporary home. */
    protected final void startWizard(Stage stage) throws Exception {
        this.stage = stage;
        home = Files.createTempDirectory("proofrun-" + getClass().getSimpleName());
        app = new WizardApp();
        app.start(stage, new AppHome(home, home.resolve("plans")));
    }

    /** What {@code read} returns, read on the FX thread (waiting at most {@link Settle#TIMEOUT_S}). */
    protected static <T> T fx(Callable<T> read) throws Exception {
        return WaitForAsyncUtils.asyncFx(read).get(Settle.TIMEOUT_S, TimeUnit.SECONDS);
    }

    /** Waits until {@code condition}, evaluated on the FX thread, holds; then for the events it set off. */
    protected static void await(Callable<Boolean> condition) throws Exception {
        WaitForAsyncUtils.waitFor(Settle.TIMEOUT_S, TimeUnit.SECONDS, () -> fx(condition));
        WaitForAsyncUtils.waitForFxEvents();
    }
}
