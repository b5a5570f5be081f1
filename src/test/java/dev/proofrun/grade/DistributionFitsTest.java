package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Box–Cox λ, lognormal and Weibull fits against SciPy 1.17.1 / NumPy 2.4.6. The data were drawn once with
 * numpy.random.default_rng(20261201) (lognormal(-1.2, 0.35, 30) and 3.1*weibull(2.3, 40), rounded to
 * 3 decimals) and are pasted here; the calls are quoted beside each value.
 */
class DistributionFitsTest {

    static final double[] X = {0.265, 0.338, 0.312, 0.142, 0.130, 0.398, 0.362, 0.156, 0.229, 0.300, 0.214, 0.803,
        0.324, 0.378, 0.308, 0.246, 0.286, 0.262, 0.354, 0.248, 0.351, 0.373, 0.392, 0.229, 0.338, 0.380, 0.211,
        0.231, 0.238, 0.365};
    static final double[] W = {3.095, 2.859, 3.933, 3.439, 0.615, 1.861, 1.659, 1.476, 2.226, 3.575, 2.240, 3.790,
        4.250, 0.694, 1.935, 0.913, 2.489, 3.037, 2.586, 1.576, 2.595, 5.273, 3.771, 1.085, 0.670, 3.445, 2.980,
        1.184, 1.584, 0.661, 2.306, 4.221, 5.436, 2.084, 5.425, 4.419, 1.908, 3.274, 3.255, 4.366};

    @Test
    void boxCoxLambdaByMaximumLikelihood() {
        // SciPy 1.17.1: scipy.stats.boxcox_normmax(X, method='mle') = -0.05081356302641933
        // (SciPy's own optimizer stops at about 1e-8 in lambda; the profile is flat there)
        double lambda = DistributionFits.boxCoxLambda(X);
        assertEquals(-0.05081356302641933, lambda, 1e-6);
        // SciPy 1.17.1: scipy.stats.boxcox_llf(lam, X) = 68.94140389126349 (the same profile, no constant)
        double[] logs = new double[X.length];
        for (int i = 0; i < X.length; i++) {
            logs[i] = Math.log(X[i]);
        }
        assertEquals(68.94140389126349, DistributionFits.boxCoxProfile(logs, -0.05081356302641933), 1e-9);
    }

    @Test
    void lognormalMaximumLikelihood() {
        // SciPy 1.17.1: scipy.stats.lognorm.fit(X, floc=0) -> s = 0.3503807659655411, scale = 0.2868049243716759
        double[] f = DistributionFits.lognormal(X);
        assertEquals(Math.log(0.2868049243716759), f[0], 1e-12);
        assertEquals(0.3503807659655411, f[1], 1e-9);
        // SciPy 1.17.1: scipy.stats.lognorm.logpdf(X, s, 0, scale).sum() = 26.36247840666302
        assertEquals(26.36247840666302, f[2], 1e-8);
    }

    @Test
    void weibullMaximumLikelihood() {
        // SciPy 1.17.1: k = scipy.optimize.brentq(score, 0.1, 50, xtol=1e-14) on the score equation
        // sum(W**k*log W)/sum(W**k) - 1/k - mean(log W) = 0 -> 2.146189560010945; c = mean(W**k)**(1/k) = 3.0572585059782917
        double[] f = DistributionFits.weibull(W);
        assertEquals(2.146189560010945, f[0], 1e-9);
        assertEquals(3.0572585059782917, f[1], 1e-9);
        // scipy.stats.weibull_min.fit(W, floc=0) gives c = 2.1462034459466377, scale = 3.057289194855682: its
        // general optimizer stops 1.4e-5 short of the maximum (log-likelihood -66.8293771431464, lower than ours)
        assertEquals(2.1462034459466377, f[0], 5e-5);
        // SciPy 1.17.1: scipy.stats.weibull_min.logpdf(W, k, 0, c).sum() = -66.8293771346967 at the brentq root
        assertEquals(-66.8293771346967, f[2], 1e-8);
    }

    @Test
    void andersonDarlingAgainstAFittedWeibull() {
        double[] f = DistributionFits.weibull(W);
        double a2 = AndersonDarlingFit.statistic(W, x -> 1 - Math.exp(-Math.pow(x / f[1], f[0])));
        // NumPy 2.4.6: -n - sum((2i-1)(ln F + ln(1-F[::-1])))/n with F = scipy.stats.weibull_min.cdf(sorted W, c, 0, scale)
        assertEquals(0.251131285070997, a2, 1e-5);
        assertTrue(AndersonDarlingFit.weibullFits(a2, W.length));
    }

    @Test
    void normalPValueAtTheFivePercentCriticalValue() {
        // D'Agostino & Stephens 1986 Table 4.7 (from memory): the 5 % point of the adjusted A*2 is 0.752;
        // SciPy 1.17.1 scipy.stats.anderson uses the same 0.752 (its critical_values = 0.752/(1+4/n-25/n^2))
        int n = 30;
        double a2 = 0.752 / (1 + 0.75 / n + 2.25 / (n * (double) n));
        assertEquals(0.05, AndersonDarlingFit.normalPValue(a2, n), 0.002);
        assertTrue(AndersonDarlingFit.normalPValue(0.2, n) > 0.5);
        assertTrue(AndersonDarlingFit.normalPValue(1.5, n) < 0.001);
    }

    @Test
    void alternativesNeedPositiveReadings() {
        assertFalse(DistributionFits.allPositive(new double[] {1, 0, 2}));
        assertThrows(IllegalArgumentException.class, () -> DistributionFits.boxCoxLambda(new double[] {1, -1, 2}));
    }
}
