package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;

class WithinSigmaTest {

    private static final double EXACT = 1e-12;

    private static List<double[]> groups(double[]... g) {
        return Arrays.asList(g);
    }

    @Test
    void rangeEstimateByHand() {
        // ranges 3 and 3, R-bar = 3; d2(3) from mpmath 1.3.0 (see ChartConstantsTest)
        SigmaEstimate e = WithinSigma.estimate(SigmaMethod.RBAR, groups(new double[] {1, 2, 4}, new double[] {3, 3, 6}));
        assertEquals(3 / 1.69256875064326886, e.value(), EXACT);
        assertEquals(SigmaMethod.RBAR, e.method());
        assertEquals(WithinSigma.degreesOfFreedom(SigmaMethod.RBAR, 3, 2), e.degreesOfFreedom(), 0);
    }

    @Test
    void meanStandardDeviationByHand() {
        // s1 = sqrt(42/9/2), s2 = sqrt(3); c4(3) from mpmath 1.3.0
        SigmaEstimate e = WithinSigma.estimate(SigmaMethod.SBAR, groups(new double[] {1, 2, 4}, new double[] {3, 3, 6}));
        double sBar = (Math.sqrt(42.0 / 9 / 2) + Math.sqrt(3)) / 2;
        assertEquals(sBar / 0.886226925452758014, e.value(), EXACT);
    }

    @Test
    void meanStandardDeviationWithUnequalSizesIsInverseVarianceWeighted() {
        // mpmath 1.3.0, mp.dps = 20: h(n) = c4(n)**2/(1-c4(n)**2);
        // (h(3)*sd([1,2,4])/c4(3) + h(4)*sd([3,3,6,8])/c4(4))/(h(3)+h(4)) and CV^2 = 1/(h(3)+h(4))
        SigmaEstimate e = WithinSigma.estimate(SigmaMethod.SBAR, groups(new double[] {1, 2, 4}, new double[] {3, 3, 6, 8}));
        assertEquals(2.2897093345820061835, e.value(), EXACT);
        assertEquals(WithinSigma.effectiveDegreesOfFreedom(0.10782017168786600013), e.degreesOfFreedom(), 1e-9);
    }

    @Test
    void pooledByHand() {
        // sums of squares 42/9 and 6 over nu = 4; c4(5) from mpmath 1.3.0
        SigmaEstimate e = WithinSigma.estimate(SigmaMethod.POOLED, groups(new double[] {1, 2, 4}, new double[] {3, 3, 6}));
        assertEquals(Math.sqrt((42.0 / 9 + 6) / 4) / 0.939985602986625188, e.value(), EXACT);
        assertEquals(4, e.degreesOfFreedom(), 0);
        // unequal sizes, mpmath 1.3.0: sqrt(ss/5)/c4(6) for [1,2,4] and [3,3,6,8]
        SigmaEstimate u = WithinSigma.estimate(SigmaMethod.POOLED, groups(new double[] {1, 2, 4}, new double[] {3, 3, 6, 8}));
        assertEquals(2.237613302529892669, u.value(), EXACT);
        assertEquals(5, u.degreesOfFreedom(), 0);
    }

    @Test
    void movingRangeByHand() {
        // moving ranges 2, 1, 3: MR-bar = 2, d2(2) = 2/sqrt(pi), so sigma = sqrt(pi)
        SigmaEstimate e = WithinSigma.estimate(SigmaMethod.MOVING_RANGE,
                groups(new double[] {1}, new double[] {3}, new double[] {2}, new double[] {5}));
        assertEquals(Math.sqrt(Math.PI), e.value(), EXACT);
        assertEquals(WithinSigma.degreesOfFreedom(SigmaMethod.MOVING_RANGE, 1, 4), e.degreesOfFreedom(), 0);
    }

    @Test
    void refusalsSayWhy() {
        IllegalArgumentException unequal = assertThrows(IllegalArgumentException.class,
                () -> WithinSigma.estimate(SigmaMethod.RBAR, groups(new double[] {1, 2}, new double[] {1, 2, 3})));
        assertTrue(unequal.getMessage().contains("equal subgroup sizes"), unequal.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> WithinSigma.estimate(SigmaMethod.SBAR, groups(new double[] {1}, new double[] {1, 2, 3})));
        assertThrows(IllegalArgumentException.class,
                () -> WithinSigma.estimate(SigmaMethod.POOLED, groups(new double[] {1}, new double[] {2})));
        assertThrows(IllegalArgumentException.class,
                () -> WithinSigma.estimate(SigmaMethod.MOVING_RANGE, groups(new double[] {1, 2})));
        assertThrows(IllegalArgumentException.class,
                () -> WithinSigma.estimate(SigmaMethod.MOVING_RANGE, groups(new double[] {1})));
        assertThrows(IllegalArgumentException.class,
                () -> WithinSigma.estimate(SigmaMethod.RBAR, groups(new double[] {1, Double.NaN})));
        assertThrows(IllegalArgumentException.class, () -> WithinSigma.degreesOfFreedom(SigmaMethod.RBAR, 51, 10));
        assertThrows(IllegalArgumentException.class, () -> WithinSigma.degreesOfFreedom(SigmaMethod.SBAR, 1, 10));
        assertThrows(IllegalArgumentException.class, () -> WithinSigma.degreesOfFreedom(SigmaMethod.MOVING_RANGE, 1, 1));
        assertThrows(IllegalArgumentException.class, () -> WithinSigma.effectiveDegreesOfFreedom(0));
    }

    @Test
    void degreesOfFreedomThatAreExact() {
        // |X1 - X2| is a scaled chi with 1 df, so one range of two, or two individuals, give nu = 1
        assertEquals(1, WithinSigma.degreesOfFreedom(SigmaMethod.RBAR, 2, 1), 1e-9);
        assertEquals(1, WithinSigma.degreesOfFreedom(SigmaMethod.MOVING_RANGE, 1, 2), 1e-9);
        // one subgroup: S/c4 is a scaled chi with n - 1 df
        for (int n = 2; n <= 30; n++) {
            assertEquals(n - 1, WithinSigma.degreesOfFreedom(SigmaMethod.SBAR, n, 1), 1e-8 * n);
        }
        assertEquals(25 * 4, WithinSigma.degreesOfFreedom(SigmaMethod.POOLED, 5, 25), 0);
        // the solver inverts the chi CV^2 at non-integer nu
        assertEquals(6.25, WithinSigma.effectiveDegreesOfFreedom(ChartConstants.chiCv2(7.25)), 1e-10);
        assertEquals(1e6, WithinSigma.effectiveDegreesOfFreedom(ChartConstants.chiCv2(1e6 + 1)), 1e-3);
    }

    @Test
    void rangeDegreesOfFreedomNearNinetyPercentRule() {
        // common practice: nu ~ 0.9 k (n-1) for R-bar/d2 with small n; within 3 % for n = 3..6, 5 % for n = 2
        for (int n = 2; n <= 6; n++) {
            double nu = WithinSigma.degreesOfFreedom(SigmaMethod.RBAR, n, 25);
            double rule = 0.9 * 25 * (n - 1);
            assertEquals(1, nu / rule, n == 2 ? 0.05 : 0.03, "n = " + n + ", nu = " + nu);
        }
        // S-bar/c4 loses little against pooling: just under k(n-1)
        double sbar = WithinSigma.degreesOfFreedom(SigmaMethod.SBAR, 5, 25);
        assertTrue(sbar < 100 && sbar > 90, "S-bar nu " + sbar);
        // individuals: about 0.6 df per moving range (1/(2 * 0.8265))
        double mr = WithinSigma.degreesOfFreedom(SigmaMethod.MOVING_RANGE, 1, 1001);
        assertEquals(0.605, mr / 1000, 0.005);
    }

    /**
     * Seeded simulation (XO_RO_SHI_RO_128_PP, seed 20261201): 20,000 studies of a N(0,1) process. The
     * sample variance of sigma-hat has a relative standard error near sqrt(2/20000) = 1 %; 5 % is five
     * of those. The mean is checked to four standard errors. For the moving range the covariance of
     * adjacent ranges matters: leaving it out would predict a variance about 30 % smaller.
     */
    @Test
    void simulatedVarianceMatchesTheEffectiveChi() {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(20261201L);
        ZigguratSampler.NormalizedGaussian normal = ZigguratSampler.NormalizedGaussian.of(rng);
        checkVariance(SigmaMethod.RBAR, 5, 10, normal);
        checkVariance(SigmaMethod.SBAR, 4, 8, normal);
        checkVariance(SigmaMethod.MOVING_RANGE, 1, 30, normal);
    }

    private static void checkVariance(SigmaMethod method, int n, int k, ZigguratSampler.NormalizedGaussian normal) {
        int studies = 20_000;
        double[] est = new double[studies];
        for (int r = 0; r < studies; r++) {
            List<double[]> data = new ArrayList<>(k);
            for (int j = 0; j < k; j++) {
                double[] g = new double[n];
                for (int i = 0; i < n; i++) {
                    g[i] = normal.sample();
                }
                data.add(g);
            }
            est[r] = WithinSigma.estimate(method, data).value();
        }
        double mean = Arrays.stream(est).average().orElseThrow();
        double var = Arrays.stream(est).map(x -> (x - mean) * (x - mean)).sum() / (studies - 1);
        double nu = WithinSigma.degreesOfFreedom(method, n, k);
        double predicted = ChartConstants.chiCv2(nu + 1); // CV^2 of the matched chi, sigma = 1 and unbiased
        assertEquals(1, mean, 4 * Math.sqrt(predicted / studies), method + " mean");
        assertEquals(1, var / predicted, 0.05, method + " variance, nu = " + nu);
        if (method == SigmaMethod.RBAR) {
            // Patnaik's chi fits the lower tail too: 5 % quantile of sigma-hat against
            // sqrt(chi2_{0.05,nu}/nu)/c4(nu+1); the quantile's standard error is about 0.4 % here.
            Arrays.sort(est);
            double simulated = est[(int) (0.05 * studies)];
            double chi = Math.sqrt(new ChiSquaredDistribution(nu).inverseCumulativeProbability(0.05) / nu)
                    / ChartConstants.c4Continuous(nu + 1);
            assertEquals(1, simulated / chi, 0.015, "5 % quantile");
        }
    }
}
