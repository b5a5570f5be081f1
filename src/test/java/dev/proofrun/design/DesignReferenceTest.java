package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Sample sizes and powers against an independent computation with SciPy: the script is
 * {@code src/test/resources/design/reference_sizes.py} (SciPy 1.17.1, NumPy 2.4.6, Python 3.11), which
 * uses scipy.stats.chi2 / scipy.stats.nct directly and plain adaptive quadrature (scipy.integrate.quad,
 * scipy.optimize.brentq) for the exact two-sided bound, none of proofrun's code.
 *
 * <p>Kane (1986, JQT 18:41–52) tabulates sample sizes for the same chi-square test on Cp. His printed
 * table was not available to check against and no value of it is recalled reliably enough, so
 * {@link #kaneFormulaGrid} checks his published formula instead, evaluated by SciPy on a grid like his
 * (α = β, ratios Cp(high)/Cp(low)): the values below are SciPy's, not copied from his table (the overall
 * index Pp keeps ν = N − 1 exact, as in Kane's test with the sample standard deviation).
 *
 * <p>These references count the bound alone (no gates): the sizes are {@link SizeSearch#boundOnlySubgroups} and
 * the powers {@link SizeSearch#boundPower}; the design's own power adds the grader's gates on top
 * ({@link ProcedurePower}, checked against the grader in {@code ProcedurePowerSimulationTest}).
 */
class DesignReferenceTest {

    /** Power is a smooth function; 2e-4 covers the fixed-node quadrature and the ĉ*(k̂) interpolation. */
    private static final double POWER_TOLERANCE = 2e-4;

    private static DesignRequest request(SpecLimits.Sides sides, IndexKind kind, double c0, double c1, double conf,
            double power) {
        return DesignRequest.of(sides, Requirement.of(kind, c0, conf), Expectation.centred(c1)).withPower(power)
                .withFloors(PracticeFloors.none()).withSubgroupSizes(List.of(1));
    }

    /** Pp two-sided against the chi-square test, Ppu (Ppk, upper limit only) against the noncentral t. */
    @ParameterizedTest(name = "{0} {1} {2} -> {3}, conf {4}, power {5}: N = {6} (the {7})")
    @CsvSource({
        // reference_sizes.py, pp_size(c0, c1, conf, power)
        "TWO_SIDED,  PP,  1.0,  1.33, 0.95, 0.90, 56,  chi-square test",
        "TWO_SIDED,  PP,  1.33, 1.67, 0.95, 0.90, 86,  chi-square test",
        "TWO_SIDED,  PP,  1.33, 1.67, 0.95, 0.95, 107, chi-square test",
        "TWO_SIDED,  PP,  1.33, 2.0,  0.99, 0.90, 45,  chi-square test",
        "TWO_SIDED,  PP,  1.67, 2.0,  0.95, 0.80, 101, chi-square test",
        // reference_sizes.py, ppu_size(c0, c1, conf, power)  (scipy.stats.nct.ppf / nct.sf)
        "UPPER_ONLY, PPK, 1.0,  1.33, 0.95, 0.90, 65,  noncentral t",
        "UPPER_ONLY, PPK, 1.33, 1.67, 0.95, 0.90, 95,  noncentral t",
        "UPPER_ONLY, PPK, 1.33, 1.67, 0.99, 0.90, 146, noncentral t"})
    void sampleSizeMatchesTheReference(SpecLimits.Sides sides, IndexKind kind, double c0, double c1, double conf,
            double power, int n, String reference) {
        SizeSearch search = new SizeSearch(request(sides, kind, c0, c1, conf, power), 1);
        assertEquals(n, search.boundOnlySubgroups(), reference);
    }

    @ParameterizedTest(name = "Ppk {0} -> {1} (Cp {2}), N = {3}: power {4}")
    @CsvSource({
        // reference_sizes.py, ppk_power(c0, c1, cp1, 0.95, N)
        "1.33, 1.67, 1.67, 100, 0.909756",
        "1.33, 1.67, 2.0, 100, 0.916124",
        "1.0, 1.33, 1.33, 60, 0.874592"})
    void exactTwoSidedPowerMatchesPlainQuadrature(double c0, double c1, double cp1, int n, double expected) {
        DesignRequest r = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.PPK, c0, 0.95),
                Expectation.offCentre(c1, cp1)).withFloors(PracticeFloors.none()).withSubgroupSizes(List.of(1));
        assertEquals(expected, new SizeSearch(r, 1).boundPower(n), POWER_TOLERANCE);
    }

    /**
     * Kane's test on Cp (reject Cp ≤ Cp(low) when Ĉp &gt; C, C = Cp(low)·sqrt(ν/χ²_{α,ν}), ν = n − 1; power
     * χ²-cdf(χ²_{α,ν}·r², ν) at Cp(high) = r·Cp(low)) is the design's Pp test with n = 1 and no floors: the
     * smallest n with power ≥ 1 − β, and the critical estimate ĉ* = C. Cp(low) = 1.
     */
    @ParameterizedTest(name = "alpha = beta = {0}, ratio {1}: n = {2}, C = {3}")
    @CsvSource({
        // reference_sizes.py, kane_row(r, alpha, alpha) (SciPy 1.17.1 scipy.stats.chi2.ppf / chi2.cdf)
        "0.05, 1.10, 598, 1.050169", "0.05, 1.15, 279, 1.075397", "0.05, 1.20, 165, 1.100598",
        "0.05, 1.25, 111, 1.125790", "0.05, 1.30, 81, 1.150952", "0.05, 1.35, 62, 1.176933",
        "0.05, 1.40, 50, 1.201722", "0.05, 1.45, 42, 1.224919", "0.05, 1.50, 35, 1.252758",
        "0.10, 1.10, 364, 1.050520", "0.10, 1.15, 170, 1.076225", "0.10, 1.20, 101, 1.101912",
        "0.10, 1.25, 68, 1.127981", "0.10, 1.30, 50, 1.153630", "0.10, 1.35, 39, 1.178879",
        "0.10, 1.40, 31, 1.206799", "0.10, 1.45, 26, 1.231908", "0.10, 1.50, 22, 1.259425"})
    void kaneFormulaGrid(double alpha, double ratio, int n, double critical) {
        SizeSearch search = new SizeSearch(request(SpecLimits.Sides.TWO_SIDED, IndexKind.PP, 1.0, ratio,
                1 - alpha, 1 - alpha), 1);
        int k = search.boundOnlySubgroups();
        assertEquals(n, k);
        // the script prints six decimals
        assertEquals(critical, search.model(k).criticalEstimate(0), 5e-7);
    }
}
