package dev.proofrun.grade;

import dev.proofrun.text.Token;

/**
 * What a study shows for one characteristic, ordered from best to worst; the part's verdict is the worst
 * of its characteristics ({@link #worse}).
 *
 * <ul>
 * <li>{@link #DEMONSTRATED}: complete, stable, the distribution model fair, and the lower confidence bound
 *     of the required index at or above the required minimum c₀.</li>
 * <li>{@link #CONTINUE}: at a planned look of a staged study before the last, neither demonstrated nor stopped
 *     for futility: the people collect the next stage and send the whole file back (the reasons name its slots).
 *     Not a pass: {@code --require-demonstrated} refuses it like the others.</li>
 * <li>{@link #INCONCLUSIVE}: the estimate is at or above c₀ but its lower bound is below — more data may
 *     settle it (the grade says about how many more subgroups).</li>
 * <li>{@link #NOT_DEMONSTRATED}: the estimate itself is below c₀ (the reasons say whether even the upper
 *     confidence bound is); in a staged study also: stopped for futility at a look, or the last look's bound
 *     below c₀.</li>
 * <li>{@link #NOT_VALID}: the evidence cannot carry a capability statement: incomplete beyond what the plan
 *     allows, unstable (the index then describes the past, not the process), or no distribution model fits.
 *     Worst, because nothing about the process is known from it.</li>
 * </ul>
 */
public enum Verdict implements Token {
    DEMONSTRATED,
    CONTINUE,
    INCONCLUSIVE,
    NOT_DEMONSTRATED,
    NOT_VALID;

    /**
     * The verdict as a reader sees it on paper and on screen: its {@link #token() token} (the word in JSON and in
     * scripts, e.g. {@code not-valid}) with a capital first letter and spaces for hyphens, e.g. "Not valid".
     */
    public String words() {
        String token = token();
        return Character.toUpperCase(token.charAt(0)) + token.substring(1).replace('-', ' ');
    }

    /** The worse of the two. */
    public Verdict worse(Verdict other) {
        return other.ordinal() > ordinal() ? other : this;
    }
}
