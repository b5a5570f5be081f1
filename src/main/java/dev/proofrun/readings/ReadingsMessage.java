package dev.proofrun.readings;

import dev.proofrun.text.MessageKey;

/** Messages about reading files of measurements that people read. */
public enum ReadingsMessage implements MessageKey {
    NOT_FOUND("file not found"),
    NOT_READABLE("cannot read the file: %s"),
    EMPTY_FILE("the file is empty"),
    NO_HEADER("no header: expected a 'value' column (optionally with 'subgroup') or columns x1, x2, ..."),
    NOT_A_NUMBER("not a number: '%s'"),
    NOT_FINITE("not a finite number: '%s'"),
    TOO_LARGE("'%s' is too large to compute with (at most %.0e either side of zero): probably a typing error"),
    MISSING_VALUE("missing reading"),
    EMPTY_ROW("no readings in this row"),
    MISSING_COLUMN("missing column x%d"),
    DUPLICATE_COLUMN("column '%s' appears twice"),
    BAD_CSV("not valid CSV: %s"),
    MISSING_LABEL("missing subgroup label"),
    EXTRA_CELLS("%d cells but the header has %d (a decimal comma? use a decimal point)"),
    TOO_FEW_READINGS("need at least 2 readings, found %d"),
    BAD_SUBGROUP_SIZE("the subgroup size must be at least 1: %d"),
    SIZE_WITH_SUBGROUPS("--subgroup-size cannot be combined with a '%s' layout: the file already forms the subgroups"),
    INCOMPLETE_SUBGROUP("%d readings do not fill subgroups of %d: the last subgroup, starting here, has %d");

    private final String english;

    ReadingsMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
