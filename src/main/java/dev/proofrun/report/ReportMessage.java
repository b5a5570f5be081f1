package dev.proofrun.report;

import dev.proofrun.text.MessageKey;

/** What the report step tells people. */
public enum ReportMessage implements MessageKey {
    /** Writing the report failed. */
    WRITE_FAILED("could not write the grade report: %s"),
    /** The report's folder does not exist. */
    FOLDER_MISSING("the folder %s does not exist: create it first or write the report elsewhere");

    private final String english;

    ReportMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
