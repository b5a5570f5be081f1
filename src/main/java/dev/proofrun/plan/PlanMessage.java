package dev.proofrun.plan;

import dev.proofrun.text.MessageKey;

/** Messages of the plan package: reading, writing and issuing plan files; designing a plan's characteristics. */
public enum PlanMessage implements MessageKey {
    CANNOT_READ("cannot read the plan file: %s"),
    REVISION_ISSUED("revision %d (%s)"),
    REVISION_DRAFT("DRAFT of revision %d"),
    REVISION_NUMBER_RANGE("at $.revisionNumber: a revision number is a whole number from 2 up (1 is left out of the file), not %s"),
    CANNOT_WRITE("cannot write the plan file: %s"),
    EMPTY_FILE("the file is empty; expected a proofrun plan (JSON)"),
    TRUNCATED("the file ends too early, after %s (line %d); is it truncated?"),
    NOT_JSON("not valid JSON at %s (line %d, column %d): %s"),
    DUPLICATE_KEY("at %s: the key \"%s\" appears twice in the same object (line %d); a plan says each thing once: keep one"),
    NOT_A_PLAN("not a proofrun plan: $.format is %s, expected \"" + PlanJson.FORMAT + "\""),
    UNKNOWN_VERSION("at $.formatVersion: plan format version %s is not known; this proofrun reads version %d"),
    UNKNOWN_FIELD("at %s: unknown field \"%s\""),
    WRONG_TYPE("at %s: expected %s"),
    MISSING("at %s: a value is required"),
    BAD_VALUE("at %s: %s"),
    SUBGROUP_SIZE_RANGE("at %s: the fill-in files hold subgroups of 1 to %d readings, not %d"),
    EDITED_AFTER_ISSUE("the plan was changed after it was issued as revision %s (its content now gives %s);"
            + " run 'proofrun plan issue' on it to issue the change as a new revision"),
    ISSUED_FILE_PROTECTED("%s holds issued revision %s; an issued plan is not overwritten: issue the change"
            + " as a new revision or save it under another name"),
    NOT_A_PLAN_FILE_TO_REPLACE("%s exists and is not a proofrun plan; it is left untouched"),
    CSV_CANNOT_READ("cannot read the characteristics file: %s"),
    CSV_MISSING_COLUMN("the column '%s' is missing; the header needs %s"),
    CSV_BAD_CELL("%s"),
    CSV_EXTRA_CELLS("%d cells but the header has %d (a decimal comma? use a decimal point)"),
    CSV_NO_ROWS("no characteristics in the file (only a header?)"),
    NO_COMMON_DESIGN("no subgroup size among %s lets every characteristic reach the wanted power; plan them separately"
            + " or lower the power"),
    CHARACTERISTIC_REFUSED("characteristic %s: %s");

    private final String english;

    PlanMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
