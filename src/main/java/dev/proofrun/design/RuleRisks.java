package dev.proofrun.design;

import dev.proofrun.control.RunRule;

/**
 * The stability side with all eight run rules ({@link RunRule}, as {@code control.RunRules} applies them),
 * from seeded simulations of standardized chart points (centre 0, limits ±3, true limits as in
 * {@link ChartRisks}) made once and stored in {@link RuleRiskTable} (so a cold {@code proofrun size} does
 * not simulate; the table's header gives seeds and draw counts).
 *
 * <ul>
 * <li>False alarm: P(signal within k stable points) = F₀(k), the share of stable sequences whose first
 * signal comes at or before point k (100,000 draws; standard error ≤ 0.0016).</li>
 * <li>Detection (mean δ·σ_w off centre for the last k − ⌊k/2⌋ subgroups, shift s = δ√n in chart units):
 * 1 − (1 − F₀(⌊k/2⌋))·(1 − G_{s,R}(k − ⌊k/2⌋)), where G_{s,R}(m) is the chance of a signal within m
 * shifted points that follow a run of R = min(15, ⌊k/2⌋) stable points without a signal (50,000 draws
 * per cell; standard error ≤ 0.0023, plus the interpolation in s, see {@link RuleRiskTable}). No rule
 * looks back more than 15 points, so conditioning on the last 15 stable points stands in for conditioning
 * on the whole quiet first half; {@code RuleRisksTest} checks the decomposition against a direct
 * simulation of whole studies.</li>
 * </ul>
 */
final class RuleRisks {

    private static final int RUN_IN = RuleRiskTable.RUN_IN;

    private RuleRisks() {
    }

    /** P(at least one signal in k stable points), all eight rules. */
    static double falseAlarm(int subgroups) {
        return RuleRiskTable.get().stableShare(subgroups);
    }

    /**
     * P(at least one signal when the last k − ⌊k/2⌋ of k points are shifted by δ√n), all eight rules.
     *
     * @throws IllegalArgumentException if k &lt; 2 (a design has at least two subgroups)
     */
    static double detection(int subgroups, int subgroupSize, double shift) {
        if (subgroups < 2) {
            throw new IllegalArgumentException("at least two subgroups: " + subgroups);
        }
        int quiet = subgroups / 2;
        int shifted = subgroups - quiet;
        double s = shift * Math.sqrt(subgroupSize);
        int runIn = Math.min(RUN_IN, quiet);
        double g = RuleRiskTable.get().shiftedShare(s, runIn, shifted);
        return 1 - (1 - falseAlarm(quiet)) * (1 - g);
    }
}
