package dev.proofrun.design;

import dev.proofrun.text.MessageKey;

/** What the staged designer tells people: refusals and the recommendation (English inline, Locale.ROOT). */
public enum StagedMessage implements MessageKey {
    BAD_STAGES("--stages must be between 1 and %d: %s"),
    LOOKS_TOO_CLOSE("%d looks over %d subgroups are fewer than %d subgroups apart; plan fewer looks"),
    STAGES_NEED_NORMAL("--stages plans normal-theory bounds only; for --shape %s plan a single stage"),
    STAGES_NEED_ONE_CHARACTERISTIC("--stages plans one characteristic at a time; leave out --characteristics"),
    STAGES_WITHOUT_LOSSES("--stages does not yet count lost subgroups; leave out --loss-rate"),
    STAGED_UNREACHABLE("no staged design of %d looks with subgroups of %d reaches a power of %.3f within %d readings"),
    STAGED_RECOMMENDED("Staged: %d looks save %.0f %% of the readings on average when the process is as expected,"
            + " for %.0f %% more at most."),
    STAGED_NOT_RECOMMENDED("Single stage: %d looks would save %.0f %% of the readings on average when the process is as"
            + " expected for %.0f %% more at most; proofrun stages a study when it saves at least %.0f %% for at most"
            + " %.0f %% more."),
    STAGED_HOW_TO_READ("At a look the study is demonstrated when the estimate reaches 'demonstrated if' (at the expected"
            + " centring; the grader's bound at the look's confidence decides) and stops, not demonstrated, below"
            + " 'stop if'; otherwise it goes on to the next look. The risk holds only when grading happens at the"
            + " planned looks."),
    STAGES_ONE_CONFIDENCE("staged looks are planned for one confidence; give every characteristic the same"),
    STAGED_LOOK("Look %d: %d subgroups (%d readings); demonstrated if %s ≥ %.3f (confidence %.3f %%); stop, not"
            + " demonstrated, if %s < %s."),
    STAGED_LAST_LOOK("Look %d: %d subgroups (%d readings); demonstrated if %s ≥ %.3f (confidence %.3f %%); otherwise"
            + " not demonstrated."),
    STAGED_FIGURES("Power %.3f. Readings expected: %.0f at the requirement, %.0f as expected; at most %d. Single stage:"
            + " %d."),
    STAGED_SHARED_LOOKS("The plan's looks take the strictest confidence any of the %d characteristics needs at %d"
            + " subgroups, without futility stops; the power and readings shown are %s's own at its own looks."),
    STAGED_BUSY("the staged design is being computed (a few seconds)");

    private final String english;

    StagedMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
