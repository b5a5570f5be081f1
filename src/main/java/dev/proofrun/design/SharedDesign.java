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
 * @param driver       the index (in request order) of the characteristic that drives k
 * @param limitedBy    what limited the driver's k
 */
public record SharedDesign(int subgroupSize, int subgroups, int readings, List<Double> powers, int driver,
        LimitedBy limitedBy) {

    public SharedDesign {
        powers = List.copyOf(powers);
    }
}
