package dev.proofrun.app;

import java.nio.file.Path;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;

/** Waits, without sleeping, until the wizard's background work has finished. */
final class Snapshots {

    private Snapshots() {
    }

    /** Returns once no step is busy: polls the FX thread, each poll queued behind the previous events. */
    static void settle(Wizard w, Path work) throws Exception {
        long deadline = System.nanoTime() + 90_000_000_000L;
        while (System.nanoTime() < deadline) {
            CompletableFuture<Boolean> busy = new CompletableFuture<>();
            Platform.runLater(() -> busy.complete(w.busy()));
            if (!busy.get(10, TimeUnit.SECONDS)) {
                CompletableFuture<Void> pulse = new CompletableFuture<>();
                Platform.runLater(() -> pulse.complete(null));
                pulse.get(10, TimeUnit.SECONDS);
                return;
            }
            Thread.onSpinWait();
        }
        throw new IllegalStateException("the wizard stayed busy");
    }
}
