package dev.proofrun.cli;

import dev.proofrun.text.MessageKey;

/** Messages of {@code proofrun plan}: option values that cannot be used, and what the command did. */
public enum PlanOptionMessage implements MessageKey {
    NEED_CHARACTERISTIC("give either --characteristics FILE.csv or --characteristic with --unit, --target and --expected"),
    BOTH_CHARACTERISTIC_FORMS("give either --characteristics FILE.csv or one characteristic's options (--characteristic, --target,"
            + " --expected, --lsl, --usl, --shape, --threshold, --floor), not both: the file holds each characteristic's own values"),
    OUT_EXISTS("%s exists; add --force to replace it (the old file is kept as .bak)"),
    RATE_ASSUMED("no --rate or --cycle-seconds given: assumed %s parts per hour"),
    WROTE("wrote %s: %s, draft"),
    ISSUED("issued %s as %s, reference %s"),
    ALREADY_ISSUED("%s is already issued as %s; nothing changed"),
    REISSUED("%s was changed after it was issued as %s; issued the change as %s (it supersedes %s);"
            + " the file as found is kept as %s.bak"),
    STAGES_RANGE("--stages: a study has 1 to %d stages, not %d"),
    STAGES_TOO_CLOSE("--stages %d: %d subgroups cannot be split into stages at least %d subgroups apart; plan at least %d subgroups or fewer stages"),
    SPENDING_WITHOUT_STAGES("--spending applies to a staged plan: give --stages 2 to %d with it"),
    STAGES_ONE_CONFIDENCE("--stages: a staged plan needs one confidence for all characteristics (each look's boundary serves them all)"),
    STAGES_PLANNED("stages: %d looks at %s subgroups, bounds at %s %% confidence (%s spending, calibrated on the looks' joint distribution so the whole study keeps its false-pass risk); %d subgroups of %d (%d readings) at most"),
    STAGES_POWER("stages: %s power %.3f, on average %.0f readings when the process is as expected (one stage: %d)%s"),
    STAGES_SHARED(" (its own calibration at this k; the plan takes the strictest confidence of all characteristics at each look and no futility stops, so this is approximate)"),
    CHANGED_WARNING("warning: this plan was changed after it was issued as revision %s (its content gives %s);"
            + " it cannot be used until the change is issued ('proofrun plan issue')");

    private final String english;

    PlanOptionMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
