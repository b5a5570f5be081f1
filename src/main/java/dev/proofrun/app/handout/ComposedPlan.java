package dev.proofrun.app.handout;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.PlanDrafts;
import dev.proofrun.app.session.Session;
import dev.proofrun.app.sizing.SizingViewModel;
import dev.proofrun.app.timing.TimingViewModel;
import dev.proofrun.design.Design;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.StagedMessage;
import dev.proofrun.design.Stages;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.PlanState;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.ObjectBinding;

/**
 * The plan the earlier steps describe now ({@link #composed}), and the issued plan when the plan file's issued
 * plan is exactly that ({@link #issued}). Part of the Hand-out step's view-model, kept apart so that the
 * view-model holds only what the step does with the plan (issue, save, preview, export).
 */
final class ComposedPlan {

    private final Session session;
    private final GoalViewModel goal;
    private final SizingViewModel sizing;
    private final TimingViewModel timing;
    private final ObjectBinding<HandoutViewModel.Composed> composed;
    private final ObjectBinding<Optional<StudyPlan>> issued;
    private StudyPlan fingerprinted;
    private String fingerprint;

    ComposedPlan(Session session, GoalViewModel goal, SizingViewModel sizing, TimingViewModel timing) {
        this.session = session;
        this.goal = goal;
        this.sizing = sizing;
        this.timing = timing;
        composed = Bindings.createObjectBinding(this::compose, session.draft().editsProperty(), sizing.designBinding(),
                timing.scheduleChanges(), timing.busyProperty(), goal.requirementBinding(), session.baseProperty());
        issued = Bindings.createObjectBinding(this::computeIssued, composed, session.baseProperty());
    }

    ObjectBinding<HandoutViewModel.Composed> composed() {
        return composed;
    }

    ObjectBinding<Optional<StudyPlan>> issued() {
        return issued;
    }

    /**
     * What an issue of the plan now would issue: the composed plan, superseding the base's revision when the
     * base is issued (then it is the next revision: one more than the base's number).
     */
    Optional<StudyPlan> nextIssue() {
        StudyPlan base = session.baseProperty().get();
        return composed.get().plan().map(p -> base != null && base.isIssued() ? successorOf(p, base) : p);
    }

    /**
     * The base, when it is issued and the steps describe exactly it. Equal plans have equal fingerprints, so
     * a plan equal to the base (apart from state and revision) needs no fingerprint; otherwise the
     * fingerprint is taken once per distinct plan (the rail asks on every edit of any step, and most edits
     * leave the plan as it was or return to it).
     */
    private Optional<StudyPlan> computeIssued() {
        StudyPlan base = session.baseProperty().get();
        Optional<StudyPlan> now = composed.get().plan();
        if (base == null || !base.isIssued() || now.isEmpty()) {
            return Optional.empty();
        }
        StudyPlan same = asDraftOf(now.get(), base);
        if (same.equals(asDraftOf(base, base))) {
            return Optional.of(base);
        }
        return fingerprintOf(same).equals(base.revision().orElse("")) ? Optional.of(base) : Optional.empty();
    }

    private String fingerprintOf(StudyPlan plan) {
        if (!plan.equals(fingerprinted)) {
            fingerprint = PlanFiles.fingerprint(plan);
            fingerprinted = plan;
        }
        return fingerprint;
    }

    /** The plan as a draft with the base's supersedes and number: the content the base's revision was taken over. */
    private static StudyPlan asDraftOf(StudyPlan p, StudyPlan base) {
        return new StudyPlan(p.id(), p.part(), p.people(), p.characteristics(), p.calendar(), p.span(), p.design(),
                p.spacing(), p.seed(), p.schedule(), PlanState.DRAFT, Optional.empty(), base.supersedes(),
                base.revisionNumber(), p.stages());
    }

    /** The plan as the draft of the revision after the base's. */
    private static StudyPlan successorOf(StudyPlan p, StudyPlan base) {
        return new StudyPlan(p.id(), p.part(), p.people(), p.characteristics(), p.calendar(), p.span(), p.design(),
                p.spacing(), p.seed(), p.schedule(), PlanState.DRAFT, Optional.empty(), base.revision(),
                base.revisionNumber() + 1, p.stages());
    }

    /** The base's looks stand: the same number and spending chosen, the same characteristics and design. */
    private boolean keepsLooksOf(StudyPlan base, StudyPlan p) {
        Stages was = base.stages().orElseThrow();
        return was.count() == sizing.looks()
                && was.spending().token().equals(session.draft().text(DraftField.SPENDING))
                && base.characteristics().equals(p.characteristics()) && base.design().equals(p.design());
    }

    private HandoutViewModel.Composed compose() {
        Optional<Design> design = sizing.designBinding().get();
        Optional<Requirement> req = goal.requirementBinding().get();
        if (design.isEmpty() || req.isEmpty() || timing.calendarBinding().get().isEmpty()
                || timing.spanBinding().get().isEmpty() || timing.spacing().isEmpty() || timing.seed().isEmpty()
                || timing.busyProperty().get() || timing.schedule().isEmpty()) {
            return new HandoutViewModel.Composed(Optional.empty(), "");
        }
        List<String> lacking = new ArrayList<>();
        for (CharacteristicDraft row : session.draft().characteristics()) {
            if (goal.expectationFor(row).isEmpty() || row.limits().isEmpty()) {
                lacking.add(row.id());
            }
        }
        if (!lacking.isEmpty()) {
            return new HandoutViewModel.Composed(Optional.empty(),
                    AppMessage.HANDOUT_NO_EXPECTATION.format(String.join(", ", lacking)));
        }
        try {
            StudyPlan p = PlanDrafts.compose(session.draft(), session.base(), req.get(),
                    row -> goal.expectationFor(row).orElseThrow(), timing.calendarBinding().get().get(),
                    timing.spanBinding().get().get(), design.get(), timing.spacing().get(), timing.seed().get(),
                    timing.schedule().get());
            StudyPlan base = session.base().orElse(null);
            if (base != null && base.isStaged() && keepsLooksOf(base, p)) {
                // the looks as issued, while what they were calibrated for stands
                p = p.withStages(base.stages());
            } else if (sizing.looks() > 1) {
                // the Sample-size step's looks, computed for exactly this design (PlannedStages, as plan new --stages)
                Optional<Stages> looks = sizing.plannedStages();
                if (looks.isEmpty()) {
                    return new HandoutViewModel.Composed(Optional.empty(), StagedMessage.STAGED_BUSY.format());
                }
                p = p.withStages(looks);
            }
            return new HandoutViewModel.Composed(Optional.of(p), "");
        } catch (UserException | IllegalArgumentException | java.util.NoSuchElementException e) {
            return new HandoutViewModel.Composed(Optional.empty(), e.getMessage());
        }
    }
}
