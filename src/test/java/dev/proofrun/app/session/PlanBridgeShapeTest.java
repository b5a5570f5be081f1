package dev.proofrun.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The wizard does not edit a characteristic's planned shape yet; opening a plan and composing it again keeps it. */
class PlanBridgeShapeTest {

    @TempDir
    Path home;

    @Test
    void aPlanOpenedAndComposedAgainKeepsItsShapes() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Path plans = Files.createDirectories(home.resolve("plans"));
        Path file = plans.resolve(DemoPlan.FILE_NAME);
        PlanFiles.write(file, demo);
        Session session = new Session(new AppHome(home, plans));
        session.open(file);
        StudyPlan again = PlanBridge.compose(session.draft(), session.base(), demo.characteristics().get(0).requirement(),
                row -> demo.characteristic(row.id()).orElseThrow().expectation(), demo.calendar(), demo.span(),
                demo.design(), demo.spacing(), demo.seed(), demo.schedule());
        assertEquals(ShapeFamily.LOGNORMAL, again.characteristic("R4").orElseThrow().shape());
        assertEquals(ShapeFamily.NORMAL, again.characteristic("D1").orElseThrow().shape());
    }
}
