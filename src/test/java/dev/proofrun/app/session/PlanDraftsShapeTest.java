package dev.proofrun.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.proofrun.plan.DemoPlan;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.stats.ShapeFamily;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A characteristic's planned shape and gauge are columns of the Part table: opening a plan and composing it
 * again keeps them, an edit changes them.
 */
class PlanDraftsShapeTest {

    @TempDir
    Path home;

    @Test
    void aPlanOpenedAndComposedAgainKeepsItsShapes() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Session session = opened(demo);
        StudyPlan again = composed(session, demo);
        assertEquals(ShapeFamily.LOGNORMAL, again.characteristic("R4").orElseThrow().shape());
        assertEquals(ShapeFamily.NORMAL, again.characteristic("D1").orElseThrow().shape());
    }

    @Test
    void theShapeColumnSetsThePlannedShapeAndABadNameIsMarked() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Session session = opened(demo);
        CharacteristicDraft d1 = session.draft().characteristics().get(0);
        assertEquals("normal", d1.text(CharacteristicField.SHAPE));
        d1.cell(CharacteristicField.SHAPE).set(" Weibull ");
        StudyPlan again = composed(session, demo);
        assertEquals(ShapeFamily.WEIBULL, again.characteristic("D1").orElseThrow().shape());
        d1.cell(CharacteristicField.SHAPE).set("");
        assertEquals(ShapeFamily.NORMAL, PlanDrafts.shapeOf(d1), "blank is normal");
        d1.cell(CharacteristicField.SHAPE).set("gamma");
        dev.proofrun.app.part.PartViewModel vm = new dev.proofrun.app.part.PartViewModel(session.draft());
        assertEquals(java.util.Optional.of("unknown shape 'gamma' (normal, lognormal, weibull, folded-normal, lognormal3 or weibull3)"),
                vm.problem(d1, CharacteristicField.SHAPE));
    }

    @Test
    void theGaugeColumnsSetTheGaugeAndKeepItsRepeatability() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Session session = opened(demo);
        CharacteristicDraft d1 = session.draft().characteristics().get(0);
        dev.proofrun.plan.Gauge was = demo.characteristic("D1").orElseThrow().gauge().orElseThrow();
        assertEquals(was.name(), d1.text(CharacteristicField.GAUGE));
        assertEquals(was.resolution(), Double.parseDouble(d1.text(CharacteristicField.RESOLUTION)), 0.0, "exact");

        d1.cell(CharacteristicField.RESOLUTION).set("0.0005");
        dev.proofrun.plan.Gauge now = PlanDrafts.gaugeOf(d1, java.util.Optional.of(was)).orElseThrow();
        assertEquals(0.0005, now.resolution(), 0.0);
        assertEquals(was.sd(), now.sd(), "the repeatability the wizard does not edit is kept");

        dev.proofrun.app.part.PartViewModel vm = new dev.proofrun.app.part.PartViewModel(session.draft());
        d1.cell(CharacteristicField.RESOLUTION).set("");
        assertEquals(java.util.Optional.of("give the smallest step gauge '" + was.name() + "' reads"),
                vm.problem(d1, CharacteristicField.RESOLUTION));
        d1.cell(CharacteristicField.RESOLUTION).set("-0.01");
        assertEquals(java.util.Optional.of("the resolution must be a positive number, not '-0.01'"),
                vm.problem(d1, CharacteristicField.RESOLUTION));
        d1.cell(CharacteristicField.GAUGE).set("");
        d1.cell(CharacteristicField.RESOLUTION).set("");
        assertEquals(java.util.Optional.empty(), PlanDrafts.gaugeOf(d1, java.util.Optional.of(was)), "both blank: no gauge");
    }

    @Test
    void aThresholdShapeKeepsItsDeclaredThresholdThroughTheWizard() throws Exception {
        // the Part table has no Threshold column: the threshold comes from the opened plan
        StudyPlan demo = DemoPlan.create();
        java.util.List<dev.proofrun.plan.Characteristic> chars = new java.util.ArrayList<>(demo.characteristics());
        int r4 = chars.indexOf(demo.characteristic("R4").orElseThrow());
        chars.set(r4, chars.get(r4).withShape(ShapeFamily.WEIBULL3, java.util.OptionalDouble.of(0.05)));
        StudyPlan plan = new StudyPlan(demo.id(), demo.part(), demo.people(), chars, demo.calendar(), demo.span(),
                demo.design(), demo.spacing(), demo.seed(), demo.schedule(), dev.proofrun.plan.PlanState.DRAFT,
                java.util.Optional.empty(), java.util.Optional.empty(), 1, demo.stages());
        Session session = opened(plan);
        CharacteristicDraft row4 = session.draft().characteristics().stream().filter(r -> r.id().equals("R4")).findFirst()
                .orElseThrow();
        assertEquals("0.05", row4.text(CharacteristicField.THRESHOLD), "the plan's threshold is in the cell");
        StudyPlan again = composed(session, demo);
        assertEquals(ShapeFamily.WEIBULL3, again.characteristic("R4").orElseThrow().shape());
        assertEquals(java.util.OptionalDouble.of(0.05), again.characteristic("R4").orElseThrow().threshold());
        // a threshold shape typed with the cell left blank: refused in words by the plan model
        CharacteristicDraft d1 = session.draft().characteristics().get(0);
        d1.cell(CharacteristicField.SHAPE).set("lognormal3");
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> composed(session, demo));
        org.junit.jupiter.api.Assertions.assertTrue(e.getMessage().contains("needs a threshold"), e.getMessage());
    }

    @Test
    void aThresholdTypedInTheGridReachesThePlanTheDraftAndTheReopenedPlan() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Session session = opened(demo);
        CharacteristicDraft d1 = session.draft().characteristics().get(0);
        // the plan model asks only that the threshold lie below the upper limit
        double theta = typeStop(d1, demo, "lognormal3", CharacteristicField.THRESHOLD);
        String typed = java.math.BigDecimal.valueOf(theta).toPlainString();
        StudyPlan composed = composed(session, demo);
        String id = d1.id();
        assertEquals(ShapeFamily.LOGNORMAL3, composed.characteristic(id).orElseThrow().shape());
        assertEquals(java.util.OptionalDouble.of(theta), composed.characteristic(id).orElseThrow().threshold());

        // the autosaved draft brings the typed threshold back when the plan is opened again
        session.autosave();
        Session later = new Session(new AppHome(home, home.resolve("plans")));
        assertEquals(true, later.open(home.resolve("plans").resolve(DemoPlan.FILE_NAME)), "the newer draft is restored");
        CharacteristicDraft back = later.draft().characteristics().get(0);
        assertEquals("lognormal3", back.text(CharacteristicField.SHAPE));
        assertEquals(typed, back.text(CharacteristicField.THRESHOLD));

        // the plan written with it (as the hand-out writes it) opens with the same threshold in the cell
        Session reader = OpenedPlans.openIssued(home, composed, "threshold.json");
        CharacteristicDraft reopened = reader.draft().characteristics().get(0);
        assertEquals(theta, Double.parseDouble(reopened.text(CharacteristicField.THRESHOLD)), 0.0, "exact");
        assertEquals(composed.characteristics(), composed(reader, demo).characteristics());
    }

    @Test
    void aThresholdThatIsNotANumberIsRefusedInWordsWhenComposed() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Session session = opened(demo);
        CharacteristicDraft d1 = session.draft().characteristics().get(0);
        d1.cell(CharacteristicField.SHAPE).set("weibull3");
        d1.cell(CharacteristicField.THRESHOLD).set("stop");
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> composed(session, demo));
        assertEquals(d1.id() + ": the threshold is not a number: 'stop'", e.getMessage());
    }

    /**
     * Types {@code shape} and an invented stop 0.5 below the demo's first lower limit into {@code field} of the
     * normal row {@code d1} (which holds none before) and returns the stop.
     */
    private static double typeStop(CharacteristicDraft d1, StudyPlan demo, String shape, CharacteristicField field) {
        assertEquals("", d1.text(field), "a normal row holds none");
        double stop = demo.characteristics().get(0).limits().lower().getAsDouble() - 0.5;
        d1.cell(CharacteristicField.SHAPE).set(shape);
        d1.cell(field).set(java.math.BigDecimal.valueOf(stop).toPlainString());
        return stop;
    }

    /** A session with {@code plan} written to the plans folder and opened. */
    private Session opened(StudyPlan plan) throws Exception {
        return OpenedPlans.open(home, plan);
    }

    /** The session's draft composed into a plan, with the demo's requirement, expectations, calendar and design. */
    private static StudyPlan composed(Session session, StudyPlan demo) {
        return PlanDrafts.compose(session.draft(), session.base(), demo.characteristics().get(0).requirement(),
                row -> demo.characteristic(row.id()).orElseThrow().expectation(), demo.calendar(), demo.span(),
                demo.design(), demo.spacing(), demo.seed(), demo.schedule());
    }

    @Test
    void aFloorTypedInTheGridReachesThePlanAndAReopenedPlanKeepsIt() throws Exception {
        StudyPlan demo = DemoPlan.create();
        Session session = opened(demo);
        CharacteristicDraft d1 = session.draft().characteristics().get(0);
        // the stop known only as a floor
        double floor = typeStop(d1, demo, "weibull3", CharacteristicField.FLOOR);
        StudyPlan composed = composed(session, demo);
        String id = d1.id();
        assertEquals(java.util.OptionalDouble.of(floor), composed.characteristic(id).orElseThrow().floor());
        assertEquals(java.util.OptionalDouble.empty(), composed.characteristic(id).orElseThrow().threshold());

        // the plan written with it opens with the floor in its cell, not lost when the draft is rebuilt
        Session reader = OpenedPlans.openIssued(home, composed, "floor.json");
        CharacteristicDraft reopened = reader.draft().characteristics().get(0);
        assertEquals(floor, Double.parseDouble(reopened.text(CharacteristicField.FLOOR)), 0.0, "exact");
        assertEquals("", reopened.text(CharacteristicField.THRESHOLD));
        assertEquals(composed.characteristics(), composed(reader, demo).characteristics());
    }
}
