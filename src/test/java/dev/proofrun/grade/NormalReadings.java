package dev.proofrun.grade;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * Invented normal readings for the simulated studies: each reading is mean + sd·Z with Z drawn from the given stream,
 * subgroup by subgroup and reading by reading, so that a study drawn here is the one its seed always drew.
 */
final class NormalReadings {

    private NormalReadings() {
    }

    /** One subgroup of {@code n} readings. */
    static double[] subgroup(ZigguratSampler.NormalizedGaussian g, int n, double mean, double sd) {
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = mean + sd * g.sample();
        }
        return x;
    }

    /** {@code k} subgroups of {@code n} readings, drawn in order. */
    static List<double[]> subgroups(ZigguratSampler.NormalizedGaussian g, int k, int n, double mean, double sd) {
        List<double[]> all = new ArrayList<>(k);
        for (int i = 0; i < k; i++) {
            all.add(subgroup(g, n, mean, sd));
        }
        return all;
    }
}
