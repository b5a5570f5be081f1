package dev.proofrun.app;

import dev.proofrun.app.session.AppHome;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;

/**
 * A harness, not a test: opens the wizard on the demo plan (fresh temporary home) and saves a PNG of
 * every step, so the screens can be looked at. Run headless with the same properties as the tests:
 * <pre>
 * mvn -o -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt
 * java -cp target/test-classes:target/classes:$(cat target/cp.txt) -Dglass.platform=Monocle \
 *   -Dmonocle.platform=Headless -Dprism.order=sw -Dprism.text=t2k dev.proofrun.app.StepSnapshots target/snapshots
 * </pre>
 * Under Xvfb leave out the Monocle properties to see the GTK window's rendering instead.
 */
public final class StepSnapshots {

    private StepSnapshots() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "target/snapshots");
        Files.createDirectories(out);
        Path home = Files.createTempDirectory("proofrun-snap");
        Path work = Files.createTempDirectory("proofrun-snap-work");
        CompletableFuture<WizardApp> started = new CompletableFuture<>();
        Platform.startup(() -> {
            Stage stage = new Stage();
            WizardApp app = new WizardApp();
            app.start(stage, new AppHome(home, home.resolve("plans")));
            started.complete(app);
        });
        WizardApp app = started.get(30, TimeUnit.SECONDS);
        Snapshots.settle(app.wizard(), work); // the demo plan read and its first step shown
        int steps = onFx(() -> app.wizard().shell().steps().size());
        for (int i = 0; i < steps; i++) {
            int index = i;
            onFx(() -> {
                app.wizard().shell().currentProperty().set(index);
                return null;
            });
            Snapshots.settle(app.wizard(), work);
            if (index == steps - 1) {
                Path returned = work.resolve("returned.csv");
                // the same returned file as `proofrun demo` writes (same processes, same seed)
                dev.proofrun.grade.DemoReturn.writeCsv(dev.proofrun.grade.GradingPlans.of(
                        app.wizard().session().base().orElseThrow()), returned);
                onFx(() -> {
                    app.wizard().grading().returnedFile().set(returned.toString());
                    return app.wizard().grading().grade();
                });
                Snapshots.settle(app.wizard(), work);
            }
            WritableImage img = onFx(() -> app.wizard().view().root().getScene().snapshot(null));
            File f = out.resolve(String.format("step-%d.png", index + 1)).toFile();
            ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", f);
            System.out.println("wrote " + f);
            // a step taller than the window: also the bottom of it
            boolean scrolls = onFx(() -> {
                javafx.scene.Node page = app.wizard().view().root().lookup("#page-" + index);
                javafx.scene.control.ScrollPane sp = (javafx.scene.control.ScrollPane) page.getParent().getParent().getParent();
                boolean taller = page.getBoundsInLocal().getHeight() > sp.getViewportBounds().getHeight() + 1;
                sp.setVvalue(1.0);
                return taller;
            });
            if (scrolls) {
                Snapshots.settle(app.wizard(), work);
                ImageIO.write(SwingFXUtils.fromFXImage(onFx(() -> app.wizard().view().root().getScene().snapshot(null)), null),
                        "png", out.resolve(String.format("step-%d-lower.png", index + 1)).toFile());
            }
        }
        Platform.exit();
    }

    static <T> T onFx(java.util.concurrent.Callable<T> c) throws Exception {
        CompletableFuture<T> f = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                f.complete(c.call());
            } catch (Exception e) {
                f.completeExceptionally(e);
            }
        });
        return f.get(60, TimeUnit.SECONDS);
    }
}
