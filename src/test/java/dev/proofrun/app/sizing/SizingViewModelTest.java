package dev.proofrun.app.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.StudyDesigner;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.util.Map;
import javafx.beans.property.SimpleObjectProperty;
import org.junit.jupiter.api.Test;

/** The sizing step shows the core's table for the goal, recomputes on any input and keeps the user's pick. */
class SizingViewModelTest {

    private final StudyDraft draft = new StudyDraft();
    private final GoalViewModel goal = new GoalViewModel(draft, new SimpleObjectProperty<StudyPlan>());
    private final SizingViewModel vm = new SizingViewModel(draft, goal, Background.inline());
    private final CharacteristicDraft row = CharacteristicDraft.of(Map.of("id", "D1", "unit", "mm", "lsl", "9.9",
            "usl", "10.1", "expected", "1.8"));

    @Test
    void theTableIsTheDesignersAndFollowsTheExpectedIndex() {
        row.cell(CharacteristicField.EXPECTED).set("1.5");
        draft.characteristics().add(row);
        assertTrue(vm.completeBinding().get(), vm.missingProperty().get());
        DesignRow shown = vm.chosenProperty().get();
        DesignRow core = StudyDesigner.design(DesignRequest.of(SpecLimits.Sides.TWO_SIDED,
                Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.centred(1.5))).recommended();
        assertEquals(core, shown, "nothing computed twice: the row is the core's");
        int before = vm.tableProperty().get().recommended().readings();
        row.cell(CharacteristicField.EXPECTED).set("2.2");
        assertTrue(vm.tableProperty().get().recommended().readings() < before, "a better process needs fewer readings");
    }

    @Test
    void anotherRowIsKeptAndItsCostSpelledOut() {
        draft.characteristics().add(row);
        DesignRow three = vm.rows().stream().filter(r -> r.subgroupSize() == 3).findFirst().orElseThrow();
        vm.choose(three);
        assertEquals(3, vm.chosenProperty().get().subgroupSize());
        assertEquals(3, vm.design().orElseThrow().subgroupSize());
        assertTrue(vm.costBinding().get().contains("subgroups of 3"), vm.costBinding().get());
        assertTrue(vm.costBinding().get().contains("against the recommended"), vm.costBinding().get());
        assertEquals("3", draft.text(DraftField.CHOSEN_SUBGROUP_SIZE));
    }

    @Test
    void aRefusalOfTheCoreIsShownAsWhatIsMissing() {
        draft.characteristics().add(row);
        draft.field(DraftField.POWER).set("0.99999");
        assertFalse(vm.completeBinding().get());
        assertFalse(vm.refusalProperty().get().isEmpty());
    }

    @Test
    void aPlansOwnKKeepsItsPowerAsTheCoreComputesIt() {
        draft.field(DraftField.CHOSEN_SUBGROUPS).set("40"); // as opening a plan file with k = 40 does
        draft.characteristics().add(row);
        int n = vm.chosenProperty().get().subgroupSize();
        assertEquals(40, vm.design().orElseThrow().subgroups());
        double power = StudyDesigner.power(DesignRequest.of(SpecLimits.Sides.TWO_SIDED,
                Requirement.of(IndexKind.CPK, 1.33, 0.95), Expectation.centred(1.8)), n, 40);
        String cost = vm.costBinding().get();
        assertTrue(cost.contains("Kept from the plan file: 40 subgroups of " + n), cost);
        assertTrue(cost.contains("power " + SizingViewModel.fmt(power) + "."), cost);
        assertFalse(cost.contains("between"), "computed, not read between points of the curve: " + cost);
    }

    @Test
    void withSeveralCharacteristicsEachPowerAndTheirProductAreShown() {
        // D1 as above; F7 one-sided, expected barely above the requirement: far below the wanted power
        CharacteristicDraft f7 = CharacteristicDraft.of(Map.of("id", "F7", "unit", "kN", "lsl", "4.5", "expected", "1.45"));
        draft.characteristics().add(row);
        draft.characteristics().add(f7);
        assertTrue(vm.completeBinding().get(), vm.missingProperty().get());
        dev.proofrun.design.Design d = vm.design().orElseThrow();
        Requirement req = Requirement.of(IndexKind.CPK, 1.33, 0.95);
        // the same powers as the core gives for each characteristic at this design
        double d1 = StudyDesigner.power(DesignRequest.of(SpecLimits.Sides.TWO_SIDED, req, Expectation.centred(1.8)),
                d.subgroupSize(), d.subgroups());
        double p7 = StudyDesigner.power(DesignRequest.of(SpecLimits.Sides.LOWER_ONLY, req, Expectation.centred(1.45)),
                d.subgroupSize(), d.subgroups());
        String line = vm.togetherProperty().get();
        assertTrue(line.contains("D1 " + SizingViewModel.fmt(d1) + ", F7 " + SizingViewModel.fmt(p7)), line);
        assertTrue(line.contains("(taken as independent): " + SizingViewModel.fmt(d1 * p7) + "."), line);
        assertTrue(p7 < 0.9 && line.contains("Below the wanted power of 0.900: F7."), line);

        // one characteristic without an expected index is said, not counted
        f7.cell(CharacteristicField.EXPECTED).set("");
        String without = vm.togetherProperty().get();
        assertTrue(without.contains("Not counted (no expected index or no limits yet): F7."), without);

        // a single characteristic needs no such line
        draft.characteristics().remove(f7);
        assertEquals("", vm.togetherProperty().get());
    }
}
