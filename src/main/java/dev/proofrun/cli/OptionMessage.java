package dev.proofrun.cli;

import dev.proofrun.text.MessageKey;

/** Messages about option values: {@code OPTION: what is wrong}, and the ones every command reads alike ({@link OptionValues}). */
public enum OptionMessage implements MessageKey {
    BAD_VALUE("%s: %s"),
    UNKNOWN_SIDES("unknown specification sides '%s' (two-sided, upper or lower)"),
    SIDES_DO_NOT_MATCH("--spec does not match the limits given"),
    NO_LIMIT("give at least one specification limit: --lsl, --usl or both"),
    LIMITS_REVERSED("--lsl %s must be below --usl %s"),
    LIMIT_NOT_FINITE("%s must be a finite number: %s"),
    CONFIDENCE_OUT_OF_RANGE("--confidence must lie between %s and %s, got %s");

    private final String english;

    OptionMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
