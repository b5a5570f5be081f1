package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.StudyDesigner;
import java.util.List;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/** The common design is the designer's answer combined by the documented rule (checked against the designer itself). */
class CommonDesignTest {

    private final List<Characteristic> chars = DemoPlan.draft().characteristics();

    private int designerK(Characteristic c, int n) {
        DesignTable t = StudyDesigner.design(DesignRequest.of(c.limits().sides(), c.requirement(), c.expectation())
                .withPower(0.9).withSubgroupSizes(List.of(n)));
        return t.rows().get(0).subgroups();
    }

    @Test
    void fixedDesignIsTakenAsGiven() {
        CommonDesign d = CommonDesign.choose(chars, 0.9, OptionalInt.of(4), OptionalInt.of(30));
        assertEquals(4, d.design().subgroupSize());
        assertEquals(30, d.design().subgroups());
        assertTrue(d.perCharacteristic().isEmpty());
    }

    @Test
    void givenSubgroupSizeTakesTheLargestKAnyCharacteristicNeeds() {
        CommonDesign d = CommonDesign.choose(chars, 0.9, OptionalInt.of(5), OptionalInt.empty());
        int k = chars.stream().mapToInt(c -> designerK(c, 5)).max().orElseThrow();
        assertEquals(5, d.design().subgroupSize());
        assertEquals(k, d.design().subgroups());
        for (DesignRow r : d.perCharacteristic().values()) {
            assertTrue(r.subgroups() <= d.design().subgroups());
        }
    }

    @Test
    void oneCharacteristicGetsTheDesignersRecommendation() {
        Characteristic c = chars.get(0);
        DesignRow rec = StudyDesigner.design(DesignRequest.of(c.limits().sides(), c.requirement(), c.expectation())
                .withPower(0.9)).recommended();
        CommonDesign d = CommonDesign.choose(List.of(c), 0.9, OptionalInt.empty(), OptionalInt.empty());
        assertEquals(rec.subgroupSize(), d.design().subgroupSize());
        assertEquals(rec.subgroups(), d.design().subgroups());
    }
}
