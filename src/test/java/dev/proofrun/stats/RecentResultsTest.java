package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class RecentResultsTest {

    private final List<Integer> computed = new ArrayList<>();
    private final RecentResults<Integer, String> recent = new RecentResults<>(2);

    private String square(int k) {
        computed.add(k);
        return Integer.toString(k * k);
    }

    @Test
    void aKeyAskedAgainIsNotComputedAgain() {
        String first = recent.get(3, this::square);
        assertSame(first, recent.get(3, this::square));
        assertEquals(List.of(3), computed);
    }

    @Test
    void pastTheLimitTheLeastRecentlyUsedGoes() {
        recent.get(1, this::square);
        recent.get(2, this::square);
        recent.get(1, this::square); // 1 is now the more recent
        recent.get(3, this::square); // 2 goes
        assertEquals(2, recent.size());
        recent.get(1, this::square);
        recent.get(2, this::square);
        assertEquals(List.of(1, 2, 3, 2), computed);
    }

    @Test
    void aComputationThatThrowsKeepsNothing() {
        assertThrows(ArithmeticException.class, () -> recent.get(0, k -> Integer.toString(1 / k)));
        assertEquals(0, recent.size());
        assertEquals("0", recent.get(0, this::square));
    }

    @Test
    void aLimitBelowOneIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new RecentResults<Integer, String>(0));
    }
}
