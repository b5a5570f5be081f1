package dev.proofrun.app;

import javafx.application.Application;

/** Starts the JavaFX wizard; kept apart from {@code Main} so the jar starts on a plain JVM. */
public final class WizardLauncher {

    private WizardLauncher() {
    }

    public static void launch(String[] args) {
        Application.launch(WizardApp.class, args);
    }
}
