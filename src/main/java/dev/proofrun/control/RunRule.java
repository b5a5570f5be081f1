package dev.proofrun.control;

import dev.proofrun.text.Token;

/**
 * The eight run rules for a control chart, named by what they detect. Each works on points standardized to
 * the chart: z = (point − centre)/σ_point, so the centre line is 0 and the control limits are ±3; "1σ" and
 * "2σ" are the zone lines at ±1 and ±2.
 *
 * <p>Sources: L. S. Nelson (1984), "The Shewhart control chart — tests for special causes", Journal of
 * Quality Technology 16(4):237–239; Western Electric Co. (1956), <em>Statistical Quality Control
 * Handbook</em>. The counts below are Nelson's.
 *
 * <p>Where a rule fires: at the point that completes the pattern, and again at every later point that
 * still completes one (a run of 11 on one side fires at its 9th, 10th and 11th point). The zone rules
 * ({@link #TWO_OF_THREE_OUTER}, {@link #FOUR_OF_FIVE_MIDDLE}) fire only at a point that is itself beyond
 * its zone line, so the flagged point is always one of the offending points; near the start of the series
 * the window simply holds fewer points. A point exactly on the centre line belongs to neither side; two
 * equal neighbours are neither rising nor falling. Both break the runs that need a side or a direction.
 *
 * <p>Each rule's {@link #token() token} is its stable word in JSON and on the command line, e.g. {@code run-one-side}.
 */
public enum RunRule implements Token {

    /** One point beyond a control limit, |z| &gt; 3. Detects a sudden large shift or a single outlier. */
    BEYOND_LIMITS(1),
    /** Nine points in a row on the same side of the centre line. Detects a sustained small shift of the mean. */
    RUN_ONE_SIDE(9),
    /** Six points in a row steadily rising or steadily falling (five rises or five falls in a row). Detects drift, e.g. tool wear. */
    TREND(6),
    /** Fourteen points in a row alternating up and down. Detects over-adjustment or two alternating streams (two machines, two gauges). */
    ALTERNATING(14),
    /** Two of three points in a row beyond 2σ (|z| &gt; 2) on the same side. Detects a moderate shift early. */
    TWO_OF_THREE_OUTER(3),
    /** Four of five points in a row beyond 1σ (|z| &gt; 1) on the same side. Detects a small shift early. */
    FOUR_OF_FIVE_MIDDLE(5),
    /** Fifteen points in a row within 1σ (|z| &lt; 1) on either side. Detects stratification: limits too wide, e.g. subgroups that mix streams. */
    HUGGING_CENTRE(15),
    /** Eight points in a row beyond 1σ (|z| &gt; 1) on either side, none within. Detects a mixture of two distributions, e.g. two set-ups. */
    AVOIDING_CENTRE(8);

    private final int span;

    RunRule(int span) {
        this.span = span;
    }

    /** How many consecutive points the pattern spans (the earliest index at which it can fire is span − 1). */
    public int span() {
        return span;
    }
}
