package dev.proofrun.capability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SigmaMethod;
import dev.proofrun.stats.SpecLimits;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Scale;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.PermutationSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;

/**
 * Properties of the indices that follow from their definitions: invariance to a change of units, and
 * the within/overall split under a re-dealing of the same readings into subgroups. Data are drawn
 * from N(10, 1) with a jqwik-chosen seed.
 */
class CapabilityPropertiesTest {

    /** Relative agreement expected from rounding alone. */
    private static final double RELATIVE = 1e-9;

    private static List<double[]> data(long seed, int n, int k) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        ZigguratSampler.NormalizedGaussian normal = ZigguratSampler.NormalizedGaussian.of(rng);
        List<double[]> groups = new ArrayList<>();
        for (int j = 0; j < k; j++) {
            double[] g = new double[n];
            for (int i = 0; i < n; i++) {
                g[i] = 10 + normal.sample();
            }
            groups.add(g);
        }
        return groups;
    }

    private static void close(OptionalDouble expected, OptionalDouble actual, String what) {
        assertEquals(expected.isPresent(), actual.isPresent(), what);
        if (expected.isPresent()) {
            double e = expected.getAsDouble();
            assertEquals(e, actual.getAsDouble(), RELATIVE * Math.max(1, Math.abs(e)), what);
        }
    }

    @Property(tries = 60)
    void indicesDoNotDependOnTheUnits(@ForAll long seed, @ForAll @IntRange(min = 1, max = 6) int n,
            @ForAll @DoubleRange(min = 1e-3, max = 1e3) @Scale(6) double a,
            @ForAll @DoubleRange(min = -1e3, max = 1e3) @Scale(6) double b,
            @ForAll @IntRange(min = 0, max = 2) int sides) {
        List<double[]> x = data(seed, n, n == 1 ? 40 : 12);
        SpecLimits spec = sides == 0 ? SpecLimits.twoSided(6, 14.5) : sides == 1 ? SpecLimits.upperOnly(14.5)
                : SpecLimits.lowerOnly(6);
        List<double[]> y = new ArrayList<>();
        for (double[] g : x) {
            y.add(Arrays.stream(g).map(v -> a * v + b).toArray());
        }
        CapabilityResult before = CapabilityAnalysis.of(x, spec, 10.2, null, 0.95, BoundMethod.EXACT);
        CapabilityResult after = CapabilityAnalysis.of(y, spec.transformed(a, b), a * 10.2 + b, null, 0.95,
                BoundMethod.EXACT);
        for (IndexKind k : IndexKind.values()) {
            close(before.index(k), after.index(k), k.symbol());
            close(before.lowerBound(k), after.lowerBound(k), "lower " + k.symbol());
        }
        close(before.indices().cpm(), after.indices().cpm(), "Cpm");
        assertEquals(before.ppm().within(), after.ppm().within(), 1e-6 * Math.max(1, before.ppm().within()));
        assertEquals(before.normality().get().statistic(), after.normality().get().statistic(), 1e-8);
    }

    @Property(tries = 40)
    void redealingKeepsOverallIndicesAndMovesWithinOnes(@ForAll long seed, @ForAll @IntRange(min = 2, max = 8) int n,
            @ForAll SigmaMethod method) {
        if (method == SigmaMethod.MOVING_RANGE) {
            method = SigmaMethod.POOLED;
        }
        int k = 25;
        List<double[]> original = data(seed, n, k);
        double[] all = original.stream().flatMapToDouble(Arrays::stream).toArray();
        int[] order = PermutationSampler.natural(all.length);
        PermutationSampler.shuffle(RandomSource.XO_RO_SHI_RO_128_PP.create(seed + 1), order);
        List<double[]> shuffled = deal(all, order, n);
        double[] sorted = all.clone();
        Arrays.sort(sorted);
        List<double[]> sortedDeal = deal(sorted, PermutationSampler.natural(all.length), n);
        SpecLimits spec = SpecLimits.twoSided(5, 15.5);
        CapabilityResult a = CapabilityAnalysis.of(original, spec, null, method, 0.95, BoundMethod.BISSELL);
        CapabilityResult b = CapabilityAnalysis.of(shuffled, spec, null, method, 0.95, BoundMethod.BISSELL);
        CapabilityResult c = CapabilityAnalysis.of(sortedDeal, spec, null, method, 0.95, BoundMethod.BISSELL);
        for (CapabilityResult other : List.of(b, c)) {
            close(a.indices().pp(), other.indices().pp(), "Pp");
            close(a.indices().ppk(), other.indices().ppk(), "Ppk");
            close(a.lower().ppk(), other.lower().ppk(), "lower Ppk");
        }
        assertNotEquals(a.indices().cpk().getAsDouble(), b.indices().cpk().getAsDouble(), 1e-9, "Cpk moves");
        // sorted subgroups hold only neighbouring readings: tiny ranges, so Cpk far above Ppk
        assertTrue(c.indices().cpk().getAsDouble() > 2 * c.indices().ppk().getAsDouble(),
                () -> "sorted: Cpk " + c.indices().cpk() + " Ppk " + c.indices().ppk());
    }

    private static List<double[]> deal(double[] values, int[] order, int n) {
        List<double[]> groups = new ArrayList<>();
        for (int start = 0; start < order.length; start += n) {
            double[] g = new double[n];
            for (int i = 0; i < n; i++) {
                g[i] = values[order[start + i]];
            }
            groups.add(g);
        }
        return groups;
    }
}
