package dev.proofrun.app.session;

import java.nio.file.Path;
import java.util.Optional;

/**
 * Asks the user where a plan file goes: when a new plan is first saved and on "Save as…". The window
 * answers with a file dialog; tests inject the answer. Empty means the user chose nothing (nothing is
 * written).
 */
@FunctionalInterface
public interface PlanFileChooser {

    /** Until a window installs its dialog: the suggested file, which lies in the user's folder. */
    PlanFileChooser SUGGESTED = Optional::of;

    /**
     * @param suggested the file offered first: in the folder of the current plan file, else in the
     *                  user's plans folder ({@link AppHome#plansFolder()})
     */
    Optional<Path> choose(Path suggested);
}
