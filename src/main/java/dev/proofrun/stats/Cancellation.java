package dev.proofrun.stats;

import java.util.concurrent.CancellationException;

/**
 * Lets a long simulation stop when the job that asked for it is cancelled. A job is cancelled by interrupting the
 * thread it runs on (what a JavaFX {@code Task.cancel(true)} does); the simulation takes a {@code Cancellation} of
 * that thread when it starts and calls {@link #check} between pieces of work, also from the threads of a parallel
 * stream, which are never interrupted themselves. Nothing else changes: a thread that is never interrupted (the
 * command line, the tests) runs every simulation to the end, with the same draws.
 *
 * <p>A cancelled simulation ends with a {@link CancellationException} and returns nothing, so no half-made result is
 * kept ({@link RecentResults} keeps nothing when its computation throws). The interrupt stays set for the job's
 * owner to see.
 */
public final class Cancellation {

    private final Thread owner;

    private Cancellation(Thread owner) {
        this.owner = owner;
    }

    /** The calling thread's: {@link #check} fails once this thread has been interrupted. */
    public static Cancellation ofCallingThread() {
        return new Cancellation(Thread.currentThread());
    }

    /**
     * Returns when the job may go on; callable from any thread.
     *
     * @throws CancellationException when the thread this was taken on has been interrupted
     */
    public void check() {
        if (owner.isInterrupted()) {
            throw new CancellationException("cancelled: " + owner.getName() + " was interrupted");
        }
    }
}
