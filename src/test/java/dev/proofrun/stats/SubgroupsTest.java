package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class SubgroupsTest {

    @Test
    void allReadingsSubgroupAfterSubgroupInTheirOrder() {
        assertArrayEquals(new double[] {3, 1, 2, 5, 4}, Subgroups.flatten(List.of(new double[] {3, 1}, new double[] {2},
                new double[0], new double[] {5, 4})), 0.0);
        assertArrayEquals(new double[0], Subgroups.flatten(List.of()), 0.0);
    }
}
