package dev.proofrun.grade;

import dev.proofrun.control.ChartPair;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The stability evidence for one characteristic. See {@link StabilityJudge} for how signals and the
 * between-subgroup variation become the finding.
 *
 * @param charts                 the control charts with limits from the data
 * @param signals                every run-rule signal, placed on subgroups
 * @param locationSignalPoints   points of the location chart at which some rule fired
 * @param expectedLocationByChance expected number of such points on a stable process with this many
 *                               subgroups and these rules
 * @param locationChance         probability that a stable process signals at this many points or more
 * @param spreadSignalPoints     points beyond the limits on the spread chart
 * @param expectedSpreadByChance expected number of those on a stable process
 * @param spreadChance           probability of at least that many by chance
 * @param stabilityRatio         σ_overall/σ_within
 * @param anovaF                 one-way ANOVA F between subgroups (empty for n = 1)
 * @param anovaP                 its p-value (empty for n = 1)
 * @param stable                 the finding
 * @param chanceFloor            the smallest chance the simulation can give, 1/(S + 1) for S simulated stable
 *                               studies; a chance equal to it means none of them reached the count, so the true
 *                               chance is below it. 0 when the chance comes from a normal approximation
 */
public record Stability(ChartPair charts, List<SlotSignal> signals, int locationSignalPoints,
        double expectedLocationByChance, double locationChance, int spreadSignalPoints, double expectedSpreadByChance,
        double spreadChance, double stabilityRatio, OptionalDouble anovaF, OptionalDouble anovaP, boolean stable,
        double chanceFloor) {

    public Stability {
        signals = List.copyOf(signals);
    }

    /** Whether {@link #locationChance} is the simulation's floor (the true chance is below it). */
    public boolean locationAtFloor() {
        return chanceFloor > 0 && locationChance <= chanceFloor;
    }

    /** Whether {@link #spreadChance} is the simulation's floor (the true chance is below it). */
    public boolean spreadAtFloor() {
        return chanceFloor > 0 && spreadChance <= chanceFloor;
    }

    /**
     * The chance as people read it: "0.708", or at the floor "below 0.0005" (the floor rounded up to two
     * significant digits, so the statement stays true, and written without trailing zeros).
     *
     * @param p       the chance
     * @param atFloor whether it is the simulation's floor
     * @param digits  the format of an ordinary value, e.g. "%.3f"
     */
    public static String chanceText(double p, boolean atFloor, String digits) {
        return atFloor ? below(p) : String.format(Locale.ROOT, digits, p);
    }

    /** "below 0.0005" for a floor of 1/2001: the floor rounded up to two significant digits, no trailing zeros. */
    public static String below(double floor) {
        return "below " + new BigDecimal(upTwoDigits(floor)).stripTrailingZeros().toPlainString();
    }

    /**
     * A p-value after "p": "= 0.81", "= 0.0023", or "below 0.0001" for anything smaller (a figure such as
     * 2.5e-18 says no more than that, and few readers take it in).
     */
    public static String pText(double p) {
        return p < P_FLOOR ? "below 0.0001" : "= " + String.format(Locale.ROOT, "%.2g", p);
    }

    /** Below this a p-value is said as "below 0.0001". */
    static final double P_FLOOR = 1e-4;

    /** v rounded up to two significant digits, in plain notation: 1/2001 → "0.00050", 1/401 → "0.0025". */
    static String upTwoDigits(double v) {
        return BigDecimal.valueOf(v).round(new MathContext(2, RoundingMode.CEILING)).toPlainString();
    }
}
