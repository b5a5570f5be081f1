package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Anderson–Darling and nonconforming parts against SciPy 1.17.1. */
class NormalityAndPpmTest {

    /** numpy 2.4.6: round(12.0 + default_rng(2).gamma(6, 0.01, 30), 3) — invented, mildly skewed. */
    private static final double[] SKEWED = {12.061, 12.047, 12.111, 12.049, 12.064, 12.083, 12.049, 12.068, 12.071,
        12.06, 12.079, 12.065, 12.036, 12.121, 12.025, 12.079, 12.086, 12.062, 12.053, 12.034, 12.063, 12.04, 12.044,
        12.051, 12.023, 12.085, 12.06, 12.059, 12.134, 12.05};
    /** numpy 2.4.6: round(default_rng(7).normal(25.0, 0.02, 20), 4) — invented. */
    private static final double[] NORMAL = {25.0, 25.006, 24.9945, 24.9822, 24.9909, 24.9802, 25.0012, 25.0268,
        24.9902, 24.9876, 25.0098, 25.0071, 25.0021, 24.9814, 24.9994, 25.0139, 24.9731, 24.9908, 24.962, 24.9742};

    @Test
    void statisticAgreesWithScipy() {
        // SciPy 1.17.1: scipy.stats.anderson(x, dist='norm', method='interpolate').statistic
        AndersonDarling.Result skewed = AndersonDarling.test(SKEWED);
        assertEquals(0.699037687886012, skewed.statistic(), 1e-9);
        assertEquals(0.699037687886012 * (1 + 0.75 / 30 + 2.25 / 900), skewed.adjusted(), 1e-9);
        AndersonDarling.Result normal = AndersonDarling.test(NORMAL);
        assertEquals(0.12757736271589, normal.statistic(), 1e-9);
    }

    @Test
    void pValueAgreesWithMonteCarlo() {
        // SciPy 1.17.1: anderson(x, 'norm', method=MonteCarloMethod(n_resamples=40000,
        // rng=default_rng(11))).pvalue = 0.0612985 (standard error about 0.0012); Table 4.9 gives 0.0610
        assertEquals(0.0612985, AndersonDarling.test(SKEWED).pValue(), 0.005);
        // n_resamples=20000: pvalue 0.99155; Table 4.9 gives 0.9805 — the formula is coarse far out
        assertEquals(0.99155, AndersonDarling.test(NORMAL).pValue(), 0.02);
    }

    @Test
    void pValueFormulasReproduceThePercentagePoints() {
        // D'Agostino & Stephens 1986, Table 4.7 case 3 (from memory): upper 10, 5, 2.5, 1 % points of A*
        assertEquals(0.10, AndersonDarling.pValue(0.631), 0.002);
        assertEquals(0.05, AndersonDarling.pValue(0.752), 0.001);
        assertEquals(0.025, AndersonDarling.pValue(0.873), 0.001);
        assertEquals(0.01, AndersonDarling.pValue(1.035), 0.0005);
        assertEquals(1, AndersonDarling.pValue(0), 1e-5);
        assertThrows(IllegalArgumentException.class, () -> AndersonDarling.test(new double[] {1, 2, 3}));
        assertThrows(IllegalArgumentException.class, () -> AndersonDarling.test(new double[] {1, 1, 1, 1, 1, 1, 1, 1}));
    }

    @Test
    void expectedPpm() {
        // SciPy 1.17.1: 1e6*(norm.cdf(-3) + norm.sf(3)) = 2699.7960632601867
        assertEquals(2699.7960632601867, Nonconforming.expectedPpm(SpecLimits.twoSided(-3, 3), 0, 1), 1e-8);
        // 1e6*norm.sf(6) = 0.0009865876450376946 (far tail keeps its relative accuracy)
        assertEquals(0.0009865876450376946, Nonconforming.expectedPpm(SpecLimits.upperOnly(6), 0, 1), 1e-17);
        // 1e6*norm.cdf((9.9 - 10)/0.05) = 22750.1319481796
        assertEquals(22750.1319481796, Nonconforming.expectedPpm(SpecLimits.lowerOnly(9.9), 10, 0.05), 1e-7);
        // on a limit conforms; strictly outside counts
        List<double[]> g = List.of(new double[] {1, 2, 3}, new double[] {0.5, 3.5});
        assertEquals(2, Nonconforming.observedOutside(SpecLimits.twoSided(1, 3), g));
        assertThrows(IllegalArgumentException.class, () -> Nonconforming.expectedPpm(SpecLimits.upperOnly(1), 0, 0));
    }
}
