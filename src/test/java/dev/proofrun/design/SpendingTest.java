package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

class SpendingTest {

    /*
     * References: SciPy 1.17.1, α = 0.05,
     *   2 - 2*norm.cdf(norm.ppf(1 - a/2)/math.sqrt(t))   (O'Brien–Fleming type, Lan & DeMets 1983)
     *   a*math.log(1 + (math.e - 1)*t)                     (Pocock type)
     *   a*t**2                                             (Kim & DeMets 1987 power family, rho = 2)
     */
    @Test
    void spendsAsTheLanDeMetsFunctions() {
        double[] t = {0.25, 0.5, 0.75, 1.0};
        double[] obf = {8.857543832130332e-05, 0.005574596680784305, 0.023625121317601305, 0.05};
        double[] pocock = {0.01786870097543942, 0.031005725347913876, 0.04139944696214349, 0.05};
        double[] kimDemets = {0.003125, 0.0125, 0.028125, 0.05};
        for (int i = 0; i < t.length; i++) {
            assertEquals(obf[i], Spending.OBRIEN_FLEMING.spent(0.05, t[i]), 1e-12);
            assertEquals(pocock[i], Spending.POCOCK.spent(0.05, t[i]), 1e-12);
            assertEquals(kimDemets[i], Spending.KIM_DEMETS_2.spent(0.05, t[i]), 1e-12);
        }
    }

    @Test
    void knowsItsTokens() {
        assertEquals(Spending.POCOCK, Spending.fromToken("pocock"));
        assertEquals(Spending.KIM_DEMETS_2, Spending.fromToken("kim-demets-2"));
        assertEquals("unknown spending function 'linear' (obrien-fleming, pocock or kim-demets-2)",
                assertThrows(IllegalArgumentException.class, () -> Spending.fromToken("linear")).getMessage());
    }

    @Test
    void refusesLooksTooCloseOrTooMany() {
        Look a = new Look(10, 0.99, 1.0);
        assertThrows(IllegalArgumentException.class,
                () -> new Stages(Spending.POCOCK, List.of(a, new Look(14, 0.96, Double.NaN))));
        assertThrows(IllegalArgumentException.class, () -> new Stages(Spending.POCOCK, List.of(
                new Look(5, 0.99, 1), new Look(10, 0.99, 1), new Look(15, 0.99, 1), new Look(20, 0.99, 1),
                new Look(25, 0.96, Double.NaN))));
        assertEquals(2, new Stages(Spending.POCOCK, List.of(a, new Look(15, 0.96, Double.NaN))).count());
    }
}
