package dev.proofrun.app.handout;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.Session;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Supplier;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.StringProperty;

/**
 * The Hand-out step's writes of the plan file: issuing and Save as…, each off the FX thread. Part of
 * {@link HandoutViewModel}, which owns the properties it sets ({@code issuing}, {@code message}).
 */
final class PlanWrites {

    private final Session session;
    private final ComposedPlan plans;
    private final Background files;
    private final BooleanProperty issuing;
    private final StringProperty message;
    private final Supplier<String> missing;
    private final Runnable afterIssue;

    PlanWrites(Session session, ComposedPlan plans, Background files, BooleanProperty issuing, StringProperty message,
            Supplier<String> missing, Runnable afterIssue) {
        this.session = session;
        this.plans = plans;
        this.files = files;
        this.issuing = issuing;
        this.message = message;
        this.missing = missing;
        this.afterIssue = afterIssue;
    }

    /**
     * Issues what the steps describe and writes it to the plan file; for a new plan the user is asked where
     * ({@link Session#choosePlanFile}, offering {@code <id>.json} in the user's plans folder). A changed issued plan becomes a new revision that supersedes the old one.
     *
     * <p>The fingerprint and the synced write run in the background ({@link HandoutViewModel#issuingProperty()} is true
     * meanwhile); the revision appears when the file is written, and a failure is said in
     * {@link HandoutViewModel#messageProperty()}. Edits made meanwhile are kept as unsaved (see {@link Session#adopt}); if
     * another plan was opened meanwhile, only the message tells where the issued plan went.
     *
     * @return true when the issue was started (or the plan is already issued as it stands)
     */
    boolean issue() {
        if (issuing.get()) {
            return false;
        }
        Optional<StudyPlan> now = plans.composed().get().plan();
        if (now.isEmpty()) {
            message.set(missing.get());
            return false;
        }
        if (plans.issued().get().isPresent()) {
            message.set(AppMessage.HANDOUT_ALREADY.format(plans.issued().get().get().revisionWords()));
            return true;
        }
        StudyPlan draft = plans.nextIssue().orElseThrow();
        Path planFile = session.draft().planFileProperty().get();
        Optional<Path> chosen = planFile != null ? Optional.of(planFile)
                : session.choosePlanFile(session.home().plansFolder().resolve(draft.id() + ".json"));
        if (chosen.isEmpty()) {
            message.set(AppMessage.HANDOUT_NOT_SAVED.format());
            return false;
        }
        Path file = chosen.get();
        int editsAtStart = session.draft().editsProperty().get();
        int openedAtStart = session.openedCount();
        issuing.set(true);
        message.set(AppMessage.HANDOUT_ISSUING.format(file.getFileName()));
        files.submit(() -> {
            StudyPlan issued = PlanFiles.issue(draft);
            return new Written(session.write(file, issued), issued);
        }, w -> {
            issuing.set(false);
            String revision = w.plan().revisionWords();
            if (session.openedCount() != openedAtStart) {
                message.set(AppMessage.HANDOUT_ISSUED_ELSEWHERE.format(revision, w.file()));
                return;
            }
            session.adopt(w.file(), w.plan(), session.draft().editsProperty().get() != editsAtStart);
            message.set(AppMessage.HANDOUT_ISSUED_NOW.format(revision, w.file().getFileName()));
            afterIssue.run();
        }, ex -> {
            issuing.set(false);
            message.set(AppMessage.HANDOUT_ISSUE_FAILED.failure(ex));
        });
        return true;
    }

    private record Written(Path file, StudyPlan plan) {
    }

    /**
     * Save as…: writes the plan as it stands (the issued plan when the steps describe it, else the draft
     * plan) to a file the user chooses, in the background; the draft then belongs to that file. Nothing is
     * written when the user chooses nothing or the plan is incomplete.
     *
     * @return true when the write was started
     */
    boolean saveAs(Path folder) {
        if (issuing.get()) {
            return false;
        }
        // a draft made from an issued plan keeps its lineage: it supersedes that revision, numbered one more
        Optional<StudyPlan> plan = plans.issued().get().or(plans::nextIssue);
        if (plan.isEmpty()) {
            message.set(missing.get());
            return false;
        }
        Optional<Path> chosen = session.choosePlanFile(folder.resolve(plan.get().id() + ".json"));
        if (chosen.isEmpty()) {
            message.set(AppMessage.HANDOUT_NOT_SAVED.format());
            return false;
        }
        StudyPlan p = plan.get();
        int editsAtStart = session.draft().editsProperty().get();
        int openedAtStart = session.openedCount();
        issuing.set(true);
        message.set(AppMessage.HANDOUT_SAVING.format(chosen.get().getFileName()));
        files.submit(() -> session.write(chosen.get(), p), written -> {
            issuing.set(false);
            if (session.openedCount() != openedAtStart) {
                return;
            }
            session.adopt(written, p, session.draft().editsProperty().get() != editsAtStart);
            message.set(AppMessage.HANDOUT_SAVED_AS.format(written));
        }, ex -> {
            issuing.set(false);
            message.set(AppMessage.HANDOUT_SAVE_FAILED.failure(ex));
        });
        return true;
    }
}
