package dev.proofrun.app.sizing;

import dev.proofrun.design.DesignTerm;
import java.util.Optional;
import java.util.function.Function;

/**
 * The columns of the design table on screen: a short header in the command line's words ({@link DesignTerm}),
 * grouped where the command line groups them ("called unstable", "some rule fires": stable / shift), a tooltip
 * that says what the figure means, and the row's text.
 */
public enum SizingColumn {
    N(null, DesignTerm.SUBGROUP_SIZE, "Subgroup size n: consecutive parts taken at each slot", SizingRow::n),
    K(null, DesignTerm.SUBGROUPS, "Number of subgroups k", SizingRow::k),
    READINGS(null, DesignTerm.READINGS, "Readings N = n·k", SizingRow::readings),
    POWER(null, DesignTerm.POWER, "Chance that grading returns 'demonstrated' when the process is as expected: the lower"
            + " bound reaches the required minimum c₀ and no check (shape, stability, lost subgroups) voids the study",
            SizingRow::power),
    BOUND(null, DesignTerm.BOUND, "Chance that the lower bound alone reaches c₀ (no checks counted)", SizingRow::bound),
    CRITICAL(null, DesignTerm.CRITICAL, "c*: the smallest estimated index whose lower bound reaches c₀, at the expected"
            + " centring", SizingRow::critical),
    DF(null, DesignTerm.DF, "Degrees of freedom of the within-sigma estimate (effective, after Patnaik 1950, for R̄/d2,"
            + " S̄/c4 and moving range)", SizingRow::df),
    LIMITED_BY(null, DesignTerm.LIMITED_BY, "What fixed k: the wanted power, or a practice floor (25 subgroups,"
            + " 100 readings)", SizingRow::limitedBy),
    UNSTABLE_STABLE(DesignTerm.CALLED_UNSTABLE, DesignTerm.STABLE, "Chance that grading calls a stable process unstable"
            + " (and the study not valid), with grading's own stability rule at this number of subgroups",
            SizingRow::unstableWhenStable),
    UNSTABLE_SHIFT(DesignTerm.CALLED_UNSTABLE, DesignTerm.SHIFT, "Chance that grading calls the process unstable when its"
            + " mean moves by δ·σ_w for the second half of the study (grading's own rule)", SizingRow::unstableAfterShift),
    RULE_STABLE(DesignTerm.SOME_RULE_FIRES, DesignTerm.STABLE, "Chance that some chart rule fires at least once in the"
            + " study (all eight run rules) on a stable process: what a chart shows, not what grading decides",
            SizingRow::ruleWhenStable),
    RULE_SHIFT(DesignTerm.SOME_RULE_FIRES, DesignTerm.SHIFT, "Chance that some chart rule fires at least once in the"
            + " study (all eight run rules) after the shift: what a chart shows, not what grading decides",
            SizingRow::ruleAfterShift);

    private final DesignTerm group;
    private final DesignTerm header;
    private final String tip;
    private final Function<SizingRow, String> text;

    SizingColumn(DesignTerm group, DesignTerm header, String tip, Function<SizingRow, String> text) {
        this.group = group;
        this.header = header;
        this.tip = tip;
        this.text = text;
    }

    /** The header of the group this column sits under ("called unstable"), if any. */
    public Optional<String> group() {
        return Optional.ofNullable(group).map(DesignTerm::english);
    }

    /** The header: the command line's word for the figure. */
    public String header() {
        return header.english();
    }

    /** What the figure means, for the header's tooltip. */
    public String tip() {
        return tip;
    }

    /** The row's text in this column. */
    public String text(SizingRow row) {
        return text.apply(row);
    }
}
