package dev.proofrun.app.timing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.design.Design;
import dev.proofrun.schedule.Slot;
import java.util.List;
import java.util.Optional;
import javafx.beans.property.SimpleObjectProperty;
import org.junit.jupiter.api.Test;

/** Calendar entry, inline problems, and the schedule from the core's scheduler. */
class TimingViewModelTest {

    private final StudyDraft draft = new StudyDraft();
    private final SimpleObjectProperty<Optional<Design>> design = new SimpleObjectProperty<>(Optional.of(Design.of(5, 25)));
    private final TimingViewModel vm = new TimingViewModel(draft, design, dev.proofrun.app.session.Background.inline());

    private void fill() {
        draft.field(DraftField.START).set("2027-03-01 06:00");
        draft.field(DraftField.SPAN_KIND).set("days");
        draft.field(DraftField.SPAN_COUNT).set("3");
        draft.field(DraftField.SHIFTS).set("early 06:00-14:00, late 14:00-22:00");
        draft.field(DraftField.RATE).set("60/h");
        draft.field(DraftField.SPACING).set("random");
    }

    @Test
    void aCompleteCalendarGivesTheCoresScheduleAndSentence() {
        fill();
        assertTrue(vm.completeBinding().get(), vm.missingProperty().get());
        assertEquals(25, vm.schedule().orElseThrow().slots().size());
        assertEquals(vm.schedule().orElseThrow().summary(), vm.sentence());
        assertTrue(vm.sentence().startsWith("one subgroup of 5"), vm.sentence());
    }

    @Test
    void eachFieldSaysWhatIsWrongWithIt() {
        fill();
        draft.field(DraftField.SHIFTS).set("early 06:00 to 14:00");
        assertEquals("'early 06:00 to 14:00' is not a shift such as early 06:00-14:00", vm.problem(DraftField.SHIFTS).get());
        assertFalse(vm.completeBinding().get());
        draft.field(DraftField.START).set("1 March");
        assertEquals("'1 March' is not a start such as 2027-03-24 06:00", vm.problem(DraftField.START).get());
        draft.field(DraftField.ZONE).set("Mars/Olympus");
        assertEquals("'Mars/Olympus' is not a time zone such as Europe/Berlin", vm.problem(DraftField.ZONE).get());
        draft.field(DraftField.WORKING_DAYS).set("Mon-Fry");
        assertEquals("'Mon-Fry' is not a day such as Mon or Mon-Fri", vm.problem(DraftField.WORKING_DAYS).get());
    }

    @Test
    void anotherSeedMovesTheSlotsAndEvenSpacingIgnoresIt() {
        fill();
        List<Slot> before = vm.schedule().orElseThrow().slots();
        vm.nextSeed();
        List<Slot> after = vm.schedule().orElseThrow().slots();
        assertNotEquals(before, after);
        draft.field(DraftField.SPACING).set("even");
        List<Slot> even = vm.schedule().orElseThrow().slots();
        vm.nextSeed();
        assertEquals(even, vm.schedule().orElseThrow().slots());
    }

    @Test
    void anEmptyStartSaysWhatToEnterNotThatNothingIsNoStart() {
        fill();
        draft.field(DraftField.START).set("  ");
        assertEquals("enter a start such as 2027-03-24 06:00", vm.problem(DraftField.START).get());
    }

    @Test
    void aNewDraftTakesTheCommandLinesZoneAndSpacing() throws Exception {
        StudyDraft fresh = new StudyDraft();
        assertEquals(java.time.ZoneId.systemDefault().getId(), fresh.text(DraftField.ZONE));
        picocli.CommandLine.Model.OptionSpec spacing = dev.proofrun.cli.ProofrunCommand.commandLine()
                .getSubcommands().get("plan").getSubcommands().get("new").getCommandSpec().findOption("--spacing");
        assertEquals(spacing.defaultValue(), fresh.text(DraftField.SPACING));
        assertEquals("even", fresh.text(DraftField.SPACING));
    }

    @Test
    void withoutADesignTheStepWaits() {
        fill();
        design.set(Optional.empty());
        assertEquals("choose a design first", vm.missingProperty().get());
    }
}
