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
 * <p>Kane (1986, JQT 18:41–52) tabulates sample sizes for the same chi-square test on Cp; no value of his
 * table is recalled reliably enough to be a check here, so the SciPy computation of the same test stands
 * in for it (the overall index Pp keeps ν = N − 1 exact, as in Kane's test).
 */
class DesignReferenceTest {

    /** Power is a smooth function; 2e-4 covers the fixed-node quadrature and the ĉ*(k̂) interpolation. */
    private static final double POWER_TOLERANCE = 2e-4;

    private static DesignRequest request(SpecLimits.Sides sides, IndexKind kind, double c0, double c1, double conf,
            double power) {
        return DesignRequest.of(sides, Requirement.of(kind, c0, conf), Expectation.centred(c1)).withPower(power)
                .withFloors(Floors.none()).withSubgroupSizes(List.of(1));
    }

    @ParameterizedTest(name = "Pp {0} -> {1}, conf {2}, power {3}: N = {4}")
    @CsvSource({
        // reference_sizes.py, pp_size(c0, c1, conf, power)
        "1.0, 1.33, 0.95, 0.90, 56",
        "1.33, 1.67, 0.95, 0.90, 86",
        "1.33, 1.67, 0.95, 0.95, 107",
        "1.33, 2.0, 0.99, 0.90, 45",
        "1.67, 2.0, 0.95, 0.80, 101"})
    void ppSampleSizeMatchesTheChiSquareTest(double c0, double c1, double conf, double power, int n) {
        DesignRow row = StudyDesigner.design(request(SpecLimits.Sides.TWO_SIDED, IndexKind.PP, c0, c1, conf, power))
                .rows().get(0);
        assertEquals(n, row.readings());
        assertEquals(LimitedBy.POWER, row.limitedBy());
    }

    @ParameterizedTest(name = "Ppu {0} -> {1}, conf {2}, power {3}: N = {4}")
    @CsvSource({
        // reference_sizes.py, ppu_size(c0, c1, conf, power)  (scipy.stats.nct.ppf / nct.sf)
        "1.0, 1.33, 0.95, 0.90, 65",
        "1.33, 1.67, 0.95, 0.90, 95",
        "1.33, 1.67, 0.99, 0.90, 146"})
    void oneSidedSampleSizeMatchesTheNoncentralT(double c0, double c1, double conf, double power, int n) {
        DesignRow row = StudyDesigner.design(request(SpecLimits.Sides.UPPER_ONLY, IndexKind.PPK, c0, c1, conf, power))
                .rows().get(0);
        assertEquals(n, row.readings());
    }

    @ParameterizedTest(name = "Ppk {0} -> {1} (Cp {2}), N = {3}: power {4}")
    @CsvSource({
        // reference_sizes.py, ppk_power(c0, c1, cp1, 0.95, N)
        "1.33, 1.67, 1.67, 100, 0.909756",
        "1.33, 1.67, 2.0, 100, 0.916124",
        "1.0, 1.33, 1.33, 60, 0.874592"})
    void exactTwoSidedPowerMatchesPlainQuadrature(double c0, double c1, double cp1, int n, double expected) {
        DesignRequest r = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.PPK, c0, 0.95),
                Expectation.offCentre(c1, cp1)).withFloors(Floors.none()).withSubgroupSizes(List.of(1));
        assertEquals(expected, new SizeSearch(r, 1).power(n), POWER_TOLERANCE);
    }
}
