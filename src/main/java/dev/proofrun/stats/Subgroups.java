package dev.proofrun.stats;

import java.util.List;

/** Readings held as subgroups, as the statistics that ignore the subgrouping take them. */
public final class Subgroups {

    private Subgroups() {
    }

    /** All readings in one array, subgroup after subgroup, each in its own order. */
    public static double[] flatten(List<double[]> subgroups) {
        int total = 0;
        for (double[] g : subgroups) {
            total += g.length;
        }
        double[] x = new double[total];
        int i = 0;
        for (double[] g : subgroups) {
            System.arraycopy(g, 0, x, i, g.length);
            i += g.length;
        }
        return x;
    }
}
