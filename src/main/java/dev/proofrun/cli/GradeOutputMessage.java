package dev.proofrun.cli;

import dev.proofrun.text.MessageKey;

/** What {@code proofrun grade} prints around the grade itself (the grade's own words are in the grade package). */
public enum GradeOutputMessage implements MessageKey {
    LOOK_LINE("Graded at look %d of %d (after slot %s, %d subgroups planned so far)%s."),
    LOOK_NEXT(": continue, collect stage %d, slots %s to %s, then send the whole file back");

    private final String english;

    GradeOutputMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
