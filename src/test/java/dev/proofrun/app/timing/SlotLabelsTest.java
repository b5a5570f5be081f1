package dev.proofrun.app.timing;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** Slot ids over their marks: never two in one lane closer than the gap, none outside the row. */
class SlotLabelsTest {

    @Test
    void labelsFarApartAllGoInTheTopLane() {
        int[] lanes = SlotLabels.place(new double[] {100, 200, 300}, new double[] {30, 30, 30}, 5, 0, 1000, 2);
        assertArrayEquals(new int[] {0, 0, 0}, lanes);
    }

    @Test
    void closeLabelsStaggerAndAThirdInTheSamePlaceIsLeftOut() {
        // "S07S08": two marks 10 px apart with 30 px labels; the second goes down a lane, a third is left out
        int[] lanes = SlotLabels.place(new double[] {100, 110, 120}, new double[] {30, 30, 30}, 5, 0, 1000, 2);
        assertArrayEquals(new int[] {0, 1, SlotLabels.LEFT_OUT}, lanes);
    }

    @Test
    void labelsAtTheEndsStayInsideTheRow() {
        assertEquals(0, SlotLabels.left(3, 30, 0, 1000), 0);
        assertEquals(970, SlotLabels.left(999, 30, 0, 1000), 0);
        assertEquals(85, SlotLabels.left(100, 30, 0, 1000), 0);
    }

    @Test
    void noTwoPlacedLabelsOverlapForRandomRows() {
        Random random = new Random(20261203L); // fixed seed: 500 rows of up to 40 marks
        for (int trial = 0; trial < 500; trial++) {
            int n = 1 + random.nextInt(40);
            double[] centres = random.doubles(n, 0, 600).sorted().toArray();
            double[] widths = random.doubles(n, 18, 40).toArray();
            int[] lanes = SlotLabels.place(centres, widths, 4, 0, 600, 2);
            for (int i = 0; i < n; i++) {
                if (lanes[i] == SlotLabels.LEFT_OUT) {
                    continue;
                }
                double a = SlotLabels.left(centres[i], widths[i], 0, 600);
                assertTrue(a >= 0 && a + widths[i] <= 600 + 1e-9);
                for (int j = i + 1; j < n; j++) {
                    if (lanes[j] == lanes[i]) {
                        double b = SlotLabels.left(centres[j], widths[j], 0, 600);
                        assertTrue(b >= a + widths[i] + 4 - 1e-9 || a >= b + widths[j] + 4 - 1e-9,
                                "labels " + i + " and " + j + " overlap in lane " + lanes[i]);
                    }
                }
            }
        }
    }
}
