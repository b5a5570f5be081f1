package dev.proofrun.grade;

/** How much a problem found in a returned file matters. */
public enum Severity {
    /** The cell, row or file could not be used as returned (a reading is missing from the analysis, or the file is refused). */
    ERROR("error"),
    /** Used, but suspicious or off the plan: a reading off the gauge's resolution, a probable typing error, a reading taken outside its window. */
    WARNING("warning"),
    /** Worth knowing, no effect on the analysis. */
    NOTE("note");

    private final String id;

    Severity(String id) {
        this.id = id;
    }

    public String id() {
        return id;
    }
}
