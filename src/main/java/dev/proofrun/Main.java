package dev.proofrun;

import dev.proofrun.app.WizardLauncher;
import dev.proofrun.cli.ProofrunCommand;
import java.util.Locale;
import java.util.Map;

/**
 * Entry point of {@code proofrun.jar}: with no arguments it opens the wizard, with arguments it runs the
 * command line. This class must not extend a JavaFX type, so that the shaded jar starts on a plain JVM.
 *
 * <p>On Linux with neither {@code DISPLAY} nor {@code WAYLAND_DISPLAY} set there is no screen for the wizard:
 * the jar says so in one line with what to do ({@link LaunchMessage#NO_DISPLAY}) and exits 2, instead of the
 * toolkit's stack trace. A platform chosen explicitly ({@code -Dglass.platform=Monocle}, headless tests) is
 * left alone; a toolkit that still fails to open a display is caught and said the same way.
 */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0) {
            String missing = missingDisplay(System.getProperty("os.name", ""), System.getenv(),
                    System.getProperty("glass.platform"));
            if (missing != null) {
                System.err.println("proofrun: " + LaunchMessage.NO_DISPLAY.format(missing));
                System.exit(ProofrunCommand.EXIT_INPUT);
            }
            try {
                WizardLauncher.launch(args);
            } catch (UnsupportedOperationException e) {
                if (e.getMessage() == null || !e.getMessage().contains("DISPLAY")) {
                    throw e;
                }
                System.err.println("proofrun: " + LaunchMessage.NO_DISPLAY.format(e.getMessage()));
                System.exit(ProofrunCommand.EXIT_INPUT);
            }
            return;
        }
        System.exit(ProofrunCommand.run(args));
    }

    /**
     * Why there is no display, or null when there may be one: only on Linux and other X11/Wayland systems
     * (not Windows or macOS), only when no glass platform was chosen explicitly.
     */
    static String missingDisplay(String os, Map<String, String> env, String glassPlatform) {
        String name = os.toLowerCase(Locale.ROOT);
        if (name.startsWith("windows") || name.startsWith("mac") || glassPlatform != null) {
            return null;
        }
        boolean x11 = !env.getOrDefault("DISPLAY", "").isBlank();
        boolean wayland = !env.getOrDefault("WAYLAND_DISPLAY", "").isBlank();
        return x11 || wayland ? null : "neither DISPLAY nor WAYLAND_DISPLAY is set";
    }
}
