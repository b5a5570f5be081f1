package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CancellationException;
import java.util.stream.IntStream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/** A simulation stops when, and only when, the thread that asked for it has been interrupted. */
class CancellationTest {

    @AfterEach
    void clearTheInterrupt() {
        Thread.interrupted();
    }

    @Test
    void anUninterruptedThreadGoesOn() {
        Cancellation cancel = Cancellation.ofCallingThread();
        assertDoesNotThrow(cancel::check);
        assertDoesNotThrow(() -> IntStream.range(0, 1_000).parallel().forEach(i -> cancel.check()));
    }

    @Test
    void theOwnersInterruptStopsTheWorkOnEveryThreadAndStaysSet() {
        Cancellation cancel = Cancellation.ofCallingThread();
        Thread.currentThread().interrupt();
        assertThrows(CancellationException.class, cancel::check);
        // the parallel stream's own threads are not interrupted, yet they see the owner's
        assertThrows(CancellationException.class,
                () -> IntStream.range(0, 1_000).parallel().forEach(i -> cancel.check()));
        assertTrue(Thread.currentThread().isInterrupted(), "the owner still sees its interrupt");
    }

    @Test
    void anotherThreadsInterruptDoesNotStopThisOne() throws InterruptedException {
        Cancellation mine = Cancellation.ofCallingThread();
        Thread other = new Thread(() -> {
            Thread.currentThread().interrupt();
            mine.check();
        });
        Throwable[] thrown = new Throwable[1];
        other.setUncaughtExceptionHandler((t, e) -> thrown[0] = e);
        other.start();
        other.join();
        assertTrue(thrown[0] == null, String.valueOf(thrown[0]));
    }
}
