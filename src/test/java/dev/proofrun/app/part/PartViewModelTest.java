package dev.proofrun.app.part;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.StudyDraft;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Inline validation of the part table, as typed. */
class PartViewModelTest {

    private final StudyDraft draft = new StudyDraft();
    private final PartViewModel vm = new PartViewModel(draft);

    private CharacteristicDraft goodRow() {
        draft.field(DraftField.PLAN_ID).set("PR-2027-0001");
        draft.field(DraftField.PART_NAME).set("Valve body");
        CharacteristicDraft row = CharacteristicDraft.of(Map.of("id", "D1", "name", "Bore", "unit", "mm",
                "nominal", "12.00", "lsl", "11.95", "usl", "12.05", "expected", "1.8"));
        draft.characteristics().add(row);
        return row;
    }

    @Test
    void aCompleteTableLetsTheStepGoOn() {
        goodRow();
        assertEquals("", vm.missingProperty().get());
        assertTrue(vm.completeBinding().get());
    }

    @Test
    void limitsInTheWrongOrderAreNamedWithTheRow() {
        CharacteristicDraft row = goodRow();
        row.cell(CharacteristicField.USL).set("11.90");
        assertEquals("Nominal 12.00 lies outside the limits", vm.problem(row, CharacteristicField.NOMINAL).orElseThrow());
        assertEquals("LSL 11.95 must be below USL 11.90", vm.problem(row, CharacteristicField.USL).orElseThrow());
        assertFalse(vm.completeBinding().get());
        assertTrue(vm.missingProperty().get().startsWith("row 1 (D1): "), vm.missingProperty().get());
    }

    @Test
    void eachKeystrokeIsCheckedAndTheMessageClearsWhenFixed() {
        CharacteristicDraft row = goodRow();
        row.cell(CharacteristicField.LSL).set("11.9x");
        assertEquals("LSL '11.9x' is not a number", vm.problem(row, CharacteristicField.LSL).orElseThrow());
        assertFalse(vm.completeBinding().get());
        row.cell(CharacteristicField.LSL).set("11.95");
        assertTrue(vm.completeBinding().get());
    }

    @Test
    void unitsMustLookLikeUnits() {
        CharacteristicDraft row = goodRow();
        for (String ok : new String[] {"mm", "N·m", "µm", "%", "m/s^2", "g"}) {
            row.cell(CharacteristicField.UNIT).set(ok);
            assertTrue(vm.problem(row, CharacteristicField.UNIT).isEmpty(), ok);
        }
        for (String bad : new String[] {"", "12", "m m", "=SUM(A1)"}) {
            row.cell(CharacteristicField.UNIT).set(bad);
            assertTrue(vm.problem(row, CharacteristicField.UNIT).isPresent(), bad);
        }
    }

    @Test
    void aOneSidedLimitIsFineButNoLimitIsNot() {
        CharacteristicDraft row = goodRow();
        row.cell(CharacteristicField.LSL).set("");
        row.cell(CharacteristicField.NOMINAL).set("");
        assertTrue(vm.completeBinding().get(), vm.missingProperty().get());
        row.cell(CharacteristicField.USL).set("");
        assertEquals("give LSL, USL or both", vm.problem(row, CharacteristicField.USL).orElseThrow());
    }

    @Test
    void repeatedIdsAreRefused() {
        goodRow();
        CharacteristicDraft second = vm.addRow();
        second.cell(CharacteristicField.ID).set("d1");
        second.cell(CharacteristicField.UNIT).set("mm");
        second.cell(CharacteristicField.USL).set("3");
        assertEquals("the id d1 is used twice", vm.problem(second, CharacteristicField.ID).orElseThrow());
    }

    @Test
    void importReadsTheListAndShowsItsProblemsInline(@TempDir Path dir) throws Exception {
        goodRow();
        Path csv = dir.resolve("list.csv");
        Files.writeString(csv, "id,name,unit,nominal,lsl,usl,target,expected\n"
                + "A1,Flange thickness,mm,4.0,3.9,4.1,,1.9\n"
                + "A2,Runout,mm,,,0.05,,1.6\n"
                + "A3,Torque,N·m,8,9,7,,1.5\n");
        assertTrue(vm.importList(csv));
        assertEquals(3, vm.rows().size());
        assertEquals("3 characteristics read from list.csv", vm.importMessageProperty().get());
        assertTrue(vm.missingProperty().get().startsWith("row 3 (A3): "), vm.missingProperty().get());
    }

    @Test
    void aBadListNamesFileRowAndColumnAndLeavesTheTableAlone(@TempDir Path dir) throws Exception {
        goodRow();
        Path csv = dir.resolve("bad.csv");
        Files.writeString(csv, "id,name,unit,tolerance\nA1,x,mm,3\n");
        assertFalse(vm.importList(csv));
        assertEquals("bad.csv, row 1, column tolerance: unknown column 'tolerance' "
                + "(expected id,name,unit,nominal,lsl,usl,index,target,confidence,expected,expected_cp,shape,threshold,floor,gauge,resolution)", vm.importMessageProperty().get());
        assertEquals(1, vm.rows().size());
    }

    @Test
    void textBeingTypedIsCheckedBeforeItIsCommitted() {
        CharacteristicDraft row = goodRow();
        vm.typing(row, CharacteristicField.LSL, "12.1");
        assertEquals("row 1 (D1): Nominal 12.00 lies outside the limits", vm.typingProblemProperty().get());
        assertEquals("11.95", row.text(CharacteristicField.LSL), "nothing is committed while typing");
        vm.typing(row, CharacteristicField.LSL, "11.96");
        assertEquals("", vm.typingProblemProperty().get());
        vm.typing(row, CharacteristicField.ID, "");
        assertEquals("row 1 (?): give it an id", vm.typingProblemProperty().get());
        vm.typingDone();
        assertEquals("", vm.typingProblemProperty().get());
    }

    @Test
    void aPastedBlockAddsRowsLeavesOutExtraColumnsAndUndoesAsOne() {
        goodRow();
        // at (row 1, the last column but one): two columns fit (gauge, resolution), the third is left out;
        // two rows added
        CharacteristicField[] all = CharacteristicField.values();
        CharacteristicField second = all[all.length - 2];
        CharacteristicField last = all[all.length - 1];
        int pasted = vm.paste(0, second.ordinal(), "A\tB\textra\r\n\tD\nE\t\n");
        assertEquals(6, pasted);
        assertEquals(3, draft.characteristics().size());
        assertEquals("A", draft.characteristics().get(0).text(second));
        assertEquals("B", draft.characteristics().get(0).text(last));
        assertEquals("D", draft.characteristics().get(1).text(last));
        assertEquals("E", draft.characteristics().get(2).text(second));
        assertEquals("1.8", draft.characteristics().get(0).text(CharacteristicField.EXPECTED), "untouched");
        assertTrue(vm.undo());
        assertEquals(1, draft.characteristics().size(), "the added rows go with the undo");
        assertEquals("", draft.characteristics().get(0).text(second));
        assertEquals("", draft.characteristics().get(0).text(last));
        assertFalse(vm.undo(), "nothing more to undo");
    }

    @Test
    void aCellSetTwiceUndoesStepByStep() {
        goodRow();
        vm.setCell(0, CharacteristicField.NAME, "Bore A");
        vm.setCell(0, CharacteristicField.NAME, "Bore B");
        vm.setCell(0, CharacteristicField.NAME, "Bore B"); // no change, no undo step
        assertTrue(vm.undo());
        assertEquals("Bore A", draft.characteristics().get(0).text(CharacteristicField.NAME));
        assertTrue(vm.undo());
        assertEquals("Bore", draft.characteristics().get(0).text(CharacteristicField.NAME));
        assertFalse(vm.undo());
    }
}
