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
        DesignRequest r = cpk(1.33, 1.67).withFloors(Floors.none()).withSubgroupSizes(List.of(5));
        DesignTable t = StudyDesigner.design(r);
        DesignRow row = t.rows().get(0);
        assertEquals(LimitedBy.POWER, row.limitedBy());
        SizeSearch s = new SizeSearch(r, 5);
        assertTrue(s.power(row.subgroups()) >= 0.9);
        assertTrue(s.power(row.subgroups() - 1) < 0.9);
    }
}
