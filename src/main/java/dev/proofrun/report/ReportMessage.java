package dev.proofrun.report;

import dev.proofrun.text.MessageKey;

/** What the report step tells people. */
public enum ReportMessage implements MessageKey {
    /** Writing the report failed. */
    WRITE_FAILED("could not write the grade report: %s"),
    /** The report's folder does not exist. */
    FOLDER_MISSING("the folder %s does not exist: create it first or write the report elsewhere"),
    // the steps of the argument, as the report and the wizard head them
    STEP_COMPLETENESS("1  Completeness: was the plan followed?"),
    STEP_STABILITY("2  Stability: was the process in control?"),
    STEP_SHAPE("3  Shape: is the distribution model fair?"),
    STEP_CAPABILITY("4  Capability: does the bound reach the requirement?");

    /** The heading of a step of the argument. */
    public static ReportMessage heading(dev.proofrun.grade.Step step) {
        switch (step) {
            case COMPLETENESS:
                return STEP_COMPLETENESS;
            case STABILITY:
                return STEP_STABILITY;
            case SHAPE:
                return STEP_SHAPE;
            default:
                return STEP_CAPABILITY;
        }
    }

    private final String english;

    ReportMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
