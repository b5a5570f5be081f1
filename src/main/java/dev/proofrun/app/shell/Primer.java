package dev.proofrun.app.shell;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * Loads and links, on a background thread, the classes the wizard will need for its pages and jobs. The
 * first time a JavaFX application shows a table, a text field or a chart, its FX thread reads, defines and
 * verifies hundreds of classes; on a cold start that was a large part of the first showing of a page. The
 * names come from {@value #LIST}, made from a class-load log of the full robot flow.
 *
 * <p>Only loading and linking happen here, never a JavaFX class's static initialiser and never a node: the
 * JVM makes class loading safe from any thread, while JavaFX's own off-thread building is not (measuring
 * text on two threads at once broke a label's layout when this class used to build a throwaway scene; see
 * {@link WarmUp} for what runs on the FX thread instead). Our own records are the exception: their equals
 * and hashCode are run once (which initialises them). If any of it fails, it is skipped: the wizard works
 * the same, only slower to show its first pages.
 */
public final class Primer {

    /** The class list, on the class path. */
    static final String LIST = "primer-classes.txt";

    private static final AtomicBoolean STARTED = new AtomicBoolean();
    private static final CountDownLatch DONE = new CountDownLatch(1);

    private Primer() {
    }

    /** Starts the priming once per JVM on a daemon thread; later calls do nothing. */
    public static void begin() {
        if (!STARTED.compareAndSet(false, true)) {
            return;
        }
        Thread t = new Thread(() -> {
            try {
                prime();
            } finally {
                DONE.countDown();
            }
        }, "proofrun-primer");
        t.setDaemon(true);
        t.start();
    }

    /**
     * Waits until the priming is done, at most the given time; returns at once if it never began. The
     * window waits for it before it shows: primed while the window is built (on another core), it no
     * longer competes with the shown window's first frames for the processor.
     *
     * @return true when the priming is done
     */
    public static boolean awaitDone(long millis) {
        if (!STARTED.get()) {
            return true;
        }
        try {
            return DONE.await(millis, TimeUnit.MILLISECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    /**
     * Loads and links every class of the list that this JavaFX version has.
     *
     * @return how many classes were loaded and linked
     */
    static int prime() {
        ClassLoader loader = Primer.class.getClassLoader();
        Object unsafe = unsafe();
        int done = 0;
        for (String name : names()) {
            try {
                Class<?> c = Class.forName(name, false, loader);
                // reflection links (verifies) the class without running its static initialiser
                c.getDeclaredConstructors();
                if (unsafe != null && c.isRecord() && name.startsWith(OWN)) {
                    linkRecordMethods(unsafe, c);
                }
                done++;
            } catch (ClassNotFoundException | LinkageError | SecurityException e) {
                // not in this JavaFX version, or not to be touched: the FX thread loads it when needed
            }
        }
        return done;
    }

    /** Our own classes: only their records get their methods linked. */
    private static final String OWN = "dev.proofrun.";

    /**
     * A record's equals and hashCode are linked by the JVM the first time each runs (an invokedynamic call
     * site that builds method handles); on the FX thread that was 5 to 20 ms per record on a cold start,
     * and the wizard compares records to skip work it has done. Here each runs once on two blank
     * instances (made without a constructor, never shared; their components are null or zero, which the
     * generated methods accept). A record whose own methods do not accept that is left to the FX thread.
     */
    private static void linkRecordMethods(Object unsafe, Class<?> record) {
        try {
            java.lang.reflect.Method allocate = unsafe.getClass().getMethod("allocateInstance", Class.class);
            Object a = allocate.invoke(unsafe, record);
            Object b = allocate.invoke(unsafe, record);
            a.equals(b);
            a.hashCode();
        } catch (ReflectiveOperationException | RuntimeException e) {
            // left to the FX thread
        }
    }

    /** The JDK's sun.misc.Unsafe (module jdk.unsupported), or null where it cannot be had. */
    private static Object unsafe() {
        try {
            Class<?> type = Class.forName("sun.misc.Unsafe");
            java.lang.reflect.Field f = type.getDeclaredField("theUnsafe");
            f.setAccessible(true);
            return f.get(null);
        } catch (ReflectiveOperationException | RuntimeException e) {
            return null;
        }
    }

    /** The class names of the list, comments and blank lines left out; empty if the list is missing. */
    static List<String> names() {
        List<String> names = new ArrayList<>();
        try (InputStream in = Primer.class.getResourceAsStream(LIST)) {
            if (in == null) {
                return names;
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                String s = line.strip();
                if (!s.isEmpty() && !s.startsWith("#")) {
                    names.add(s);
                }
            }
        } catch (IOException e) {
            // priming only saves time
        }
        return names;
    }
}
