package dev.proofrun.stats;

import org.apache.commons.rng.sampling.distribution.ZigguratSampler;

/**
 * One simulated study of n normal readings μ + Z (σ = 1): its mean and its s with ν = n − 1, from the running sum
 * and sum of squares (a negative rounding remainder counts as zero spread).
 *
 * @param mean the mean of the readings
 * @param sd   their standard deviation s
 */
record NormalStudy(double mean, double sd) {

    /** Draws the n readings in order from {@code normal}. */
    static NormalStudy draw(ZigguratSampler.NormalizedGaussian normal, int n, double mu) {
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < n; i++) {
            double x = mu + normal.sample();
            sum += x;
            sumSq += x * x;
        }
        double mean = sum / n;
        return new NormalStudy(mean, Math.sqrt(Math.max(0, sumSq - n * mean * mean) / (n - 1)));
    }
}
