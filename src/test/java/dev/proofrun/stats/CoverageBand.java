package dev.proofrun.stats;

/**
 * The band the simulated coverage of a 95 % lower bound must fall in, shared by the coverage tests: [0.94, 0.975].
 * With 20,000 studies the binomial standard error of a 95 % rate is 0.0015 (the band is −6.7 to +17 of them), with
 * 8,000 it is 0.0024 (−4.1 to +10.4): a correct bound never fails it by chance, and one that covers 93.5 % or less
 * still fails it with 8,000 studies (0.935 is 2.1 of its standard errors below 0.94).
 */
final class CoverageBand {

    /** The confidence of the bounds checked. */
    static final double CONFIDENCE = 0.95;
    /** The least coverage allowed. */
    static final double LOWEST = 0.94;
    /** The most coverage allowed (a bound much more conservative than it says fails too). */
    static final double HIGHEST = 0.975;

    private CoverageBand() {
    }

    /** Whether {@code rate} lies in the band (NaN does not). */
    static boolean holds(double rate) {
        return rate >= LOWEST && rate <= HIGHEST;
    }
}
