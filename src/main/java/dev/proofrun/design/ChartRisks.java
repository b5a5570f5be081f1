package dev.proofrun.design;

import org.apache.commons.numbers.gamma.Erfc;

/**
 * The stability side of a design in closed form, for the rule "a point beyond the 3σ limits" alone, on a
 * mean chart (individuals chart for n = 1) whose limits are the true ±3σ/√n (the limits' own estimation
 * error is left out; common practice for planning).
 *
 * <ul>
 * <li>Per point, stable: p₀ = 2Φ(−3) ≈ 0.0027 (Montgomery, <i>Introduction to Statistical Quality
 * Control</i>, ch. 6 — the 0.0027 is from memory; 2Φ(−3) is computed).</li>
 * <li>Per point, mean shifted by δ·σ_w: p₁ = Φ(−3 + δ√n) + Φ(−3 − δ√n) (same source).</li>
 * <li>False alarm in a study of k subgroups: 1 − (1 − p₀)^k.</li>
 * <li>Detection when the mean sits δ·σ_w off centre for the second half of the study (the last
 * k − ⌊k/2⌋ subgroups): 1 − (1 − p₀)^⌊k/2⌋·(1 − p₁)^(k−⌊k/2⌋); a signal in the first half counts too.</li>
 * </ul>
 */
public final class ChartRisks {

    private ChartRisks() {
    }

    /** Φ(x). */
    static double phi(double x) {
        return 0.5 * Erfc.value(-x / Math.sqrt(2));
    }

    /** 2Φ(−3), the chance one point of a stable process falls beyond the 3σ limits. */
    public static double pointFalseAlarm() {
        return 2 * phi(-3);
    }

    /** Φ(−3 + δ√n) + Φ(−3 − δ√n). */
    public static double pointDetection(int subgroupSize, double shift) {
        double d = shift * Math.sqrt(subgroupSize);
        return phi(-3 + d) + phi(-3 - d);
    }

    /** 1 − (1 − 2Φ(−3))^k. */
    public static double falseAlarm(int subgroups) {
        return -Math.expm1(subgroups * Math.log1p(-pointFalseAlarm()));
    }

    /** 1 − (1 − p₀)^⌊k/2⌋·(1 − p₁)^(k−⌊k/2⌋). */
    public static double detection(int subgroups, int subgroupSize, double shift) {
        int stable = subgroups / 2;
        int shifted = subgroups - stable;
        double logQuiet = stable * Math.log1p(-pointFalseAlarm())
                + shifted * Math.log1p(-pointDetection(subgroupSize, shift));
        return -Math.expm1(logQuiet);
    }
}
