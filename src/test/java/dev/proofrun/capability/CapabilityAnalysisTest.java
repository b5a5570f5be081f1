package dev.proofrun.capability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.CapabilityBounds;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.stats.WithinSigma;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Demo data (invented: a shaft diameter, 12.000 +- 0.030 mm, 10 subgroups of 4), generated with
 * numpy 2.4.6 default_rng(42): round(12.004 + normal(0, 0.006, (10, 4)), 4). Expected values computed
 * with numpy 2.4.6 / SciPy 1.17.1 (script in the comments): mean = x.mean(), s = x.std(ddof=1),
 * sigma_w = mean(max - min)/d2(4) with d2(4) = 2.05875074600792826 (mpmath), indices from their
 * definitions, ppm = 1e6*(norm.cdf((LSL-mean)/sigma) + norm.sf((USL-mean)/sigma)).
 */
public class CapabilityAnalysisTest {

    public static final double[][] SHAFT = {
        {12.0058, 11.9978, 12.0085, 12.0096}, {11.9923, 11.9962, 12.0048, 12.0021},
        {12.0039, 11.9989, 12.0093, 12.0087}, {12.0044, 12.0108, 12.0068, 11.9988},
        {12.0062, 11.9982, 12.0093, 12.0037}, {12.0029, 11.9999, 12.0113, 12.0031},
        {12.0014, 12.0019, 12.0072, 12.0062}, {12.0065, 12.0066, 12.0168, 12.0016},
        {12.0009, 11.9991, 12.0077, 12.0108}, {12.0033, 11.999, 11.9991, 12.0079},
    };
    private static final double TIGHT = 1e-10;

    static List<double[]> shaft() {
        List<double[]> list = new ArrayList<>();
        for (double[] g : SHAFT) {
            list.add(g.clone());
        }
        return list;
    }

    @Test
    void twoSidedIndicesAgreeWithNumpy() {
        CapabilityResult r = CapabilityAnalysis.of(shaft(), SpecLimits.twoSided(11.97, 12.03), null, null, 0.95,
                BoundMethod.BISSELL);
        assertEquals(40, r.readings());
        assertEquals(10, r.subgroups());
        assertEquals(4, r.subgroupSize().getAsInt());
        assertEquals(SigmaMethod.RBAR, r.within().method()); // default for n = 4
        // numpy 2.4.6 / SciPy 1.17.1, see the class comment
        assertEquals(12.004232500000001, r.mean(), 1e-12);
        assertEquals(0.0049523052130372551, r.sigmaOverall(), 1e-14);
        assertEquals(0.0053819045464753466, r.within().value(), 1e-14);
        Indices i = r.indices();
        assertEquals(1.8580782906209048, i.cp().getAsDouble(), TIGHT);
        assertEquals(1.5959344117857672, i.cpu().getAsDouble(), TIGHT);
        assertEquals(2.1202221694560421, i.cpl().getAsDouble(), TIGHT);
        assertEquals(1.5959344117857672, i.cpk().getAsDouble(), TIGHT);
        assertEquals(2.0192616508518411, i.pp().getAsDouble(), TIGHT);
        assertEquals(1.7343774862774524, i.ppu().getAsDouble(), TIGHT);
        assertEquals(2.3041458154262302, i.ppl().getAsDouble(), TIGHT);
        assertEquals(1.7343774862774524, i.ppk().getAsDouble(), TIGHT);
        // Cpm with T = midpoint 12.0: (USL-LSL)/(6*sqrt(s^2 + (mean-T)^2))
        assertEquals(1.5350250547529718, i.cpm().getAsDouble(), TIGHT);
        assertEquals(0.8431846703534186, r.ppm().within(), 1e-8);
        assertEquals(0.097980928712054494, r.ppm().overall(), 1e-9);
        assertEquals(0, r.ppm().observedOutside());
        // SciPy 1.17.1: pp*sqrt(chi2.ppf(0.05, 39)/39)
        assertEquals(1.6390337790770881, r.lower().pp().getAsDouble(), 1e-9);
        // Bissell: ppk - norm.ppf(0.95)*sqrt(1/(9N) + ppk^2/(2*39))
        assertEquals(1.3999309022805928, r.lower().ppk().getAsDouble(), 1e-9);
        // within bounds use the effective degrees of freedom of R-bar/d2
        double nu = WithinSigma.degreesOfFreedom(SigmaMethod.RBAR, 4, 10);
        assertEquals(nu, r.within().degreesOfFreedom(), 0);
        assertEquals(CapabilityBounds.lowerCp(i.cp().getAsDouble(), nu, 0.95), r.lower().cp().getAsDouble(), 0);
        assertEquals(39, r.overallDegreesOfFreedom(), 0);
        assertTrue(r.normality().isPresent());
    }

    @Test
    void oneSidedSpecificationHasOnlyTheIndicesThatExist() {
        CapabilityResult r = CapabilityAnalysis.of(shaft(), SpecLimits.upperOnly(12.03), null, null, 0.95,
                BoundMethod.BISSELL);
        Indices i = r.indices();
        assertFalse(i.cp().isPresent());
        assertFalse(i.cpl().isPresent());
        assertFalse(i.pp().isPresent());
        assertFalse(i.ppl().isPresent());
        assertFalse(i.cpm().isPresent(), "no nominal, one-sided: no Cpm");
        assertFalse(r.lower().cp().isPresent());
        assertEquals(i.cpu().getAsDouble(), i.cpk().getAsDouble(), 0);
        assertEquals(1.7343774862774524, i.ppk().getAsDouble(), TIGHT);
        // exact even though Bissell was asked for; SciPy 1.17.1:
        // brentq(lambda d: nct.sf(3*sqrt(40)*ppu, 39, d) - 0.05, 0, t)/(3*sqrt(40))
        assertEquals(1.395889270151466, r.lower().ppk().getAsDouble(), 1e-7);
        // with a nominal the one-sided analogue exists: (USL - T)/(3 tau)
        CapabilityResult withTarget = CapabilityAnalysis.of(shaft(), SpecLimits.upperOnly(12.03), 12.0, null, 0.95,
                BoundMethod.EXACT);
        double s = r.sigmaOverall();
        double tau = Math.sqrt(s * s + Math.pow(r.mean() - 12.0, 2));
        assertEquals(0.03 / (3 * tau), withTarget.indices().cpm().getAsDouble(), 1e-9);
    }

    @Test
    void refusals() {
        SpecLimits spec = SpecLimits.twoSided(11.97, 12.03);
        List<double[]> flat = List.of(new double[] {12, 12}, new double[] {12, 12});
        assertThrows(UserException.class, () -> CapabilityAnalysis.of(flat, spec, null, null, 0.95, BoundMethod.EXACT));
        List<double[]> noWithin = List.of(new double[] {12, 12}, new double[] {12.01, 12.01});
        UserException e = assertThrows(UserException.class,
                () -> CapabilityAnalysis.of(noWithin, spec, null, null, 0.95, BoundMethod.EXACT));
        assertEquals(CapabilityMessage.NO_WITHIN_SPREAD, e.key());
        assertThrows(UserException.class, () -> CapabilityAnalysis.of(shaft(), spec, 13.0, null, 0.95, BoundMethod.EXACT));
        assertThrows(UserException.class, () -> CapabilityAnalysis.of(shaft(), spec, null, null, 0.3, BoundMethod.EXACT));
        assertThrows(UserException.class,
                () -> CapabilityAnalysis.of(shaft(), spec, null, SigmaMethod.MOVING_RANGE, 0.95, BoundMethod.EXACT));
        assertThrows(UserException.class,
                () -> CapabilityAnalysis.of(List.of(new double[] {1}), spec, null, null, 0.95, BoundMethod.EXACT));
    }

    @Test
    void jsonHasExactlyTheAgreedKeys() {
        CapabilityResult r = CapabilityAnalysis.of(shaft(), SpecLimits.lowerOnly(11.97), null, null, 0.95,
                BoundMethod.EXACT);
        var m = CapabilityJson.of(r);
        assertEquals(List.of("readings", "subgroups", "subgroupSize", "mean", "sigmaWithin", "sigmaOverall",
                "sigmaMethod", "cp", "cpu", "cpl", "cpk", "pp", "ppu", "ppl", "ppk", "cpm", "confidence", "bound",
                "lower", "degreesOfFreedom", "ppm", "normality"), new ArrayList<>(m.keySet()));
        assertEquals(List.of("cp", "cpk", "pp", "ppk"), new ArrayList<>(((java.util.Map<?, ?>) m.get("lower")).keySet()));
        assertEquals(List.of("within", "overall"),
                new ArrayList<>(((java.util.Map<?, ?>) m.get("degreesOfFreedom")).keySet()));
        assertEquals(List.of("within", "overall", "observed"), new ArrayList<>(((java.util.Map<?, ?>) m.get("ppm")).keySet()));
        assertEquals(List.of("andersonDarling", "pValue"),
                new ArrayList<>(((java.util.Map<?, ?>) m.get("normality")).keySet()));
        assertEquals(null, m.get("cp"));
        assertEquals(null, m.get("cpu"));
        assertEquals(null, m.get("cpm"));
        assertEquals("rbar", m.get("sigmaMethod"));
        assertEquals(m.get("cpl"), m.get("cpk"));
    }

    @Test
    void withoutNormalityGivesTheSameFiguresAndNoTest() {
        SpecLimits limits = SpecLimits.twoSided(11.97, 12.03);
        CapabilityResult full = CapabilityAnalysis.of(shaft(), limits, 12.0, null, 0.95, BoundMethod.EXACT);
        CapabilityResult lean = CapabilityAnalysis.withoutNormality(shaft(), limits, 12.0, null, 0.95, BoundMethod.EXACT);
        assertTrue(full.normality().isPresent());
        assertFalse(lean.normality().isPresent());
        assertEquals(full.indices(), lean.indices());
        assertEquals(full.lower(), lean.lower());
        assertEquals(full.ppm(), lean.ppm());
        assertEquals(full.within(), lean.within());
        assertEquals(full.sigmaOverall(), lean.sigmaOverall(), 0.0);
    }
}
