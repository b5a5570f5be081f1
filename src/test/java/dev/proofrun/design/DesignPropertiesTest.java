package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

/** Monotonicity the engineer relies on when trading power, confidence and the expected index. */
class DesignPropertiesTest {

    private static final IndexKind[] KINDS = {IndexKind.CPK, IndexKind.CP, IndexKind.PPK, IndexKind.CPU};

    private static int readings(int kind, double c0, double gap, double conf, double power, int n) {
        DesignRequest r = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(KINDS[kind], c0, conf),
                Expectation.centred(c0 + gap)).withPower(power).withFloors(PracticeFloors.none())
                .withSubgroupSizes(List.of(n));
        return StudyDesigner.design(r).rows().get(0).readings();
    }

    @Property(tries = 25)
    void morePowerNeverNeedsFewerReadings(@ForAll @IntRange(min = 0, max = 3) int kind,
            @ForAll @DoubleRange(min = 0.8, max = 1.7) double c0, @ForAll @DoubleRange(min = 0.25, max = 0.8) double gap,
            @ForAll @DoubleRange(min = 0.6, max = 0.9) double power, @ForAll @IntRange(min = 1, max = 8) int n) {
        assertTrue(readings(kind, c0, gap, 0.95, power + 0.05, n) >= readings(kind, c0, gap, 0.95, power, n));
    }

    @Property(tries = 25)
    void moreConfidenceNeverNeedsFewerReadings(@ForAll @IntRange(min = 0, max = 3) int kind,
            @ForAll @DoubleRange(min = 0.8, max = 1.7) double c0, @ForAll @DoubleRange(min = 0.25, max = 0.8) double gap,
            @ForAll @DoubleRange(min = 0.8, max = 0.97) double conf, @ForAll @IntRange(min = 1, max = 8) int n) {
        assertTrue(readings(kind, c0, gap, conf + 0.02, 0.9, n) >= readings(kind, c0, gap, conf, 0.9, n));
    }

    @Property(tries = 25)
    void aBetterProcessNeverNeedsMoreReadings(@ForAll @IntRange(min = 0, max = 3) int kind,
            @ForAll @DoubleRange(min = 0.8, max = 1.7) double c0, @ForAll @DoubleRange(min = 0.25, max = 0.8) double gap,
            @ForAll @IntRange(min = 1, max = 8) int n) {
        assertTrue(readings(kind, c0, gap + 0.1, 0.95, 0.9, n) <= readings(kind, c0, gap, 0.95, 0.9, n));
    }
}
