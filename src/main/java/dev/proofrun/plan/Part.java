package dev.proofrun.plan;

/**
 * The part the study is about.
 *
 * @param name     what people call it ("bearing housing")
 * @param number   the drawing or part number; empty when not known
 * @param revision the drawing revision; empty when not known
 */
public record Part(String name, String number, String revision) {

    /** @throws IllegalArgumentException if the name is blank */
    public Part {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("part name is required");
        }
        number = number == null ? "" : number;
        revision = revision == null ? "" : revision;
    }

    public static Part named(String name) {
        return new Part(name, "", "");
    }
}
