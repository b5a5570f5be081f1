package dev.proofrun.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import org.junit.jupiter.api.Test;

class SharedDesignerTest {

    @Test
    void theHardestCharacteristicDrivesTheSharedSize() {
        List<Integer> sizes = List.of(3, 5);
        DesignRequest easy = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                Expectation.centred(2.0)).withSubgroupSizes(sizes).withFloors(PracticeFloors.none());
        DesignRequest hard = DesignRequest.of(SpecLimits.Sides.TWO_SIDED, Requirement.of(IndexKind.CPK, 1.33, 0.95),
                Expectation.centred(1.6)).withSubgroupSizes(sizes).withFloors(PracticeFloors.none());
        List<SharedDesign> designs = SharedDesigner.design(List.of(easy, hard));
        assertEquals(2, designs.size());
        for (SharedDesign d : designs) {
            assertEquals(1, d.driver());
            // the driver's k is its own k from the single-characteristic designer
            int own = StudyDesigner.design(hard.withSubgroupSizes(List.of(d.subgroupSize()))).rows().get(0).subgroups();
            assertEquals(own, d.subgroups());
            assertTrue(d.powers().get(0) > d.powers().get(1), d.toString());
            assertTrue(d.powers().get(1) >= 0.9, d.toString());
            int easyAlone = StudyDesigner.design(easy.withSubgroupSizes(List.of(d.subgroupSize()))).rows().get(0)
                    .subgroups();
            assertEquals(List.of(easyAlone, own), d.ownSubgroups());
            DesignRow driverRow = StudyDesigner.design(hard.withSubgroupSizes(List.of(d.subgroupSize()))).rows().get(0);
            assertEquals(driverRow.falseAlarm(), d.falseAlarm());
            assertEquals(driverRow.detection(), d.detection());
        }
        assertTrue(designs.get(0).readings() <= designs.get(1).readings());
    }
}
