package dev.proofrun.design;

import dev.proofrun.stats.Cancellation;
import dev.proofrun.stats.SigmaEstimate;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.WithinSigma;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Simulated studies of a standard normal process (mean 0, σ = 1), read at each planned look: the mean of all
 * readings so far, the grader's within estimate ({@link WithinSigma#estimate}, the plan's estimator: R̄/d2, S̄/c4,
 * pooled, or the moving range for individuals) and the overall s. Each look's statistics are those of a prefix of
 * the same readings, so the looks carry their real dependence. Any normal process is a location and scale of
 * these: with true σ, mean μ and limits, x̄ = μ + σ·mean and σ̂ = σ·within, so one simulation serves every true
 * index and centring. Path p draws from its own generator seeded from (seed, p): the same path gives the same
 * readings whatever the number of subgroups, which keeps a search over the study size smooth.
 */
final class StagedPaths {

    private final int subgroupSize;
    private final int[] looks;
    private final double[][] mean;
    private final double[][] within;
    private final double[][] overall;
    private final double[] withinNu;

    private StagedPaths(int subgroupSize, int[] looks, int paths) {
        this.subgroupSize = subgroupSize;
        this.looks = looks.clone();
        this.mean = new double[looks.length][paths];
        this.within = new double[looks.length][paths];
        this.overall = new double[looks.length][paths];
        this.withinNu = new double[looks.length];
    }

    /**
     * @param subgroupSize n
     * @param looks        the subgroups at each look, increasing
     * @param method       the within estimator the grader will use
     * @param paths        how many simulated studies
     * @param seed         the seed
     */
    static StagedPaths simulate(int subgroupSize, int[] looks, SigmaMethod method, int paths, long seed) {
        StagedPaths s = new StagedPaths(subgroupSize, looks, paths);
        for (int j = 0; j < looks.length; j++) {
            s.withinNu[j] = WithinSigma.degreesOfFreedom(method, subgroupSize, looks[j]);
        }
        Cancellation cancel = Cancellation.ofCallingThread();
        IntStream.range(0, paths).parallel().forEach(p -> {
            cancel.check();
            s.fill(p, method, seed);
        });
        return s;
    }

    private void fill(int path, SigmaMethod method, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed + 0x9E3779B97F4A7C15L * (path + 1));
        ZigguratSampler.NormalizedGaussian gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        int last = looks[looks.length - 1];
        List<double[]> subgroups = new ArrayList<>(last);
        double sum = 0;
        double sumSquares = 0;
        int look = 0;
        for (int g = 0; g < last; g++) {
            double[] x = new double[subgroupSize];
            for (int i = 0; i < subgroupSize; i++) {
                x[i] = gauss.sample();
                sum += x[i];
                sumSquares += x[i] * x[i];
            }
            subgroups.add(x);
            if (g + 1 == looks[look]) {
                int readings = (g + 1) * subgroupSize;
                double m = sum / readings;
                mean[look][path] = m;
                overall[look][path] = Math.sqrt(Math.max(0, (sumSquares - readings * m * m) / (readings - 1)));
                SigmaEstimate w = WithinSigma.estimate(method, subgroups);
                within[look][path] = w.value();
                look++;
            }
        }
    }

    int subgroupSize() {
        return subgroupSize;
    }

    int looks() {
        return looks.length;
    }

    int paths() {
        return mean[0].length;
    }

    /** Subgroups at look j (0-based). */
    int subgroupsAt(int j) {
        return looks[j];
    }

    /** Readings at look j. */
    int readingsAt(int j) {
        return looks[j] * subgroupSize;
    }

    /** ν of the index's sigma at look j: the estimator's (effective) ν for within indices, N − 1 for overall. */
    double nuAt(int j, boolean usesWithin) {
        return usesWithin ? withinNu[j] : readingsAt(j) - 1.0;
    }

    double meanAt(int j, int path) {
        return mean[j][path];
    }

    /** σ̂/σ at look j: the within estimate or the overall s. */
    double sigmaAt(int j, int path, boolean usesWithin) {
        return usesWithin ? within[j][path] : overall[j][path];
    }
}
