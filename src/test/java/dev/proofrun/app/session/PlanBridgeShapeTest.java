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

/** A characteristic's planned shape is a column of the Part table: opening a plan and composing it again keeps it, an edit changes it. */
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

    @Test
    void theShapeColumnSetsThePlannedShapeAndABadNameIsMarked() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Path plans = Files.createDirectories(home.resolve("plans"));
        Path file = plans.resolve(DemoPlan.FILE_NAME);
        PlanFiles.write(file, demo);
        Session session = new Session(new AppHome(home, plans));
        session.open(file);
        CharacteristicDraft d1 = session.draft().characteristics().get(0);
        assertEquals("normal", d1.text(CharacteristicField.SHAPE));
        d1.cell(CharacteristicField.SHAPE).set(" Weibull ");
        StudyPlan again = PlanBridge.compose(session.draft(), session.base(), demo.characteristics().get(0).requirement(),
                row -> demo.characteristic(row.id()).orElseThrow().expectation(), demo.calendar(), demo.span(),
                demo.design(), demo.spacing(), demo.seed(), demo.schedule());
        assertEquals(ShapeFamily.WEIBULL, again.characteristic("D1").orElseThrow().shape());
        d1.cell(CharacteristicField.SHAPE).set("");
        assertEquals(ShapeFamily.NORMAL, PlanBridge.shapeOf(d1), "blank is normal");
        d1.cell(CharacteristicField.SHAPE).set("gamma");
        dev.proofrun.app.part.PartViewModel vm = new dev.proofrun.app.part.PartViewModel(session.draft());
        assertEquals(java.util.Optional.of("unknown shape 'gamma'; the shapes are " + ShapeFamily.names()),
                vm.problem(d1, CharacteristicField.SHAPE));
    }
}
