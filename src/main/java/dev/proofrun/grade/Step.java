package dev.proofrun.grade;

/** The steps of the argument, in the order the reasons are given. */
public enum Step {
    /** Was the plan followed: every slot, every reading, on time. */
    COMPLETENESS("completeness"),
    /** Was the process in statistical control during the study. */
    STABILITY("stability"),
    /** Is the distribution model fair. */
    SHAPE("shape"),
    /** Does the confidence bound reach the requirement. */
    CAPABILITY("capability");

    private final String id;

    Step(String id) {
        this.id = id;
    }

    public String id() {
        return id;
    }
}
