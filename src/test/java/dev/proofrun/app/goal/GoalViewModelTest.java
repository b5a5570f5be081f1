package dev.proofrun.app.goal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.ExpectationSource;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.design.Expectation;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.stats.IndexKind;
import java.util.Map;
import javafx.beans.property.SimpleObjectProperty;
import org.junit.jupiter.api.Test;

/** The goal step's validation and the expectation it hands to the designer. */
class GoalViewModelTest {

    private final StudyDraft draft = new StudyDraft();
    private final GoalViewModel vm = new GoalViewModel(draft, new SimpleObjectProperty<StudyPlan>());

    private CharacteristicDraft bore() {
        CharacteristicDraft row = CharacteristicDraft.of(Map.of("id", "D1", "unit", "mm", "lsl", "9.9", "usl", "10.1",
                "expected", "1.8"));
        draft.characteristics().add(row);
        return row;
    }

    @Test
    void aTypedValueIsTheExpectation() {
        bore();
        assertTrue(vm.completeBinding().get(), vm.missingProperty().get());
        assertEquals(1.8, vm.expectationBinding().get().orElseThrow().index(), 0.0);
        assertEquals(1.33, vm.requirementBinding().get().orElseThrow().minimum(), 0.0);
    }

    @Test
    void anExpectationNotAboveTheMinimumIsRefusedInline() {
        bore().cell(CharacteristicField.EXPECTED).set("1.2");
        assertFalse(vm.completeBinding().get());
        assertEquals("the expected Cpk (1.200) must be above the required 1.330, or no study can show it",
                vm.missingProperty().get());
    }

    @Test
    void aConfidenceOutOfRangeIsNamed() {
        bore();
        draft.field(DraftField.CONFIDENCE).set("95");
        assertEquals("the confidence must be between 0.5 and 0.9999 (e.g. 0.95)", vm.missingProperty().get());
    }

    @Test
    void cpNeedsBothLimits() {
        draft.characteristics().add(CharacteristicDraft.of(Map.of("id", "R4", "unit", "µm", "usl", "0.8", "expected", "2")));
        vm.indexProperty().set(IndexKind.CP);
        assertEquals("Cp needs both limits, and R4 has only one", vm.missingProperty().get());
        assertEquals("cp", draft.text(DraftField.INDEX), "the choice is kept in the draft");
    }

    @Test
    void meanAndSigmaGoThroughTheDesignCore() {
        bore();
        vm.sourceProperty().set(ExpectationSource.MEAN_SIGMA);
        assertEquals("give the expected mean and a sigma above zero", vm.missingProperty().get());
        draft.field(DraftField.EXPECTED_MEAN).set("10.02");
        draft.field(DraftField.EXPECTED_SIGMA).set("0.015");
        Expectation e = vm.expectationBinding().get().orElseThrow();
        // By definition: Cpk = min(10.1 - 10.02, 10.02 - 9.9) / (3 * 0.015) = 0.08 / 0.045; Cp = 0.2 / 0.09.
        assertEquals(0.08 / 0.045, e.index(), 1e-12);
        assertEquals(0.2 / 0.09, e.potential().getAsDouble(), 1e-12);
        assertTrue(vm.completeBinding().get());
    }

    @Test
    void pilotReadingsGiveTheCoresEstimateAndBound(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
        bore();
        vm.sourceProperty().set(ExpectationSource.PILOT);
        assertEquals("load the pilot readings", vm.missingProperty().get());
        java.nio.file.Path csv = dir.resolve("pilot.csv");
        // invented demo readings, five subgroups of four
        java.nio.file.Files.writeString(csv, "x1,x2,x3,x4\n10.01,9.99,10.00,10.02\n9.98,10.00,10.01,9.99\n"
                + "10.02,10.01,9.99,10.00\n10.00,9.98,10.01,10.02\n9.99,10.00,10.00,10.01\n");
        assertTrue(vm.loadPilot(csv), vm.pilotMessageProperty().get());
        assertFalse(vm.pilotLoadingProperty().get());
        dev.proofrun.capability.CapabilityResult core = dev.proofrun.capability.CapabilityAnalysis.of(
                dev.proofrun.readings.ReadingsCsv.read(csv, java.util.OptionalInt.empty()).subgroups(),
                dev.proofrun.stats.SpecLimits.twoSided(9.9, 10.1), null, null, 0.95, dev.proofrun.stats.BoundMethod.EXACT);
        assertEquals(core.indices().cpk().getAsDouble(), vm.expectationBinding().get().orElseThrow().index(), 0.0,
                "the estimate is the core's, not recomputed");
        assertTrue(vm.pilotMessageProperty().get().startsWith("20 pilot readings in 5 subgroups: Cpk estimate "),
                vm.pilotMessageProperty().get());
    }

    @Test
    void aBadPilotFileIsOneLine(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws Exception {
        bore();
        java.nio.file.Path csv = dir.resolve("pilot.csv");
        java.nio.file.Files.writeString(csv, "value\n10.01\nabc\n");
        assertTrue(vm.loadPilot(csv), "started (and, inline, already done)");
        assertFalse(vm.pilotLoadingProperty().get());
        assertEquals(null, vm.pilotProperty().get());
        assertTrue(vm.pilotMessageProperty().get().startsWith("the pilot readings could not be used: ")
                && vm.pilotMessageProperty().get().contains("pilot.csv, row 3, column value"),
                vm.pilotMessageProperty().get());
    }

    /** A worker that holds its jobs until told to run them, as the FX worker does until its thread is free. */
    private static final class HeldWorker implements dev.proofrun.app.session.Background {
        private final java.util.List<Runnable> held = new java.util.ArrayList<>();

        @Override
        public <T> Job submit(java.util.concurrent.Callable<T> work, java.util.function.Consumer<T> done,
                java.util.function.Consumer<Throwable> failed) {
            held.add(() -> {
                try {
                    done.accept(work.call());
                } catch (Exception e) {
                    failed.accept(e);
                }
            });
            return () -> { };
        }

        void runAll() {
            held.forEach(Runnable::run);
            held.clear();
        }
    }

    @Test
    void thePilotFileIsReadOnTheWorkerNotWhereLoadIsAskedFor(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        HeldWorker worker = new HeldWorker();
        GoalViewModel held = new GoalViewModel(draft, new SimpleObjectProperty<StudyPlan>(), worker);
        bore();
        held.sourceProperty().set(ExpectationSource.PILOT);
        java.nio.file.Path csv = dir.resolve("pilot.csv");
        // invented demo readings, three subgroups of four
        java.nio.file.Files.writeString(csv, "x1,x2,x3,x4\n10.01,9.99,10.00,10.02\n9.98,10.00,10.01,9.99\n"
                + "10.02,10.01,9.99,10.00\n");
        assertTrue(held.loadPilot(csv));
        assertTrue(held.pilotLoadingProperty().get(), "asked for, not yet read");
        assertEquals(null, held.pilotProperty().get());
        assertEquals("Reading pilot.csv …", held.pilotMessageProperty().get());
        worker.runAll();
        assertFalse(held.pilotLoadingProperty().get());
        assertTrue(held.expectationBinding().get().isPresent(), held.pilotMessageProperty().get());
    }

    @Test
    void theViewSeesTheIndexBySymbolAndTheExpectationAsASentence() {
        bore();
        assertEquals("Cpk", vm.indexSymbolProperty().get());
        vm.indexSymbolProperty().set("Ppk");
        assertEquals(IndexKind.PPK, vm.indexProperty().get());
        vm.indexProperty().set(IndexKind.CPK);
        assertEquals("Cpk", vm.indexSymbolProperty().get());
        assertEquals("Designing for a true Cpk of 1.800 (centred; an off-centre Cp is typed in the Part table's Expected Cp column)",
                vm.expectationText().get());
        assertTrue(vm.tipFor("Cpk").length() > 10, vm.tipFor("Cpk"));
    }

    @Test
    void aDecimalCommaIsTakenWhereTheWindowSaysSoAndOtherwiseSaidToBeTheOtherMark() {
        bore();
        try {
            draft.field(DraftField.MINIMUM).set("1,33");
            assertEquals("'1,33' has a decimal comma, and the decimal mark is set to a point (1.33): retype it, "
                    + "or choose the comma on the Open step", vm.missingProperty().get());
            assertTrue(vm.requirementBinding().get().isEmpty());
            dev.proofrun.app.session.FieldNumbers.decimalMarkProperty().set(dev.proofrun.text.DecimalMark.COMMA);
            assertEquals(1.33, vm.requirementBinding().get().orElseThrow().minimum(), 0, "checked again when the mark changes");
            assertEquals("", vm.missingProperty().get());
        } finally {
            dev.proofrun.app.session.FieldNumbers.decimalMarkProperty().set(dev.proofrun.text.DecimalMark.POINT);
        }
    }
}
