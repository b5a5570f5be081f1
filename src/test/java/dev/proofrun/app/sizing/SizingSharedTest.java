package dev.proofrun.app.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.chart.CurvePlot.Line;
import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.cli.ProofrunCommand;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.SharedDesign;
import dev.proofrun.design.SharedDesigner;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.Map;
import javafx.beans.property.SimpleObjectProperty;
import org.junit.jupiter.api.Test;

/**
 * Several characteristics on the Sample-size step: which one the table sizes (with its own requirement), the one
 * design for all that {@code plan new} would choose, and one design named by the table, the cost line and both
 * charts.
 */
class SizingSharedTest {

    private final StudyDraft draft = new StudyDraft();
    private final GoalViewModel goal = new GoalViewModel(draft, new SimpleObjectProperty<StudyPlan>());
    private final SizingViewModel vm = new SizingViewModel(draft, goal, Background.inline());
    // invented characteristics: a two-sided bore expected near the requirement (it drives k), a one-sided force
    private final CharacteristicDraft bore = CharacteristicDraft.of(Map.of("id", "B2", "unit", "mm", "lsl", "9.9",
            "usl", "10.1", "expected", "1.6"));
    private final CharacteristicDraft force = CharacteristicDraft.of(Map.of("id", "P3", "unit", "kN", "lsl", "4.5",
            "expected", "2.0"));
    private final Requirement plan = Requirement.of(IndexKind.CPK, 1.33, 0.95);

    private static String name(List<Line> lines, int i) {
        return lines.get(i).name();
    }

    @Test
    void theSharedDesignIsTheOnePlanNewChoosesAndNamesItsDriver() {
        draft.characteristics().addAll(bore, force);
        assertTrue(vm.completeBinding().get(), vm.missingProperty().get());
        SharedDesign shown = vm.sharedProperty().get();
        assertNotNull(shown, vm.sharedLineProperty().get());
        SharedDesign core = SharedDesigner.design(List.of(
                DesignRequest.of(SpecLimits.Sides.TWO_SIDED, plan, Expectation.centred(1.6)),
                DesignRequest.of(SpecLimits.Sides.LOWER_ONLY, plan, Expectation.centred(2.0)))).get(0);
        assertEquals(core, shown, "the core's shared design, not a copy of its rule");
        assertEquals(0, core.driver(), "the bore, expected nearer c₀, needs the most subgroups");
        assertTrue(vm.sharedLineProperty().get().contains(core.subgroups() + " subgroups of " + core.subgroupSize())
                && vm.sharedLineProperty().get().endsWith("B2 needs the most subgroups."), vm.sharedLineProperty().get());
    }

    @Test
    void takingTheSharedDesignNamesOneDesignInTableCostAndBothCharts() {
        draft.characteristics().addAll(bore, force);
        draft.field(DraftField.FOCUS).set("P3"); // the force alone would need fewer subgroups than the driver
        SharedDesign shared = vm.sharedProperty().get();
        vm.useShared();
        assertEquals(shared.subgroupSize(), vm.design().orElseThrow().subgroupSize());
        assertEquals(shared.subgroups(), vm.design().orElseThrow().subgroups());
        assertEquals(shared.subgroupSize(), vm.chosenProperty().get().subgroupSize(), "the highlighted row is its size");
        assertTrue(vm.costBinding().get().startsWith("Chosen: the design for all characteristics, " + shared.subgroups()
                + " subgroups of " + shared.subgroupSize()), vm.costBinding().get());
        String label = "plan: " + shared.subgroups() + " × " + shared.subgroupSize();
        List<Line> power = vm.powerLinesProperty().get();
        List<Line> oc = vm.ocLinesProperty().get();
        assertEquals(label, name(power, 2), "the power chart marks the plan's k");
        assertEquals(label, name(oc, 0), "the OC curve is the plan's k × n, not the row's");
        assertEquals(shared.subgroups(), (int) power.get(2).xs()[0]);
        assertFalse(oc.get(0).xs().length == 0);
    }

    @Test
    void theChooserSizesAnotherCharacteristicWithItsOwnRequirement() {
        draft.characteristics().addAll(bore, force);
        assertEquals(List.of("B2", "P3"), vm.characteristicIds());
        assertTrue(vm.sizedForBinding().get().startsWith("The table sizes B2 (Cpk ≥ 1.330 at 95 % confidence"),
                vm.sizedForBinding().get());
        force.cell(CharacteristicField.INDEX).set("ppk");
        force.cell(CharacteristicField.TARGET).set("1.67");
        draft.field(DraftField.FOCUS).set("P3");
        DesignRequest q = vm.request().orElseThrow();
        assertEquals(Requirement.of(IndexKind.PPK, 1.67, 0.95), q.requirement(), "the row's own requirement");
        assertEquals(SpecLimits.Sides.LOWER_ONLY, q.sides());
        assertTrue(vm.sizedForBinding().get().startsWith("The table sizes P3 (Ppk ≥ 1.670"), vm.sizedForBinding().get());
    }

    @Test
    void aSkewedCharacteristicIsSaidToBeSizedWithTheNormalModel() {
        CharacteristicDraft rough = CharacteristicDraft.of(Map.of("id", "S5", "unit", "µm", "usl", "0.8",
                "expected", "1.8", "shape", "lognormal"));
        draft.characteristics().addAll(bore, rough);
        assertTrue(vm.togetherProperty().get().contains("S5 is planned lognormal: its power here is the normal model's"),
                vm.togetherProperty().get());
        rough.cell(CharacteristicField.SHAPE).set("");
        assertFalse(vm.togetherProperty().get().contains("planned"), vm.togetherProperty().get());
    }

    @Test
    void aCharacteristicWithAFloorIsPromisedNoPower() {
        CharacteristicDraft seat = CharacteristicDraft.of(Map.of("id", "H6", "unit", "mm", "usl", "10.10",
                "expected", "1.8", "shape", "weibull3", "floor", "9.95"));
        draft.characteristics().addAll(bore, seat);
        String line = vm.togetherProperty().get();
        assertTrue(line.contains("H6 is planned weibull3 with a floor: no power is promised for it"), line);
        assertFalse(line.contains("H6 is planned weibull3: its power here"), line);
        assertTrue(line.contains("H6 —") && line.contains("that all are, in the one study (taken as independent): —"), line);
        seat.cell(CharacteristicField.FLOOR).set("");
        seat.cell(CharacteristicField.THRESHOLD).set("9.95");
        assertTrue(vm.togetherProperty().get().contains("H6 is planned weibull3: its power here is the normal model's"),
                vm.togetherProperty().get());
    }

    @Test
    void theTablesHeadersAreTheCommandLinesWords() throws Exception {
        StringWriter out = new StringWriter();
        int code = ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(new StringWriter(), true),
                "size", "--target", "1.33", "--expected", "1.8", "--usl", "2");
        assertEquals(0, code, out.toString());
        String header = out.toString().lines().filter(l -> l.contains(" k ") && l.contains("power")).findFirst()
                .orElseThrow();
        for (SizingColumn c : SizingColumn.values()) {
            assertTrue(header.contains(c.group().orElse(c.header())), c + " '" + c.header() + "' not in: " + header);
        }
    }
}
