package dev.proofrun.sheet;

import dev.proofrun.text.MessageKey;

/** What the sheet step tells people. */
public enum SheetMessage implements MessageKey {
    /** An unissued plan without --draft. */
    DRAFT_REFUSED("plan %s is a draft: issue it first (proofrun plan issue), or print a sheet marked DRAFT with --draft"),
    /** The output path exists and is not a directory. */
    OUT_NOT_DIRECTORY("%s is not a directory"),
    /** One slot's reading boxes are taller than a page. */
    SLOT_TOO_TALL("the collection sheet cannot hold a slot of %d characteristics with %d readings each on one %s page:"
            + " with these characteristics it holds subgroups of 1 to %d readings"),
    /** Not even one line of boxes per characteristic fits a page. */
    TOO_MANY_CHARACTERISTICS("the collection sheet cannot hold a slot of %d characteristics on one %s page, even with one"
            + " reading each: plan at most %d characteristics together"),
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
