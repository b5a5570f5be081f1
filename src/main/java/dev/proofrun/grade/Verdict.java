package dev.proofrun.grade;

/**
 * What a study shows for one characteristic, ordered from best to worst; the part's verdict is the worst
 * of its characteristics ({@link #worse}).
 *
 * <ul>
 * <li>{@link #DEMONSTRATED}: complete, stable, the distribution model fair, and the lower confidence bound
 *     of the required index at or above the required minimum c₀.</li>
 * <li>{@link #INCONCLUSIVE}: the estimate is at or above c₀ but its lower bound is below — more data may
 *     settle it (the grade says about how many more subgroups).</li>
 * <li>{@link #NOT_DEMONSTRATED}: the estimate itself is below c₀ (the reasons say whether even the upper
 *     confidence bound is).</li>
 * <li>{@link #NOT_VALID}: the evidence cannot carry a capability statement: incomplete beyond what the plan
 *     allows, unstable (the index then describes the past, not the process), or no distribution model fits.
 *     Worst, because nothing about the process is known from it.</li>
 * </ul>
 */
public enum Verdict {
    DEMONSTRATED("demonstrated", "Demonstrated"),
    INCONCLUSIVE("inconclusive", "Inconclusive"),
    NOT_DEMONSTRATED("not-demonstrated", "Not demonstrated"),
    NOT_VALID("not-valid", "Not valid");

    private final String id;
    private final String words;

    Verdict(String id, String words) {
        this.id = id;
        this.words = words;
    }

    /** The verdict as a reader sees it on paper and on screen, e.g. "Not valid" (the id stays in JSON). */
    public String words() {
        return words;
    }

    /** The token used in JSON and in scripts, e.g. {@code not-valid}. */
    public String id() {
        return id;
    }

    /** The worse of the two. */
    public Verdict worse(Verdict other) {
        return other.ordinal() > ordinal() ? other : this;
    }
}
