package dev.proofrun.design;

import java.util.List;

/**
 * Several characteristics measured on the same parts: one common subgroup size n, and k the largest
 * number of subgroups any characteristic needs (after the floors).
 *
 * @param subgroupSize n
 * @param subgroups    k = the largest any characteristic needs
 * @param readings     N = n·k per characteristic
 * @param powers       the power of each characteristic at (n, k), in request order
 * @param ownSubgroups the k each characteristic would need on its own at this n, in request order
 * @param driver       the index (in request order) of the characteristic that drives k (the first of equals)
 * @param limitedBy    what limited the driver's k
 * @param falseAlarm   the chance that the grader calls one characteristic's stable process unstable (the same for
 *                     every characteristic: it depends on n and k only)
 * @param detection    the chance that the grader calls it unstable when its mean moves by δ·σ_w for the second
 *                     half of the study
 * @param anySignalFalseAlarm the chance that some rule fires at least once on one characteristic's stable chart
 * @param anySignalDetection  the chance that some rule fires at least once when the mean moves as above
 */
public record SharedDesign(int subgroupSize, int subgroups, int readings, List<Double> powers,
        List<Integer> ownSubgroups, int driver, LimitedBy limitedBy, double falseAlarm, double detection,
        ChartRisk anySignalFalseAlarm, ChartRisk anySignalDetection) {

    public SharedDesign {
        powers = List.copyOf(powers);
        ownSubgroups = List.copyOf(ownSubgroups);
    }

    /**
     * The chance that every characteristic is demonstrated in the same study — what the part's verdict (the
     * worst of its characteristics) needs — if the characteristics' estimates are independent: the product
     * of their powers. Each power alone can reach the wanted value while this is far lower (ten
     * characteristics at 0.9 give 0.35). Characteristics measured on the same parts can be correlated, which
     * moves the true value away from the product (for positively associated passes it is at least the
     * product); it is a planning figure, not a bound.
     */
    public double allDemonstratedIfIndependent() {
        double p = 1;
        for (double power : powers) {
            p *= power;
        }
        return p;
    }
}
