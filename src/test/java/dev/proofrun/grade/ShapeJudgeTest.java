package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.ShapeFitter;
import dev.proofrun.stats.SpecLimits;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.apache.commons.statistics.distribution.TDistribution;
import org.junit.jupiter.api.Test;

/** The shape step with a declared model: the check's level, the large-study rule, readings the model cannot give. */
class ShapeJudgeTest {

    private static List<double[]> subgroups(double[] x, int n) {
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i + n <= x.length; i += n) {
            double[] g = new double[n];
            System.arraycopy(x, i, g, 0, n);
            out.add(g);
        }
        return out;
    }

    /** {@code count} invented lognormal readings exp(σ·Z) with median 1, Z from a stream seeded with {@code seed}. */
    private static double[] lognormal(long seed, int count, double sigma) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        double[] x = new double[count];
        for (int i = 0; i < x.length; i++) {
            x[i] = Math.exp(sigma * g.sample());
        }
        return x;
    }

    private static List<String> slots(int k) {
        List<String> s = new ArrayList<>();
        for (int i = 1; i <= k; i++) {
            s.add("S" + i);
        }
        return s;
    }

    @Test
    void theWeibullCheckRejectsAboutOnePercentOfTrueWeibullSamples() {
        // the 1 % point 1.038 of A2(1 + 0.2/sqrt N) is from D'Agostino & Stephens Table 4.17 (from memory); A2
        // against a fitted Weibull is parameter-free, so 4,000 samples of Weibull(1.5, 1), N = 125, check it:
        // the rejected fraction must be 0.01 within 3 SE (SE = sqrt(0.01 * 0.99 / 4000) = 0.0016)
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(77L);
        ZigguratSampler.Exponential e = ZigguratSampler.Exponential.of(rng);
        int samples = 4000;
        int rejected = 0;
        double[] x = new double[125];
        for (int s = 0; s < samples; s++) {
            for (int i = 0; i < x.length; i++) {
                x[i] = Math.pow(e.sample(), 1 / 1.5);
            }
            ShapeFitter.Outcome o = ShapeFitter.fit(ShapeFamily.WEIBULL, x);
            rejected += ShapeJudge.test(ShapeFamily.WEIBULL, o.fit(), x)[2] > 0 ? 1 : 0;
        }
        assertEquals(0.01, rejected / (double) samples, 3 * Math.sqrt(0.01 * 0.99 / samples));
    }

    @Test
    void aLargeStudyWithATrivialDepartureIsNotVoided() {
        // readings like Student's t with 20 df, N = 10,000, Ppk 1.33 under the normal fit: the A2 test rejects,
        // the tails differ by about 6 % of the distance to the limit (t20 99.865 % point 3.422 against
        // 3·sqrt(20/18) = 3.162 for the fitted normal; SciPy 1.17.1 scipy.stats.t.ppf(norm.cdf(3), 20)), so the
        // normal model is kept and the index is taken on the readings' wider tail
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(20L);
        TDistribution.Sampler t = TDistribution.of(20).createSampler(rng);
        double[] x = new double[10_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = t.sample();
        }
        double sd = Math.sqrt(20 / 18.0);
        SpecLimits limits = SpecLimits.twoSided(-4 * sd, 4 * sd);
        List<Reason> reasons = new ArrayList<>();
        Shape sh = ShapeJudge.judge(subgroups(x, 5), slots(2000), 0, ShapeFamily.NORMAL, limits, reasons);
        assertTrue(sh.modelFits(), reasons.toString());
        assertTrue(sh.tailFactor() < 0.98 && sh.tailFactor() > 0.85, Double.toString(sh.tailFactor()));
        assertTrue(reasons.get(0).text().contains("departure is small where the index looks"), reasons.toString());
    }

    @Test
    void aLargeStudyWithAMaterialDepartureIsStillRejected() {
        // lognormal readings (sigma of ln x = 0.5) declared normal, N = 5,000: the tails are far from the normal's
        double[] x = lognormal(21L, 5_000, 0.5);
        List<Reason> reasons = new ArrayList<>();
        Shape sh = ShapeJudge.judge(subgroups(x, 5), slots(1000), 0, ShapeFamily.NORMAL, SpecLimits.upperOnly(6), reasons);
        assertFalse(sh.modelFits());
        assertTrue(reasons.get(0).decisive());
        assertTrue(reasons.get(0).text().contains("the planned shape does not fit these readings"), reasons.toString());
        assertTrue(reasons.get(0).text().contains("plan new --shape"), reasons.toString());
    }

    @Test
    void aReadingAtOrBelowZeroUnderALognormalShapeIsNamed() {
        List<double[]> sg = List.of(new double[] {0.3, 0.2, 0.25}, new double[] {0.31, 0.0, 0.4}, new double[] {0.22, 0.3, 0.28});
        List<Reason> reasons = new ArrayList<>();
        Shape sh = ShapeJudge.judge(sg, List.of("S1", "S2", "S3"), 0, ShapeFamily.LOGNORMAL, SpecLimits.upperOnly(0.8), reasons);
        assertFalse(sh.modelFits());
        assertNull(sh.fit());
        assertEquals("Shape: a reading at or below zero cannot come from the planned shape (lognormal): 0.0 in subgroup S2,"
                + " reading 2.", reasons.get(0).text());
    }

    @Test
    void constantAndHugeReadingsAreFindingsNotCrashes() {
        List<Reason> reasons = new ArrayList<>();
        double[] same = new double[25];
        java.util.Arrays.fill(same, 4.2);
        for (ShapeFamily f : ShapeFamily.values()) {
            reasons.clear();
            Shape sh = ShapeJudge.judge(subgroups(same, 5), slots(5), 0.1, f, SpecLimits.upperOnly(5), reasons);
            assertFalse(sh.modelFits());
            assertTrue(reasons.get(0).text().contains("no spread"), reasons.toString());
        }
        double[] huge = new double[25];
        for (int i = 0; i < huge.length; i++) {
            huge[i] = 1e300 * (1 + 0.01 * Math.sin(i));
        }
        for (ShapeFamily f : ShapeFamily.values()) {
            reasons.clear();
            ShapeJudge.judge(subgroups(huge, 5), slots(5), 0, f, SpecLimits.upperOnly(1.5e300), reasons);
            assertEquals(1, reasons.size(), reasons.toString());
        }
    }

    @Test
    void aLowerLimitAtZeroIsDroppedUnderASkewedShape() {
        double[] x = lognormal(5L, 125, 0.25);
        PlannedCharacteristic gc = new PlannedCharacteristic("R1", "runout", "mm", SpecLimits.twoSided(0, 4), null, 0,
                Requirement.of(IndexKind.PPK, 1.33, 0.95), ShapeFamily.LOGNORMAL);
        List<Reason> reasons = new ArrayList<>();
        Shape sh = ShapeJudge.judge(subgroups(x, 5), slots(25), 0, ShapeFamily.LOGNORMAL, gc.limits(), reasons);
        IndexEvidence ev = PercentileJudge.judge(gc, sh, x.length, reasons);
        assertTrue(reasons.stream().anyMatch(r -> r.text().contains("the lower limit 0.0 lies at or below")), reasons.toString());
        assertEquals(IndexMethod.PERCENTILE, ev.method());
        // only the upper side is left: Ppk is Ppu = (4 - X50)/(X99.865 - X50) of the fit
        assertEquals((4 - sh.fit().quantile(0.5)) / (sh.fit().quantile(dev.proofrun.stats.PercentileIndex.HIGH) - sh.fit().quantile(0.5)),
                ev.estimate(), 1e-12);
        assertTrue(ev.lower() < ev.estimate());
        assertEquals(dev.proofrun.stats.PivotalBound.DEFAULT_SEED, ev.seed());
    }
}
