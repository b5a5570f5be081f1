package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * The folded normal's distribution, quantiles and maximum-likelihood fit against SciPy 1.17.1
 * ({@code scipy.stats.foldnorm}: shape c = μ/σ, scale σ). The readings are invented (runout-like, in mm)
 * and pasted here; each call is quoted beside its value.
 */
class FoldedNormalTest {

    /** Near the half-normal end (μ/σ ≈ 1.44). */
    static final double[] X = {0.12, 0.31, 0.05, 0.44, 0.27, 0.19, 0.62, 0.08, 0.35, 0.22, 0.51, 0.14, 0.29, 0.40,
        0.03, 0.25, 0.17, 0.58, 0.33, 0.21};
    /** Further from zero (μ/σ ≈ 2.1). */
    static final double[] Y = {1.9, 2.3, 1.2, 2.8, 0.7, 1.6, 2.1, 3.0, 1.4, 0.4, 2.6, 1.1, 1.8, 2.2, 0.9, 1.5, 2.4, 1.3,
        3.3, 0.6};

    @Test
    void distributionFunctionsMatchScipy() {
        // SciPy 1.17.1: scipy.stats.foldnorm.cdf(0.7, 1.0, 0, 1.0) = 0.3375231150525043
        assertEquals(0.3375231150525043, FoldedNormal.cdf(1.0, 1.0, 0.7), 1e-14);
        // scipy.stats.foldnorm.sf(4.2, 1.0, 0, 1.0) = 0.0006872375821790164
        assertEquals(0.0006872375821790164, FoldedNormal.survival(1.0, 1.0, 4.2), 1e-17);
        // scipy.stats.foldnorm.logpdf(0.3, 1.0, 0, 1.0) = -0.726450582718787
        assertEquals(-0.726450582718787, FoldedNormal.logDensity(1.0, 1.0, 0.3), 1e-13);
        // scipy.stats.foldnorm.sf(4.0, 2.1, 0, 0.83) * 1e6 = 3271.238611377889 (μ = 2.1 * 0.83)
        assertEquals(3271.238611377889, 1e6 * FoldedNormal.survival(2.1 * 0.83, 0.83, 4.0), 1e-8);
        assertEquals(0, FoldedNormal.cdf(1, 1, 0));
        assertEquals(Double.NEGATIVE_INFINITY, FoldedNormal.logDensity(1, 1, -0.1));
    }

    @Test
    void quantilesMatchScipy() {
        double low = PercentileIndex.LOW;
        // SciPy 1.17.1: scipy.stats.foldnorm.ppf(p, 1.0, 0, 1.0) for p = norm.cdf(-3), 0.5, norm.cdf(3):
        // 0.0027893829600957186, 1.050544292896192, 4.000064664496372
        assertEquals(0.0027893829600957186, FoldedNormal.quantile(1, 1, low), 1e-13);
        assertEquals(1.050544292896192, FoldedNormal.quantile(1, 1, 0.5), 1e-13);
        assertEquals(4.000064664496372, FoldedNormal.quantile(1, 1, 1 - low), 1e-12);
        // scipy.stats.foldnorm.ppf(p, 0.4, 0, 2.5) (μ = 1.0, σ = 2.5): 0.004581890162613599, 1.8247370172371882,
        // 8.539213703012575
        assertEquals(0.004581890162613599, FoldedNormal.quantile(1, 2.5, low), 1e-13);
        assertEquals(1.8247370172371882, FoldedNormal.quantile(1, 2.5, 0.5), 1e-12);
        assertEquals(8.539213703012575, FoldedNormal.quantile(1, 2.5, 1 - low), 1e-11);
    }

    @Test
    void maximumLikelihoodNearHalfNormal() {
        // SciPy 1.17.1: scipy.stats.foldnorm.fit(X, floc=0) -> c = 1.4416824833482087, scale = 0.18392785112864507
        // (log-likelihood 9.108363005482165); polished with scipy.optimize.minimize(neg. log-likelihood, that start,
        // method='Nelder-Mead', xatol=1e-13, fatol=1e-15) -> c = 1.4417058778475296, scale = 0.18392386743986866,
        // μ = c * scale = 0.2651641207645085, log-likelihood 9.108363012432847
        double[] f = FoldedNormal.fit(X);
        assertEquals(0.2651641207645085, f[0], 1e-7);
        assertEquals(0.18392386743986866, f[1], 1e-7);
        assertEquals(1.4416824833482087, f[0] / f[1], 1e-4); // foldnorm.fit's own optimiser stops within 3e-5
        double logL = Arrays.stream(X).map(v -> FoldedNormal.logDensity(f[0], f[1], v)).sum();
        assertEquals(9.108363012432847, logL, 1e-9);
        assertTrue(logL >= 9.108363005482165, "at least as high as foldnorm.fit's own maximum");
        // scipy.stats.foldnorm.ppf(p, c, 0, scale) at the polished fit, p = norm.cdf(-3), 0.5, norm.cdf(3):
        // 0.0008797133581713888, 0.26605707061826844, 0.8169358064780136
        assertEquals(0.0008797133581713888, FoldedNormal.quantile(f[0], f[1], PercentileIndex.LOW), 1e-8);
        assertEquals(0.26605707061826844, FoldedNormal.quantile(f[0], f[1], 0.5), 1e-7);
        assertEquals(0.8169358064780136, FoldedNormal.quantile(f[0], f[1], PercentileIndex.HIGH), 1e-6);
    }

    @Test
    void maximumLikelihoodAwayFromZero() {
        // SciPy 1.17.1: scipy.stats.foldnorm.fit(Y, floc=0) -> c = 2.1012069902150423, scale = 0.8297848906026422
        // (log-likelihood -23.8480731610047); polished as above -> c = 2.101167455625106, scale = 0.8297966248342921,
        // μ = 1.74354166288937, log-likelihood -23.848073156995984
        double[] f = FoldedNormal.fit(Y);
        assertEquals(1.74354166288937, f[0], 1e-6);
        assertEquals(0.8297966248342921, f[1], 1e-6);
        assertEquals(-23.848073156995984, Arrays.stream(Y).map(v -> FoldedNormal.logDensity(f[0], f[1], v)).sum(), 1e-9);
        // ppf at the polished fit: 0.012763167355662818, 1.7435691330541954, 4.23293153744765
        assertEquals(0.012763167355662818, FoldedNormal.quantile(f[0], f[1], PercentileIndex.LOW), 1e-7);
        assertEquals(1.7435691330541954, FoldedNormal.quantile(f[0], f[1], 0.5), 1e-6);
        assertEquals(4.23293153744765, FoldedNormal.quantile(f[0], f[1], PercentileIndex.HIGH), 1e-5);
        // the score equation σ² + μ² = mean of x² holds at the maximum (Leone, Nelson & Nottingham 1961)
        double m2 = Arrays.stream(Y).map(v -> v * v).average().orElseThrow();
        assertEquals(m2, f[0] * f[0] + f[1] * f[1], 1e-12 * m2);
    }

    /** Heavier-tailed than any folded normal with μ &gt; 0 (m₄/m₂² = 3.89 ≥ 3): the maximum is the half-normal. */
    static final double[] H = {0.41, 1.87, 0.09, 0.66, 2.95, 0.23, 1.12, 0.05, 0.78, 3.40, 0.31, 0.14, 1.56, 0.92, 0.02,
        0.48, 2.21, 0.60, 0.17, 1.03};

    @Test
    void maximumLikelihoodAtTheHalfNormal() {
        // SciPy 1.17.1: scipy.stats.foldnorm.fit(H, floc=0) -> c = 0.00014954678369035677, scale = 1.346287492837737
        // (its optimiser's stop; the likelihood is flat there); scipy.stats.halfnorm.fit(H, floc=0) -> scale
        // 1.3462874878717397 = sqrt(mean of H^2); foldnorm log-likelihood at c = 0: -20.462842957795477,
        // at c = 0.1: -20.462991984107646 (lower), so the maximum is c = 0
        double[] f = FoldedNormal.fit(H);
        assertEquals(0, f[0], 0);
        assertEquals(1.3462874878717397, f[1], 1e-12);
        assertEquals(-20.462842957795477, Arrays.stream(H).map(v -> FoldedNormal.logDensity(f[0], f[1], v)).sum(), 1e-10);
    }

    @Test
    void zerosAllowedAndDegenerateReadingsAreNoFit() {
        double[] withZero = X.clone();
        withZero[3] = 0;
        assertNotNull(FoldedNormal.fit(withZero));
        assertNull(FoldedNormal.fit(new double[] {0, 0, 0}));
        // readings far from zero with little spread: mean/sigma beyond the search, not a fit
        assertNull(FoldedNormal.fit(new double[] {100.01, 99.99, 100.02, 99.98, 100.0, 100.01}));
    }
}
