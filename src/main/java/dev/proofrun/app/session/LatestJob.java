package dev.proofrun.app.session;

import java.util.concurrent.Callable;
import java.util.function.Consumer;

/**
 * One kind of background work of which only the latest request counts: a preview, a schedule, a plan file
 * being read. {@link #submit} cancels the job still under way and hands the work to the {@link Background};
 * an answer (or failure) is passed on only if no job was submitted and nothing {@link #forget forgotten} since
 * its own submit, so an older job's answer never overwrites a newer one's, whatever order they arrive in.
 *
 * <p>It keeps no lock: call it on the thread the {@link Background} answers on. With {@link Background#fx} that
 * is the FX thread, and submit, forget and the answers never overlap. With {@link Background#inline} the answer
 * is passed on inside {@code submit}, before it returns; the job is then no longer pending when {@code submit}
 * returns, and a callback may itself submit again (the newer job wins).
 */
public final class LatestJob {

    /** What a side job remembers of the latest job when it starts (see {@link #mark}). */
    @FunctionalInterface
    public interface Mark {
        /** True while no job was submitted and nothing forgotten since the mark was taken. */
        boolean stillCurrent();
    }

    private final Background background;
    /** Counts submits and forgets; an answer is passed on only if the count is still the one of its submit. */
    private long generation;
    /** True from a submit until its answer comes or is dropped. */
    private boolean awaiting;
    /** The job under way, to cancel; null when none, or while {@code Background.submit} has not returned. */
    private Background.Job running;

    public LatestJob(Background background) {
        this.background = background;
    }

    /**
     * Cancels the older job, if one is under way, and starts this one. Exactly one of {@code done} and
     * {@code failed} is called when it ends, unless a later submit or {@link #forget} came first; then
     * neither is.
     */
    public <T> void submit(Callable<T> work, Consumer<T> done, Consumer<Throwable> failed) {
        cancelRunning();
        long mine = ++generation;
        awaiting = true;
        Background.Job job = background.submit(work, value -> {
            if (answered(mine)) {
                done.accept(value);
            }
        }, problem -> {
            if (answered(mine)) {
                failed.accept(problem);
            }
        });
        if (mine == generation && awaiting) {
            running = job; // not answered at once (Background.inline answers inside submit)
        }
    }

    /**
     * Cancels the job under way, if any, and drops its answer.
     *
     * @return true when an answer was still awaited
     */
    public boolean forget() {
        boolean wasAwaiting = awaiting;
        cancelRunning();
        generation++;
        return wasAwaiting;
    }

    /**
     * Marks the latest job as it is now, without touching it: a side job that started from its answer (a report
     * written from a result shown) asks {@link Mark#stillCurrent()} when it ends, to know whether that answer
     * still stands.
     */
    public Mark mark() {
        long at = generation;
        return () -> at == generation;
    }

    /** True for the latest job's answer, which ends the wait; false for an older job's. */
    private boolean answered(long mine) {
        if (mine != generation) {
            return false;
        }
        running = null;
        awaiting = false;
        return true;
    }

    private void cancelRunning() {
        if (running != null) {
            running.cancel();
            running = null;
        }
        awaiting = false;
    }
}
