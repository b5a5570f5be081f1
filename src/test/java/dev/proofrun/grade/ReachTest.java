package dev.proofrun.grade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.SpecLimits;
import org.junit.jupiter.api.Test;

/**
 * The reach of grading: a thousand tolerance widths beyond the limits, never beyond ±1e100. The values are the
 * rule's own arithmetic (docs/decisions/hostile-input.md), checked at and just past each edge.
 */
class ReachTest {

    @Test
    void twoSidedLimitsReachAThousandWidthsBeyondEach() {
        Reach r = Reach.of(SpecLimits.twoSided(21.987, 22.013), 22.0);
        double width = 22.013 - 21.987;
        assertEquals(21.987 - 1000 * width, r.low(), 0.0);
        assertEquals(22.013 + 1000 * width, r.high(), 0.0);
        assertTrue(r.contains(r.high()));
        assertFalse(r.contains(Math.nextUp(r.high())));
        assertFalse(r.contains(Math.nextDown(r.low())));
        assertTrue(r.contains(23.0), "a reading 38 widths out is kept (flagged as a probable typing error)");
        assertFalse(r.contains(1e300));
        assertFalse(r.contains(-Double.MAX_VALUE));
    }

    @Test
    void oneLimitUsesTheNominalOrItsOwnSize() {
        Reach withNominal = Reach.of(SpecLimits.upperOnly(0.8), 0.4);
        assertEquals(0.8 + 1000 * 0.4, withNominal.high(), 1e-12);
        assertEquals(0.8 - 1000 * 0.4, withNominal.low(), 1e-12);
        Reach own = Reach.of(SpecLimits.lowerOnly(5.0), null);
        assertEquals(5.0 - 5000, own.low(), 0.0);
        assertEquals(5.0 + 5000, own.high(), 0.0);
    }

    @Test
    void withoutAScaleOnlyTheMagnitudeBoundApplies() {
        Reach zero = Reach.of(SpecLimits.upperOnly(0.0), null);
        assertEquals(-Reach.MAGNITUDE, zero.low(), 0.0);
        assertEquals(Reach.MAGNITUDE, zero.high(), 0.0);
        Reach huge = Reach.of(SpecLimits.twoSided(-1e307, 1e307), null); // the width overflows: magnitude only
        assertEquals(Reach.MAGNITUDE, huge.high(), 0.0);
        assertTrue(huge.contains(1e99));
        assertFalse(huge.contains(1e101));
    }
}
