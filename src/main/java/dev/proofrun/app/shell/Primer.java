package dev.proofrun.app.shell;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * Loads and links, on a background thread, the classes the FX thread will need for the wizard's pages. The
 * first time a JavaFX application shows a table, a text field or a chart, its FX thread reads, defines and
 * verifies hundreds of classes; on a cold start that was a large part of the first showing of a page. The
 * names come from {@value #LIST}, made from a class-load log of the full robot flow.
 *
 * <p>Only loading and linking happen here, never a class's static initialiser and never a node: the JVM
 * makes class loading safe from any thread, while JavaFX's own off-thread building is not (measuring text
 * on two threads at once broke a label's layout when this class used to build a throwaway scene). If any
 * of it fails, it is skipped: the wizard works the same, only slower to show its first pages.
 */
public final class Primer {

    /** The class list, on the class path. */
    static final String LIST = "primer-classes.txt";

    private static final AtomicBoolean STARTED = new AtomicBoolean();

    private Primer() {
    }

    /** Starts the priming once per JVM on a daemon thread; later calls do nothing. */
    public static void begin() {
        if (!STARTED.compareAndSet(false, true)) {
            return;
        }
        Thread t = new Thread(Primer::prime, "proofrun-primer");
        t.setDaemon(true);
        t.start();
    }

    /**
     * Loads and links every class of the list that this JavaFX version has.
     *
     * @return how many classes were loaded and linked
     */
    static int prime() {
        ClassLoader loader = Primer.class.getClassLoader();
        int done = 0;
        for (String name : names()) {
            try {
                Class<?> c = Class.forName(name, false, loader);
                // reflection links (verifies) the class without running its static initialiser
                c.getDeclaredConstructors();
                done++;
            } catch (ClassNotFoundException | LinkageError | SecurityException e) {
                // not in this JavaFX version, or not to be touched: the FX thread loads it when needed
            }
        }
        return done;
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
