package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.SharedDesign;
import dev.proofrun.design.StudyDesigner;
import dev.proofrun.text.UserException;
import java.util.List;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/**
 * The common design is the shared designer's answer; checked here against the single-characteristic
 * designer ({@link StudyDesigner}, a separate path through the same search) combined by the documented rule.
 */
class PlanDesignTest {

    private final List<Characteristic> chars = DemoPlan.draft().characteristics();

    private int designerK(Characteristic c, int n) {
        DesignTable t = StudyDesigner.design(DesignRequest.of(c.limits().sides(), c.requirement(), c.expectation())
                .withPower(0.9).withSubgroupSizes(List.of(n)));
        return t.rows().get(0).subgroups();
    }

    @Test
    void fixedDesignIsTakenAsGiven() {
        PlanDesign d = PlanDesign.choose(chars, 0.9, OptionalInt.of(4), OptionalInt.of(30));
        assertEquals(4, d.design().subgroupSize());
        assertEquals(30, d.design().subgroups());
        assertTrue(d.solved().isEmpty());
    }

    @Test
    void givenSubgroupSizeTakesTheLargestKAnyCharacteristicNeeds() {
        PlanDesign d = PlanDesign.choose(chars, 0.9, OptionalInt.of(5), OptionalInt.empty());
        int k = chars.stream().mapToInt(c -> designerK(c, 5)).max().orElseThrow();
        assertEquals(5, d.design().subgroupSize());
        assertEquals(k, d.design().subgroups());
        SharedDesign shared = d.solved().orElseThrow();
        for (int i = 0; i < chars.size(); i++) {
            assertEquals(designerK(chars.get(i), 5), shared.ownSubgroups().get(i), chars.get(i).id());
        }
        String driver = chars.get(shared.driver()).id();
        assertTrue(d.reason().endsWith(driver + " needs the most subgroups."), d.reason());
    }

    @Test
    void aGivenKReplacesTheSolvedOne() {
        PlanDesign solved = PlanDesign.choose(chars, 0.9, OptionalInt.empty(), OptionalInt.empty());
        PlanDesign d = PlanDesign.choose(chars, 0.9, OptionalInt.empty(), OptionalInt.of(40));
        int k = solved.design().subgroups();
        assertEquals(solved.design().subgroupSize(), d.design().subgroupSize());
        assertEquals(40, d.design().subgroups());
        assertEquals(k, d.solved().orElseThrow().subgroups());
        assertTrue(d.reason().contains("40 subgroups as given (the designer asked for " + k + ")"), d.reason());
    }

    @Test
    void oneCharacteristicGetsTheDesignersRecommendation() {
        Characteristic c = chars.get(0);
        DesignRow rec = StudyDesigner.design(DesignRequest.of(c.limits().sides(), c.requirement(), c.expectation())
                .withPower(0.9)).recommended();
        PlanDesign d = PlanDesign.choose(List.of(c), 0.9, OptionalInt.empty(), OptionalInt.empty());
        assertEquals(rec.subgroupSize(), d.design().subgroupSize());
        assertEquals(rec.subgroups(), d.design().subgroups());
    }

    @Test
    void aCharacteristicExpectedNoBetterThanRequiredIsNamed() {
        // R4 expected exactly at its requirement (c1 = c0 = 1.33): no study size can show it
        Characteristic r4 = chars.get(1);
        Characteristic atMinimum = new Characteristic(r4.id(), r4.name(), r4.unit(), r4.nominal(), r4.limits(),
                r4.gauge(), r4.requirement(), Expectation.centred(r4.requirement().minimum()));
        UserException e = assertThrows(UserException.class, () -> PlanDesign.choose(
                List.of(chars.get(0), atMinimum, chars.get(2)), 0.9, OptionalInt.empty(), OptionalInt.empty()));
        assertEquals(PlanMessage.CHARACTERISTIC_REFUSED, e.key());
        assertEquals("characteristic R4: expected Cpk 1.330 is not above the required 1.330: no study size can show"
                + " this; the process must improve first", e.getMessage());
    }

    @Test
    void aCharacteristicOutOfReachEvenAloneIsNamed() {
        // F7 expected barely above its requirement (1.34 against 1.33): 90 % power would need more readings
        // than the designer allows for any subgroup size, whatever the others need
        Characteristic f7 = chars.get(2);
        Characteristic barely = new Characteristic(f7.id(), f7.name(), f7.unit(), f7.nominal(), f7.limits(),
                f7.gauge(), f7.requirement(), Expectation.centred(1.34));
        UserException e = assertThrows(UserException.class, () -> PlanDesign.choose(
                List.of(chars.get(0), chars.get(1), barely), 0.9, OptionalInt.empty(), OptionalInt.empty()));
        assertEquals(PlanMessage.CHARACTERISTIC_REFUSED, e.key());
        assertTrue(e.getMessage().startsWith("characteristic F7: a power of 0.900 is out of reach"), e.getMessage());
    }
}
