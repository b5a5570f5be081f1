package dev.proofrun.design;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.CapabilityBounds;
import dev.proofrun.stats.SampleMoments;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.WithinSigma;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Really runs studies: draws k subgroups of n normal readings (σ = 1, tolerance centred on 0), estimates
 * σ_w with the chosen estimator, computes Ĉp and Ĉpk (or the one-sided index, or Ppk from the overall s),
 * applies the real lower bound ({@link CapabilityBounds}) and counts the studies whose bound reaches c₀.
 *
 * <p>The estimator is the real one, {@link WithinSigma#estimate} (the grade uses it), with its effective
 * degrees of freedom; Ppk uses the ordinary overall s with ν = N − 1.
 */
final class StudySimulator {

    enum Index { CPK, CP, CPU, PPK }

    private StudySimulator() {
    }

    /** Share of {@code draws} simulated studies that demonstrate c₀. */
    static double demonstrated(Index index, double c0, double confidence, double c1, double cp1, int n, int k,
            BoundMethod method, int draws, long seed) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        int readings = n * k;
        SigmaMethod sigma = SigmaMethod.defaultFor(n);
        double nu = index == Index.PPK ? readings - 1.0 : WithinSigma.degreesOfFreedom(sigma, n, k);
        // σ = 1, midpoint 0; half tolerance 3·Cp1; mean 3·(Cp1 − c1) above the midpoint.
        double half = 3 * cp1;
        double mu = index == Index.CPU ? 0 : 3 * (cp1 - c1);
        double usl = index == Index.CPU ? 3 * c1 : half;
        double lsl = -half;
        double[] x = new double[readings];
        int pass = 0;
        for (int d = 0; d < draws; d++) {
            for (int i = 0; i < readings; i++) {
                x[i] = mu + gauss.sample();
            }
            double sd = index == Index.PPK ? SampleMoments.standardDeviationOf(x) : within(x, n, k, sigma);
            double mean = SampleMoments.meanOf(x);
            double bound;
            switch (index) {
                case CP:
                    bound = CapabilityBounds.lowerCp((usl - lsl) / (6 * sd), nu, confidence);
                    break;
                case CPU:
                    bound = CapabilityBounds.lowerOneSided((usl - mean) / (3 * sd), readings, nu, confidence);
                    break;
                default: {
                    double cpHat = (usl - lsl) / (6 * sd);
                    double cpkHat = Math.min(usl - mean, mean - lsl) / (3 * sd);
                    if (cpkHat <= c0) {
                        continue; // the bound is below the estimate, so it cannot reach c0
                    }
                    bound = CapabilityBounds.lowerCpk(cpkHat, cpHat, readings, nu, confidence, method);
                }
            }
            if (bound >= c0) {
                pass++;
            }
        }
        return pass / (double) draws;
    }

    private static double within(double[] x, int n, int k, SigmaMethod sigma) {
        List<double[]> groups = new ArrayList<>(k);
        for (int g = 0; g < k; g++) {
            groups.add(java.util.Arrays.copyOfRange(x, g * n, (g + 1) * n));
        }
        return WithinSigma.estimate(sigma, groups).value();
    }
}
