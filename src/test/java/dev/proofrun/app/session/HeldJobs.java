package dev.proofrun.app.session;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.Consumer;

/**
 * A worker for plain tests that holds each submitted job until the test ends it, in any order it likes. A
 * cancelled job can still be ended: its answer was already on its way. {@link #answerAtOnce} makes the next jobs
 * answer inside submit, as {@link Background#inline} does.
 */
public final class HeldJobs implements Background {

    /** One submitted job. */
    public static final class Held implements Job {
        private final Runnable run;
        private boolean cancelled;

        private Held(Runnable run) {
            this.run = run;
        }

        /** Runs the work and delivers its answer or its failure. */
        public void end() {
            run.run();
        }

        /** True once the job was cancelled. */
        public boolean cancelled() {
            return cancelled;
        }

        @Override
        public void cancel() {
            cancelled = true;
        }
    }

    private final List<Held> jobs = new ArrayList<>();
    private int atOnce;

    @Override
    public <T> Job submit(Callable<T> work, Consumer<T> done, Consumer<Throwable> failed) {
        Held held = new Held(() -> Background.inline().submit(work, done, failed));
        jobs.add(held);
        if (atOnce > 0) {
            atOnce--;
            held.end();
        }
        return held;
    }

    /** The i-th job submitted, from 0. */
    public Held job(int i) {
        return jobs.get(i);
    }

    /** The next {@code count} jobs answer inside submit. */
    public void answerAtOnce(int count) {
        atOnce = count;
    }
}
