package dev.proofrun.readings;

/** How a readings file arranges its readings into subgroups. */
public enum SubgroupLayout {
    /** A {@code value} column, one reading per row, in time order. */
    VALUES("value"),
    /** A {@code value} column and a {@code subgroup} column naming each reading's subgroup. */
    LABELLED("subgroup"),
    /** One subgroup per row in columns {@code x1..xn}; blank trailing cells make a smaller subgroup. */
    WIDE("x1..xn");

    private final String description;

    SubgroupLayout(String description) {
        this.description = description;
    }

    /** A short description for messages. */
    public String description() {
        return description;
    }
}
