package dev.proofrun.app.shell;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Session;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.text.UserException;
import java.nio.file.Path;
import java.util.Optional;

/**
 * "Save the plan" when the window closes: writes the plan the steps describe into the draft's plan file
 * (the issued plan when the steps still describe it, else the plan as drafted) and makes it the saved
 * state. Where there is no file yet, or the file holds an issued plan the draft has changed (an issued
 * file is only replaced by its next revision, which Issue makes), the user is asked where
 * ({@link Session#choosePlanFile}). The write is synchronous: the window is closing, and the plan file is a
 * few kilobytes.
 */
public final class CloseSave {

    /** Whether the plan was written, and the line for the status bar. */
    public record Outcome(boolean saved, String message) {
    }

    private CloseSave() {
    }

    /**
     * @param plan    the plan as the steps describe it, empty when they do not describe one yet
     * @param missing why there is no plan (the first thing a step still misses), used when {@code plan} is empty
     */
    public static Outcome save(Session session, Optional<StudyPlan> plan, String missing) {
        if (plan.isEmpty()) {
            return new Outcome(false, AppMessage.CLOSE_NOT_SAVED.format(missing));
        }
        StudyPlan p = plan.get();
        Path file = session.draft().planFileProperty().get();
        boolean issuedFileChanged = session.base().map(StudyPlan::isIssued).orElse(false) && !p.isIssued();
        Optional<Path> target = file != null && !issuedFileChanged ? Optional.of(file)
                : session.choosePlanFile(session.home().plansFolder().resolve(p.id() + ".json"));
        if (target.isEmpty()) {
            return new Outcome(false, AppMessage.CLOSE_NOT_SAVED.format(AppMessage.CLOSE_NO_FILE.format()));
        }
        try {
            Path written = session.write(target.get(), p);
            session.adopt(written, p, false);
            return new Outcome(true, AppMessage.CLOSE_SAVED.format(written.getFileName()));
        } catch (UserException | java.io.UncheckedIOException e) {
            return new Outcome(false, AppMessage.CLOSE_NOT_SAVED.format(e.getMessage()));
        }
    }
}
