package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class DemoPlanTest {

    static final Path SAVED = Path.of("plans", DemoPlan.FILE_NAME);

    @Test
    void savedDemoPlanIsWhatTheCodeMakes() throws Exception {
        byte[] fromCode = PlanFiles.toBytes(DemoPlan.create());
        if (Boolean.getBoolean("proofrun.writeDemo")) {
            Files.write(SAVED, fromCode);
        }
        assertArrayEquals(fromCode, Files.readAllBytes(SAVED),
                "plans/" + DemoPlan.FILE_NAME + " differs from DemoPlan.create(); regenerate with -Dproofrun.writeDemo=true");
    }

    @Test
    void savedDemoPlanIsIssuedAndIntact() {
        PlanFiles.Inspection in = PlanFiles.inspect(SAVED);
        assertEquals(PlanFiles.Integrity.INTACT, in.integrity());
        assertTrue(in.plan().characteristics().size() >= 2);
        assertEquals(25, in.plan().schedule().slots().size());
    }
}
