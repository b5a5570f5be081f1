package dev.proofrun.plan;

/**
 * Who the plan is from and for, as free text.
 *
 * @param author    who wrote the plan (name, role); may be empty
 * @param collector who takes the parts and measures them: a team, an operator, a supplier; may be empty
 */
public record People(String author, String collector) {

    public People {
        author = author == null ? "" : author;
        collector = collector == null ? "" : collector;
    }

    public static People unnamed() {
        return new People("", "");
    }
}
