package dev.proofrun.app;

import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import javafx.application.Platform;

/**
 * Measures how long the FX thread is kept from running queued work: every 5 ms (when no probe is
 * waiting) a probe is queued with {@link Platform#runLater}; the time from queueing to running is the
 * FX thread's latency at that moment. The worst latency is what a user would feel as a frozen window.
 */
final class FxProbe implements AutoCloseable {

    private final ScheduledExecutorService timer = Executors.newSingleThreadScheduledExecutor(r -> {
        Thread t = new Thread(r, "fx-probe");
        t.setDaemon(true);
        return t;
    });
    private final AtomicBoolean waiting = new AtomicBoolean(false);
    private final AtomicLong worstNanos = new AtomicLong(0);
    private final AtomicLong probes = new AtomicLong(0);
    private volatile String phase = "start";
    private final java.util.Map<String, Double> worstByPhase = new java.util.LinkedHashMap<>();
    private final java.util.Map<String, Double> cpuByPhase = new java.util.HashMap<>();

    private final java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
    private volatile long fxThreadId = -1;
    private final AtomicLong worstCpuNanos = new AtomicLong(0);

    private FxProbe() {
    }

    /**
     * A probe that starts measuring when the window first shows (the window's first frame and whatever
     * the application does on the FX thread after {@code show()} count; building the window before it
     * shows does not, as nobody sees a frozen window then). Call on the FX thread before the window shows.
     */
    static FxProbe fromShowing(javafx.stage.Stage stage) {
        FxProbe p = new FxProbe();
        stage.addEventHandler(javafx.stage.WindowEvent.WINDOW_SHOWN, new javafx.event.EventHandler<>() {
            @Override
            public void handle(javafx.stage.WindowEvent e) {
                stage.removeEventHandler(javafx.stage.WindowEvent.WINDOW_SHOWN, this);
                p.fxThreadId = Thread.currentThread().getId();
                p.timer.scheduleAtFixedRate(p::probe, 0, 5, TimeUnit.MILLISECONDS);
            }
        });
        return p;
    }

    /** CPU time the FX thread has used so far, or -1 if unknown. */
    private long fxCpu() {
        long id = fxThreadId;
        return id < 0 || !threads.isThreadCpuTimeSupported() ? -1 : threads.getThreadCpuTime(id);
    }

    private volatile long postedAt;
    private volatile boolean dumped;
    private volatile long dumps;
    private final long born = System.nanoTime();
    private final StringBuilder blocks = new StringBuilder();

    private void probe() {
        if (!waiting.compareAndSet(false, true)) {
            long late = System.nanoTime() - postedAt;
            if (late > 100_000_000L && late / 400_000_000L >= dumps) {
                dumps++;
                dumped = true;
                Thread.getAllStackTraces().forEach((t, st) -> {
                    if (t.getName().contains("JavaFX Application")) {
                        synchronized (blocks) {
                            blocks.append(String.format(java.util.Locale.ROOT, "FX thread busy %.0f ms, %.1f s after start (%s), at:%n",
                                    late / 1e6, (System.nanoTime() - born) / 1e9, phase));
                            for (int i = 0; i < Math.min(Integer.getInteger("probe.depth", 24), st.length); i++) {
                                blocks.append("    ").append(st[i]).append('\n');
                            }
                        }
                    }
                });
            }
            return;
        }
        long posted = System.nanoTime();
        postedAt = posted;
        long cpu0 = fxCpu();
        dumped = false;
        dumps = 0;
        Platform.runLater(() -> {
            long gap = System.nanoTime() - posted;
            worstNanos.accumulateAndGet(gap, Math::max);
            long cpu1 = fxCpu();
            if (cpu0 >= 0 && cpu1 >= 0) {
                worstCpuNanos.accumulateAndGet(cpu1 - cpu0, Math::max);
                synchronized (worstByPhase) {
                    cpuByPhase.merge(phase, (cpu1 - cpu0) / 1e6, Math::max);
                }
            }
            synchronized (worstByPhase) {
                worstByPhase.merge(phase, gap / 1e6, Math::max);
            }
            probes.incrementAndGet();
            waiting.set(false);
        });
    }

    /** Where the FX thread was when it was busy for more than 100 ms (one stack per episode). */
    String blocks() {
        synchronized (blocks) {
            return blocks.toString();
        }
    }

    /** Names what the robot does from now on; latencies are also kept per phase. */
    void phase(String name) {
        phase = name;
    }

    /**
     * The worst latency of each phase, in the order the phases began, with the most CPU time the FX
     * thread used within one wait of that phase: "open 812 ms (cpu 240), goal 95 ms (cpu 60), …".
     */
    String worstByPhase() {
        synchronized (worstByPhase) {
            StringBuilder b = new StringBuilder();
            worstByPhase.forEach((k, v) -> b.append(b.length() == 0 ? "" : ", ")
                    .append(String.format(java.util.Locale.ROOT, "%s %.0f ms (cpu %.0f)", k, v, cpuByPhase.getOrDefault(k, 0.0))));
            return b.toString();
        }
    }

    /**
     * The most CPU time the FX thread itself used while one probe waited: the part of the latency that is
     * the wizard's own work, the rest being the wait for a core on a loaded machine.
     */
    double worstCpuMillis() {
        return worstCpuNanos.get() / 1e6;
    }

    double worstMillis() {
        return worstNanos.get() / 1e6;
    }

    long probes() {
        return probes.get();
    }

    @Override
    public void close() {
        timer.shutdownNow();
    }
}
