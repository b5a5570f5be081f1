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
 * @param falseAlarm   the chance that one characteristic's mean chart signals on a stable process during the
 *                     study (the same for every characteristic: it depends on n and k only)
 * @param detection    the chance that one characteristic's mean chart signals when its mean sits δ·σ_w off
 *                     centre for the second half of the study
 */
public record SharedDesign(int subgroupSize, int subgroups, int readings, List<Double> powers,
        List<Integer> ownSubgroups, int driver, LimitedBy limitedBy, ChartRisk falseAlarm, ChartRisk detection) {

    public SharedDesign {
        powers = List.copyOf(powers);
        ownSubgroups = List.copyOf(ownSubgroups);
    }
}
