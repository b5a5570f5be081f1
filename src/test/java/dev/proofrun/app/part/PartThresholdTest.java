package dev.proofrun.app.part;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.plan.Characteristic;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The Threshold column of the Part table: open for lognormal3/weibull3 and required there, greyed for the other
 * shapes, and checked with the plan model's rules in the plan model's words (the command line's words).
 */
class PartThresholdTest {

    private static final CharacteristicField SHAPE = CharacteristicField.SHAPE;
    private static final CharacteristicField THRESHOLD = CharacteristicField.THRESHOLD;

    private final StudyDraft draft = new StudyDraft();
    private final PartViewModel vm = new PartViewModel(draft);

    /** An invented runout characteristic: readings stop at 0 mm, the upper limit is 0.080 mm. */
    private CharacteristicDraft runout() {
        draft.field(DraftField.PLAN_ID).set("PR-2027-0042");
        draft.field(DraftField.PART_NAME).set("Pump shaft");
        CharacteristicDraft row = CharacteristicDraft.of(Map.of("id", "R2", "name", "Runout", "unit", "mm",
                "usl", "0.080", "index", "ppu", "expected", "1.8"));
        draft.characteristics().add(row);
        return row;
    }

    @Test
    void aShapeThatTakesNoThresholdLeavesTheCellShutAndTheStepComplete() {
        CharacteristicDraft row = runout();
        assertFalse(vm.cellOpen(row, THRESHOLD), "normal (blank shape) takes none");
        assertTrue(vm.cellOpen(row, SHAPE), "every other column is open");
        assertEquals(Optional.empty(), vm.problem(row, THRESHOLD));
        assertEquals("", vm.missingProperty().get());
        row.cell(SHAPE).set("lognormal");
        assertFalse(vm.cellOpen(row, THRESHOLD), "the two-parameter lognormal takes none");
    }

    @Test
    void aThresholdShapeOpensTheCellAndNeedsTheNumber() {
        CharacteristicDraft row = runout();
        row.cell(SHAPE).set("lognormal3");
        assertTrue(vm.cellOpen(row, THRESHOLD));
        assertEquals("the lognormal3 shape needs a threshold (the stop or datum the readings cannot go below) or a floor (when only a stop below the real start is known)",
                vm.problem(row, THRESHOLD).orElseThrow());
        assertEquals("row 1 (R2): the lognormal3 shape needs a threshold (the stop or datum the readings cannot go below)"
                + " or a floor (when only a stop below the real start is known)",
                vm.missingProperty().get(), "the step misses it, naming row and id once");
        row.cell(THRESHOLD).set("0");
        assertEquals(Optional.empty(), vm.problem(row, THRESHOLD));
        assertEquals("", vm.missingProperty().get());
        row.cell(SHAPE).set("Weibull3");
        assertEquals(Optional.empty(), vm.problem(row, THRESHOLD), "weibull3 takes the same threshold");
    }

    @Test
    void eachRuleSpeaksThePlanModelsWords() {
        CharacteristicDraft row = runout();
        row.cell(SHAPE).set("weibull3");
        row.cell(THRESHOLD).set("0.0x");
        assertEquals("Threshold '0.0x' is not a number", vm.problem(row, THRESHOLD).orElseThrow());
        row.cell(THRESHOLD).set("0,01");
        assertTrue(vm.problem(row, THRESHOLD).orElseThrow().contains("'0,01' has a decimal comma"),
                vm.problem(row, THRESHOLD).orElseThrow());
        row.cell(THRESHOLD).set("0.080");
        String atLimit = vm.problem(row, THRESHOLD).orElseThrow();
        assertEquals("the threshold 0.08 must lie below the upper limit 0.08", atLimit);
        // the command line's words for the same row (plan new --threshold, the CSV's threshold column): the
        // plan model's, with the id in front
        IllegalArgumentException cli = assertThrows(IllegalArgumentException.class, () -> Characteristic.requireThreshold(
                "R2", ShapeFamily.WEIBULL3, OptionalDouble.of(0.080), SpecLimits.upperOnly(0.080)));
        assertEquals("R2: " + atLimit, cli.getMessage());
        row.cell(THRESHOLD).set("0.0799");
        assertEquals(Optional.empty(), vm.problem(row, THRESHOLD), "just below the upper limit is taken");
    }

    @Test
    void aThresholdOnAShapeThatTakesNoneIsMarkedAndTheCellStaysOpenToClearIt() {
        CharacteristicDraft row = runout();
        row.cell(THRESHOLD).set("0.01"); // as a pasted block or an imported list can bring it
        assertTrue(vm.cellOpen(row, THRESHOLD));
        assertEquals("a threshold is only taken by the shapes lognormal3 and weibull3, not normal",
                vm.problem(row, THRESHOLD).orElseThrow());
        vm.setCell(0, THRESHOLD, "");
        assertFalse(vm.cellOpen(row, THRESHOLD));
        assertEquals("", vm.missingProperty().get());
    }

    /** The threshold, and the floor that stands for it, in the same undoable edit as the shape. */
    @ParameterizedTest(name = "{0}: {1} {2}, then {3}")
    @CsvSource({
        "THRESHOLD, lognormal3, 0.002, lognormal, weibull3",
        "FLOOR,     weibull3,   0,     normal,    lognormal3",
    })
    void choosingAShapeThatTakesNoneEmptiesTheCellAndOneUndoBringsBothBack(CharacteristicField field, String shape,
            String value, String shapeTakingNone, String otherThresholdShape) {
        CharacteristicDraft row = runout();
        vm.setCell(0, SHAPE, shape);
        vm.setCell(0, field, value);
        vm.setCell(0, SHAPE, shapeTakingNone);
        assertEquals("", row.text(field));
        assertFalse(vm.cellOpen(row, field));
        assertTrue(vm.undo());
        assertEquals(shape, row.text(SHAPE));
        assertEquals(value, row.text(field), "one undo brings shape and " + field + " back");
        // from one threshold shape to the other the number stays
        vm.setCell(0, SHAPE, otherThresholdShape);
        assertEquals(value, row.text(field));
    }

    @Test
    void anUnknownShapeIsTheShapeCellsProblemNotTheThresholds() {
        CharacteristicDraft row = runout();
        row.cell(SHAPE).set("gamma3");
        assertTrue(vm.problem(row, SHAPE).isPresent());
        assertEquals(Optional.empty(), vm.problem(row, THRESHOLD));
        assertFalse(vm.cellOpen(row, THRESHOLD));
    }

    @Test
    void keystrokesInTheThresholdAreCheckedBeforeTheyAreCommitted() {
        CharacteristicDraft row = runout();
        row.cell(SHAPE).set("lognormal3");
        row.cell(THRESHOLD).set("0");
        vm.typing(row, THRESHOLD, "0.09");
        assertEquals("row 1 (R2): the threshold 0.09 must lie below the upper limit 0.08", vm.typingProblemProperty().get());
        assertEquals("0", row.text(THRESHOLD), "nothing is committed while typing");
        vm.typing(row, THRESHOLD, "0.01");
        assertEquals("", vm.typingProblemProperty().get());
    }

    @Test
    void anImportedListBringsItsThresholdColumnAndItsProblems(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        runout();
        java.nio.file.Path csv = dir.resolve("shaft.csv");
        // the command line's characteristics CSV columns; the second row gives a threshold to a normal shape
        java.nio.file.Files.writeString(csv, "id,name,unit,usl,index,shape,threshold\n"
                + "R2,Runout,mm,0.080,ppu,weibull3,0\nL4,Length,mm,40.1,cpu,normal,39\n");
        assertTrue(vm.importList(csv), vm.importMessageProperty().get());
        CharacteristicDraft r2 = draft.characteristics().get(0);
        CharacteristicDraft l4 = draft.characteristics().get(1);
        assertEquals("0", r2.text(THRESHOLD));
        assertEquals(Optional.empty(), vm.problem(r2, THRESHOLD));
        assertEquals("a threshold is only taken by the shapes lognormal3 and weibull3, not normal",
                vm.problem(l4, THRESHOLD).orElseThrow(), "marked as the command line refuses it");
        assertTrue(vm.cellOpen(l4, THRESHOLD), "open, to clear it");
    }

    @Test
    void aPastedBlockFillsShapeAndThreshold() {
        CharacteristicDraft row = runout();
        assertEquals(2, vm.paste(0, SHAPE.ordinal(), "lognormal3\t0.001\n"));
        assertEquals("0.001", row.text(THRESHOLD));
        assertEquals(Optional.empty(), vm.problem(row, THRESHOLD));
    }

    private static final CharacteristicField FLOOR = CharacteristicField.FLOOR;

    @Test
    void aFloorInsteadOfAThresholdCompletesTheRowAndBothAreRefusedInThePlanModelsWords() {
        CharacteristicDraft row = runout();
        assertFalse(vm.cellOpen(row, FLOOR), "normal takes no floor either");
        row.cell(SHAPE).set("lognormal3");
        assertTrue(vm.cellOpen(row, FLOOR));
        row.cell(FLOOR).set("0");
        assertEquals(Optional.empty(), vm.problem(row, FLOOR));
        assertEquals(Optional.empty(), vm.problem(row, THRESHOLD), "a floor stands for the threshold");
        assertEquals("", vm.missingProperty().get());
        row.cell(THRESHOLD).set("0");
        String both = "give a threshold or a floor, not both (a threshold when the real start of the readings is known"
                + " exactly, a floor when only the stop below it is)";
        assertEquals(both, vm.problem(row, FLOOR).orElseThrow());
        assertEquals(both, vm.problem(row, THRESHOLD).orElseThrow(), "a rule on the pair marks both cells");
        row.cell(THRESHOLD).set("");
        row.cell(FLOOR).set("stop");
        assertEquals("Floor 'stop' is not a number", vm.problem(row, FLOOR).orElseThrow());
        row.cell(FLOOR).set("0.080");
        assertEquals("the floor 0.08 must lie below the upper limit 0.08", vm.problem(row, FLOOR).orElseThrow());
    }
}
