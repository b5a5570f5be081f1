package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The whole procedure's power: the gates and the losses the plan allows, against SciPy's binomial. */
class ProcedurePowerTest {

    @Test
    void lossesWeighTheSmallerStudiesByTheBinomialUpToTheAllowance() {
        // k = 28 planned, p = 0.05, allowance ⌊28/10⌋ = 2; weights from SciPy 1.17.1:
        // scipy.stats.binom.pmf(L, 28, 0.05) for L = 0, 1, 2
        double[] w = {0.23782688525533244, 0.35048172563943725, 0.24902648927012636};
        double sum = ProcedurePower.afterLosses(28, 0.05, 2, k -> k / 100.0);
        assertEquals(w[0] * 0.28 + w[1] * 0.27 + w[2] * 0.26, sum, 1e-14);
        // more than the allowance lost is not valid: with B = 1 the sum is P(L <= 2), not 1
        assertEquals(w[0] + w[1] + w[2], ProcedurePower.afterLosses(28, 0.05, 2, k -> 1.0), 1e-14);
        assertEquals(0.61, ProcedurePower.afterLosses(61, 0, 2, k -> k / 100.0), 0);
    }

    @Test
    void theGatesScaleTheBoundsPower() {
        double p = ProcedurePower.of(28, 0, 2, k -> 0.9, 0.006);
        assertEquals(0.9 * (1 - ProcedurePower.NORMAL_SHAPE_REJECTION) * (1 - 0.006), p, 1e-15);
    }

    @Test
    void aLossRateNeedsMoreSubgroupsAndIsRefusedOutsideItsRange() {
        DesignRequest r = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                Expectation.centred(1.67)).withSubgroupSizes(List.of(5));
        DesignRow none = StudyDesigner.design(r).recommended();
        DesignRow lossy = StudyDesigner.design(r.withLossRate(0.05)).recommended();
        assertTrue(lossy.subgroups() > none.subgroups(), none + " / " + lossy);
        assertTrue(lossy.power() >= 0.9 && lossy.power() < lossy.boundPower(), lossy.toString());
        assertThrows(UserException.class, () -> r.withLossRate(1.0));
        assertThrows(UserException.class, () -> r.withLossRate(-0.1));
    }
}
