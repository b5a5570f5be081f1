package dev.proofrun.app;

import dev.proofrun.app.session.AppHome;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.application.Platform;
import javafx.stage.Stage;
import javafx.util.Duration;

/**
 * The training run of the packaging build: opens the wizard as a first start does (the demo plan), shows
 * every step once, waiting after each until no step computes, and closes. The build runs it once with
 * {@code -XX:ArchiveClassesAtExit} so that the JVM records the classes it loaded into a class-data-sharing
 * archive, which the packaged app (and {@code java -jar}) then map at start instead of reading, parsing and
 * verifying those classes again (JDK 17 dynamic CDS, JEP 350). Never part of a user's session; see
 * {@code src/package/package-app.sh} and {@code docs/decisions/packaged-start-up.md}.
 *
 * <p>The wizard's own files go under {@code proofrun.home} (the build passes a temporary folder). A plain
 * class, not a JavaFX application, so that it starts from the class path like {@code Main}.
 */
public final class TrainingRun {

    /** The longest the tour may take before it closes anyway (a slow or loaded build machine). */
    private static final Duration LIMIT = Duration.seconds(120);

    /** How often the tour looks whether the current step is at rest. */
    private static final Duration TICK = Duration.millis(250);

    private TrainingRun() {
    }

    public static void main(String[] args) {
        Platform.startup(() -> {
            Stage stage = new Stage();
            WizardApp app = new WizardApp();
            app.start(stage, AppHome.standard());
            tour(app.wizard());
        });
    }

    /** Moves one step on each tick at which nothing computes; closes after the last step or the limit. */
    private static void tour(Wizard wizard) {
        Timeline ticks = new Timeline();
        long[] started = {System.nanoTime()};
        ticks.getKeyFrames().add(new KeyFrame(TICK, e -> {
            boolean overTime = System.nanoTime() - started[0] > LIMIT.toMillis() * 1_000_000L;
            if (wizard.busy() && !overTime) {
                return;
            }
            int current = wizard.shell().currentProperty().get();
            int last = wizard.shell().steps().size() - 1;
            if (overTime || current == last || !wizard.shell().goTo(current + 1)) {
                System.out.printf("training run: ended on step %d of %d%s%n", current + 1, last + 1,
                        overTime ? " (time limit)" : "");
                ticks.stop();
                Platform.exit();
            }
        }));
        ticks.setCycleCount(Timeline.INDEFINITE);
        ticks.play();
    }
}
