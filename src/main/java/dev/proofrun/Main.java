package dev.proofrun;

import dev.proofrun.app.WizardLauncher;
import dev.proofrun.cli.ProofrunCommand;

/**
 * Entry point of {@code proofrun.jar}: with no arguments it opens the wizard, with arguments it runs the
 * command line. This class must not extend a JavaFX type, so that the shaded jar starts on a plain JVM.
 */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0) {
            WizardLauncher.launch(args);
            return;
        }
        System.exit(ProofrunCommand.run(args));
    }
}
