package dev.proofrun.control;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.Subgroups;
import dev.proofrun.text.Tokens;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;

/**
 * Each rule on a hand-built sequence: it fires exactly at the point that completes its pattern (the
 * counts of Nelson 1984, JQT 16:237–239), not one point earlier, and the sequence one point short does not
 * fire at all. Background points are chosen so that no other pattern of the same rule can form.
 */
class RunRulesTest {

    private static List<RuleFiring> only(RunRule rule, double... z) {
        return RunRules.scan(z, EnumSet.of(rule));
    }

    private static int first(RunRule rule, double... z) {
        return RunRules.firstSignal(z, EnumSet.of(rule));
    }

    private static double[] repeat(double v, int n) {
        double[] a = new double[n];
        Arrays.fill(a, v);
        return a;
    }

    private static double[] concat(double[]... parts) {
        return Subgroups.flatten(Arrays.asList(parts));
    }

    @Test
    void beyondLimitsFiresOnlyStrictlyOutside() {
        assertEquals(List.of(new RuleFiring(RunRule.BEYOND_LIMITS, 2), new RuleFiring(RunRule.BEYOND_LIMITS, 4)),
                only(RunRule.BEYOND_LIMITS, 0, 3.0, 3.01, -3.0, -3.5));
    }

    @Test
    void runOneSideFiresAtTheNinthPoint() {
        // alternate sides first, then nine above: fires at index 2 + 8 = 10, and again at 11
        double[] z = concat(new double[] {-0.5, 0.5, -0.5}, repeat(0.3, 9), new double[] {0.3});
        assertEquals(11, first(RunRule.RUN_ONE_SIDE, z));
        assertEquals(List.of(new RuleFiring(RunRule.RUN_ONE_SIDE, 11), new RuleFiring(RunRule.RUN_ONE_SIDE, 12)),
                only(RunRule.RUN_ONE_SIDE, z));
        assertTrue(only(RunRule.RUN_ONE_SIDE, concat(new double[] {-0.5}, repeat(-0.3, 0), repeat(0.3, 8))).isEmpty());
        // a point on the centre line breaks the run
        assertTrue(only(RunRule.RUN_ONE_SIDE, concat(repeat(-0.2, 5), new double[] {0.0}, repeat(-0.2, 8))).isEmpty());
    }

    @Test
    void runOneSideBelow() {
        assertEquals(8, first(RunRule.RUN_ONE_SIDE, repeat(-0.1, 9)));
    }

    @Test
    void trendFiresAtTheSixthRisingPoint() {
        double[] rising = {0.5, 0.0, -1.0, -0.6, -0.2, 0.2, 0.6, 1.0, 0.9};
        // the rise starts at index 2 (-1.0); six points 2..7 rising: fires at 7 only
        assertEquals(List.of(new RuleFiring(RunRule.TREND, 7)), only(RunRule.TREND, rising));
        assertTrue(only(RunRule.TREND, -1.0, -0.6, -0.2, 0.2, 0.6).isEmpty());
        // equal neighbours are not a rise
        assertTrue(only(RunRule.TREND, -1.0, -0.6, -0.6, -0.2, 0.2, 0.6).isEmpty());
        assertEquals(5, first(RunRule.TREND, 2.0, 1.5, 1.0, 0.5, 0.0, -0.5));
    }

    @Test
    void alternatingFiresAtTheFourteenthPoint() {
        double[] z = new double[16];
        z[0] = 0.4;
        z[1] = 0.4; // equal: no direction
        for (int i = 2; i < z.length; i++) {
            z[i] = (i % 2 == 0) ? 0.5 : -0.5;
        }
        // alternation from index 1 (0.4) .. ; differences at 2..15 alternate: 14 points are 1..14 -> fires at 14
        assertEquals(List.of(new RuleFiring(RunRule.ALTERNATING, 14), new RuleFiring(RunRule.ALTERNATING, 15)),
                only(RunRule.ALTERNATING, z));
        assertTrue(only(RunRule.ALTERNATING, Arrays.copyOf(z, 14)).isEmpty());
    }

    @Test
    void twoOfThreeOuterFiresAtTheSecondOuterPointOnOneSide() {
        assertEquals(List.of(new RuleFiring(RunRule.TWO_OF_THREE_OUTER, 3)),
                only(RunRule.TWO_OF_THREE_OUTER, 0, 2.5, 0.5, 2.1, 0.5, 0.5, 2.2));
        // opposite sides do not count together
        assertTrue(only(RunRule.TWO_OF_THREE_OUTER, 2.5, -2.5, 0, 2.5, 0, -2.5).isEmpty());
        // exactly 2 is not beyond 2σ
        assertTrue(only(RunRule.TWO_OF_THREE_OUTER, 2.0, 2.5, 2.0).isEmpty());
        assertEquals(1, first(RunRule.TWO_OF_THREE_OUTER, -2.2, -2.9));
    }

    @Test
    void fourOfFiveMiddleFiresAtTheFourthMiddlePoint() {
        double[] z = {1.5, 0.2, 1.2, 1.1, -1.5, 1.3, 0.0};
        // window 1..5 = {0.2, 1.2, 1.1, -1.5, 1.3}: three high; window 0..4 at index 4 is not high.
        // window ending at 3: {1.5,0.2,1.2,1.1} = three; ending at 5: {0.2,1.2,1.1,-1.5,1.3} = three -> none
        assertTrue(only(RunRule.FOUR_OF_FIVE_MIDDLE, z).isEmpty());
        double[] w = {1.5, 0.2, 1.2, 1.1, 1.3, 0.0};
        assertEquals(List.of(new RuleFiring(RunRule.FOUR_OF_FIVE_MIDDLE, 4)), only(RunRule.FOUR_OF_FIVE_MIDDLE, w));
        assertEquals(3, first(RunRule.FOUR_OF_FIVE_MIDDLE, -1.1, -1.2, -1.9, -1.01));
    }

    @Test
    void huggingCentreFiresAtTheFifteenthPointInside() {
        double[] z = concat(new double[] {1.5}, repeat(0.5, 15), new double[] {-1.0});
        assertEquals(List.of(new RuleFiring(RunRule.HUGGING_CENTRE, 15)), only(RunRule.HUGGING_CENTRE, z));
        assertTrue(only(RunRule.HUGGING_CENTRE, concat(repeat(0.5, 14), new double[] {1.0}, repeat(0.5, 14))).isEmpty());
    }

    @Test
    void avoidingCentreFiresAtTheEighthPointOutside() {
        double[] z = {0, 1.5, -1.5, 1.5, -1.5, 1.5, -1.5, 1.5, -1.5, 0.5};
        assertEquals(List.of(new RuleFiring(RunRule.AVOIDING_CENTRE, 8)), only(RunRule.AVOIDING_CENTRE, z));
        assertTrue(only(RunRule.AVOIDING_CENTRE, 1.5, -1.5, 1.5, -1.5, 1.0, 1.5, -1.5, 1.5, -1.5).isEmpty());
    }

    @Test
    void rulesNotChosenStaySilentAndIdsRoundTrip() {
        double[] z = {4.0};
        assertTrue(only(RunRule.TREND, z).isEmpty());
        assertEquals(1, RunRules.scan(z, EnumSet.allOf(RunRule.class)).size());
        for (RunRule r : RunRule.values()) {
            assertEquals(r, Tokens.parse(RunRule.class, "run rule", r.token()));
        }
        assertThrows(IllegalArgumentException.class, () -> Tokens.parse(RunRule.class, "run rule", "nine"));
        assertThrows(IllegalArgumentException.class, () -> RunRules.scan(new double[] {Double.NaN}, Set.of(RunRule.TREND)));
    }

    /**
     * The 3σ rule alone on independent standard normal points fires with probability 2·(1 − Φ(3)) per point
     * = 0.0026998 (SciPy 1.17.1: 2*scipy.stats.norm.sf(3)). 2,000,000 points, seed 20261201: the binomial
     * standard error of the rate is sqrt(p(1−p)/N) = 3.7e-5, the tolerance is five of them.
     */
    @Test
    void beyondLimitsFalseAlarmRateOnAStableProcess() {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(20261201L);
        ZigguratSampler.NormalizedGaussian g = ZigguratSampler.NormalizedGaussian.of(rng);
        int n = 2_000_000;
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = g.sample();
        }
        double rate = RunRules.signalledPoints(z, EnumSet.of(RunRule.BEYOND_LIMITS)) / (double) n;
        assertEquals(0.0026998, rate, 5 * 3.7e-5);
    }
}
