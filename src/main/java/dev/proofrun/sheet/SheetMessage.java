package dev.proofrun.sheet;

import dev.proofrun.text.MessageKey;

/** What the sheet step tells people. */
public enum SheetMessage implements MessageKey {
    /** An unissued plan without --draft. */
    DRAFT_REFUSED("plan %s is a draft: issue it first (proofrun plan issue), or print a sheet marked DRAFT with --draft"),
    /** The output path exists and is not a directory. */
    OUT_NOT_DIRECTORY("%s is not a directory"),
    /** Writing failed. */
    WRITE_FAILED("could not write the sheet files: %s");

    private final String english;

    SheetMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
