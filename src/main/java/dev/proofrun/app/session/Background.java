package dev.proofrun.app.session;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import javafx.concurrent.Task;

/**
 * Runs the core's long work off the FX thread. {@link #fx} wraps each job in a JavaFX {@link Task} on a
 * daemon worker, and delivers the answer on the FX thread; {@link #inline} runs the job at once on the
 * calling thread (plain view-model tests). Work of which only the latest request counts goes through a
 * {@link LatestJob}, which cancels the older job and drops its answer.
 */
public interface Background {

    /** A submitted job. */
    interface Job {
        void cancel();
    }

    <T> Job submit(Callable<T> work, Consumer<T> done, Consumer<Throwable> failed);

    /** One daemon worker thread with the given name, answers on the FX thread. */
    static Background fx(String threadName) {
        return on(Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, threadName);
            t.setDaemon(true);
            return t;
        }));
    }

    /**
     * Like {@link #fx}, for work that must not be cut off when the window closes (writing a plan file): the
     * worker is not a daemon, so the JVM finishes a started write before it exits, and it ends itself
     * {@value #IDLE_SECONDS} s after its last job, so an idle worker never holds the JVM open.
     */
    static Background fxFinishing(String threadName) {
        ThreadPoolExecutor worker = new ThreadPoolExecutor(0, 1, IDLE_SECONDS, TimeUnit.SECONDS,
                new LinkedBlockingQueue<>(), r -> {
                    Thread t = new Thread(r, threadName);
                    t.setDaemon(false);
                    return t;
                });
        return on(worker);
    }

    /** Seconds an idle {@link #fxFinishing} worker waits for another job before it ends. */
    int IDLE_SECONDS = 2;

    private static Background on(ExecutorService worker) {
        return new Background() {
            @Override
            public <T> Job submit(Callable<T> work, Consumer<T> done, Consumer<Throwable> failed) {
                Task<T> task = new Task<>() {
                    @Override
                    protected T call() throws Exception {
                        return work.call();
                    }
                };
                task.setOnSucceeded(e -> done.accept(task.getValue()));
                task.setOnFailed(e -> failed.accept(task.getException()));
                worker.execute(task);
                return () -> task.cancel(true);
            }
        };
    }

    /** Runs each job at once on the caller's thread. */
    static Background inline() {
        return new Background() {
            @Override
            public <T> Job submit(Callable<T> work, Consumer<T> done, Consumer<Throwable> failed) {
                T value;
                try {
                    value = work.call();
                } catch (Exception | Error e) {
                    failed.accept(e);
                    return () -> { };
                }
                done.accept(value);
                return () -> { };
            }
        };
    }
}
