package dev.proofrun.app.session;

import java.nio.file.Path;
import java.util.Objects;

/**
 * The user's folder, the one place the wizard keeps its work: the recent-plans list, the drafts of plans
 * never saved, and (in {@code plans/} inside it) the copy of the bundled demo plan and the plans saved
 * where the user did not choose otherwise. Standard location {@code ~/.proofrun}; the system property
 * {@code proofrun.home} moves it (tests point it at a temporary folder). The wizard never writes into the
 * folder it was started from unless the user chooses a file there; the Start step shows this folder.
 *
 * @param dir         the folder for the wizard's own files
 * @param plansFolder the default folder for plan files
 */
public record AppHome(Path dir, Path plansFolder) {

    public AppHome {
        Objects.requireNonNull(dir, "dir");
        Objects.requireNonNull(plansFolder, "plansFolder");
    }

    /** {@code proofrun.home} or {@code ~/.proofrun}; plans in its {@code plans/}. */
    public static AppHome standard() {
        String override = System.getProperty("proofrun.home");
        Path dir = override != null && !override.isBlank()
                ? Path.of(override)
                : Path.of(System.getProperty("user.home"), ".proofrun");
        Path home = dir.toAbsolutePath().normalize();
        return new AppHome(home, home.resolve("plans"));
    }

    public Path recentFile() {
        return dir.resolve("recent.json");
    }

    /** The draft of a plan that has no file yet. */
    public Path untitledDraft() {
        return dir.resolve("untitled.draft.json");
    }

    /** The side file that holds the autosaved draft of a plan file: {@code name.json → name.draft.json}. */
    public Path draftFor(Path planFile) {
        if (planFile == null) {
            return untitledDraft();
        }
        String name = planFile.getFileName().toString();
        String base = name.endsWith(".json") ? name.substring(0, name.length() - 5) : name;
        return planFile.resolveSibling(base + ".draft.json");
    }
}
