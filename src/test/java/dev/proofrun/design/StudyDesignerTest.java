package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.UserException;
import java.util.List;
import org.junit.jupiter.api.Test;

class StudyDesignerTest {

    private static DesignRequest cpk(double c0, double c1) {
        return DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, c0, 0.95),
                Expectation.centred(c1));
    }

    @Test
    void refusesAProcessNoBetterThanTheRequirement() {
        UserException e = assertThrows(UserException.class, () -> StudyDesigner.design(cpk(1.33, 1.33)));
        assertEquals(DesignMessage.NOT_BETTER_THAN_REQUIRED, e.key());
        assertTrue(e.getMessage().contains("the process must improve first"), e.getMessage());
    }

    @Test
    void refusesAPowerOutOfReach() {
        UserException e = assertThrows(UserException.class,
                () -> StudyDesigner.design(cpk(1.33, 1.34).withSubgroupSizes(List.of(5))));
        assertEquals(DesignMessage.UNREACHABLE, e.key());
    }

    @Test
    void refusesAnIndexWithoutItsLimits() {
        UserException e = assertThrows(UserException.class, () -> DesignRequest.of(SpecLimits.Sides.UPPER_ONLY,
                Requirement.of(IndexKind.CP, 1.33, 0.95), Expectation.centred(1.67)));
        assertEquals(DesignMessage.INDEX_NEEDS_BOTH_LIMITS, e.key());
    }

    @Test
    void everyRowMeetsPowerAndFloors() {
        DesignTable t = StudyDesigner.design(cpk(1.33, 1.67));
        assertEquals(10, t.rows().size());
        for (DesignRow r : t.rows()) {
            assertTrue(r.power() >= 0.9, r.toString());
            assertTrue(r.subgroups() >= 25 && r.readings() >= 100, r.toString());
            assertEquals(r.subgroupSize() * r.subgroups(), r.readings());
        }
        assertTrue(t.rows().stream().allMatch(r -> r.readings() >= t.recommended().readings()));
    }

    @Test
    void aFloorLimitedRowSaysWhichFloor() {
        // Cp 1.0 -> 2.0 needs few readings, so every row sits on a floor: n = 1..3 on readings, 4+ on subgroups.
        DesignRequest r = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CP, 1.0, 0.95),
                Expectation.centred(2.0));
        DesignTable t = StudyDesigner.design(r);
        assertEquals(LimitedBy.MIN_READINGS, t.rows().get(0).limitedBy());
        assertEquals(100, t.rows().get(0).readings());
        assertEquals(LimitedBy.MIN_SUBGROUPS, t.rows().get(9).limitedBy());
        assertEquals(25, t.rows().get(9).subgroups());
        // n = 4: 25 subgroups = 100 readings; both floors bind, the subgroup floor is named. Recommended: the
        // fewest readings (100, for n = 1..4), on a tie the most subgroups: n = 1.
        assertEquals(1, t.recommended().subgroupSize());
    }

    @Test
    void powerLimitedRowsAreTheSmallestPassingK() {
        DesignRequest r = cpk(1.33, 1.67).withFloors(PracticeFloors.none()).withSubgroupSizes(List.of(5));
        DesignTable t = StudyDesigner.design(r);
        DesignRow row = t.rows().get(0);
        assertEquals(LimitedBy.POWER, row.limitedBy());
        SizeSearch s = new SizeSearch(r, 5);
        assertTrue(s.power(row.subgroups()) >= 0.9);
        assertTrue(s.power(row.subgroups() - 1) < 0.9);
    }

    private static double ocAt(DesignTable t, double trueIndex) {
        return t.operatingCharacteristic().stream().filter(p -> p.trueIndex() == trueIndex).findFirst()
                .orElseThrow(() -> new AssertionError("no OC point at " + trueIndex)).probability();
    }

    @Test
    void theOcCurvePassesThroughTheRequirementAtAlphaForAnExactPivot() {
        // Pp from the overall s: the lower bound Pp^·sqrt(chi2_{alpha,nu}/nu) is exact, so when the true Pp
        // is c0 the study demonstrates with probability alpha exactly (by the bound's definition: P(Pp^ >= c*)
        // = P(chi2_nu <= nu·c1²/c*²)... = alpha at c1 = c0); 1e-6 allows for the root finder.
        DesignRequest r = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.PP, 1.33, 0.95),
                Expectation.centred(1.67));
        DesignTable t = StudyDesigner.design(r);
        // the curve is the whole procedure's: the bound's chance times the gates' (the same at every true index)
        double gates = t.recommended().power() / t.recommended().boundPower();
        assertTrue(gates < 1 && gates > 0.97, "gates " + gates);
        assertEquals(0.05 * gates, ocAt(t, 1.33), 1e-6);
        assertEquals(t.recommended().power(), ocAt(t, 1.67), 1e-9);
        List<OcPoint> oc = t.operatingCharacteristic();
        for (int i = 1; i < oc.size(); i++) {
            assertTrue(oc.get(i).trueIndex() > oc.get(i - 1).trueIndex(), "sorted, no repeats");
            assertTrue(oc.get(i).probability() >= oc.get(i - 1).probability() - 1e-12, "non-decreasing");
        }
    }

    @Test
    void atTheRequirementTheCustomersRiskIsAboutAlpha() {
        // Cpk with the exact bound: the centring is a nuisance held at its estimate, so the chance of
        // demonstrating at a true Cpk of c0 is about alpha off centre and below it centred (measured coverage
        // 94.8-95.1 % off centre, 96.0-96.6 % centred, CapabilityBoundsCoverageTest). 0.005 covers the
        // off-centre excess seen there.
        DesignTable centred = StudyDesigner.design(cpk(1.33, 1.67));
        assertTrue(ocAt(centred, 1.33) <= 0.05, "centred: " + ocAt(centred, 1.33));
        assertEquals(centred.recommended().power(), ocAt(centred, 1.67), 1e-9);
        DesignTable off = StudyDesigner.design(DesignRequest.of(SpecLimits.Sides.TWO_SIDED,
                Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.offCentre(1.67, 2.0)));
        // off centre (Cp 2.0, n = 5, sigma from R-bar/d2) the model gives 0.047: close to alpha, on the safe
        // side, as the simulated coverage of the R-bar/d2 bound (95.0-95.9 %, WithinSigmaBoundsCoverageTest)
        double risk = ocAt(off, 1.33);
        assertTrue(risk > 0.04 && risk <= 0.055, "off centre " + risk);
        assertEquals(off.recommended().power(), ocAt(off, 1.67), 1e-9);
    }

    @Test
    void thePowerOfAGivenDesignIsTheSearchsPower() {
        DesignRequest r = cpk(1.33, 1.67);
        DesignTable t = StudyDesigner.design(r);
        DesignRow best = t.recommended();
        assertEquals(best.power(), StudyDesigner.power(r, best.subgroupSize(), best.subgroups()), 1e-12);
        double fewer = StudyDesigner.power(r, best.subgroupSize(), best.subgroups() - 1);
        assertTrue(fewer < r.power() && fewer < best.power(), "one subgroup fewer falls short: " + fewer);
        // the curve takes the stability gate's rate at the chosen k; at other k it differs by the change of that
        // rate with k (tenths of a percent, simulated with standard error about 0.002)
        t.powerCurve().forEach(p -> assertEquals(StudyDesigner.power(r, best.subgroupSize(), p.subgroups()),
                p.power(), p.subgroups() == best.subgroups() ? 1e-12 : 0.01, "k = " + p.subgroups()));
        assertThrows(IllegalArgumentException.class, () -> StudyDesigner.power(r, 0, 30));
        assertThrows(IllegalArgumentException.class, () -> StudyDesigner.power(r, 5, 1));
        assertThrows(IllegalArgumentException.class, () -> StudyDesigner.power(r, 5, 2001));
    }
}
