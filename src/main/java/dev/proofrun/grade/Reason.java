package dev.proofrun.grade;

import java.util.Objects;

/**
 * One sentence of the argument behind a verdict.
 *
 * @param step     which step of the evidence it belongs to
 * @param decisive true when this reason alone sets the verdict (e.g. "unstable")
 * @param text     the sentence people read
 */
public record Reason(Step step, boolean decisive, String text) {

    public Reason {
        Objects.requireNonNull(step, "step");
        Objects.requireNonNull(text, "text");
    }

    @Override
    public String toString() {
        return text;
    }
}
