/**
 * Part: the part, the people and the characteristics table (cells checked on every keystroke on a copy of the
 * row, committed on Enter or on leaving the cell). The table's columns are those of the command line's
 * characteristics CSV plus the gauge ({@code app.session.CharacteristicField}); each row may carry its own
 * requirement (index, c₀, confidence; blank cells take the plan's, set on Goal) and the expected Cp of an
 * off-centre process ({@code app.session.RowRequirement}). The Threshold column holds the declared threshold θ of a
 * lognormal3/weibull3 row ({@code app.session.RowThreshold}, the plan model's rules and words); for the other shapes
 * the cell is greyed, not edited and passed over by Tab, and choosing such a shape empties it (one undoable edit). The
 * Floor column beside it is the other way to give θ, when only a stop below the real start is known (exactly one of
 * the two; the same class and rules).
 * The view only binds and draws; the view-model holds the
 * state, validates, and is the only caller of the core.
 */
package dev.proofrun.app.part;
