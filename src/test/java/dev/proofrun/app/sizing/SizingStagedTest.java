package dev.proofrun.app.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.goal.GoalViewModel;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.DraftSnapshot;
import dev.proofrun.app.session.StudyDraft;
import dev.proofrun.cli.ProofrunCommand;
import dev.proofrun.design.Stages;
import dev.proofrun.plan.PlanFiles;
import dev.proofrun.plan.StudyPlan;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.function.Consumer;
import javafx.beans.property.SimpleObjectProperty;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The looks chosen on the Sample-size step are the command line's ({@code plan new --stages}) for the same
 * inputs, are computed once per distinct request (an answer that changes nothing the request rests on starts no
 * new work), and come back with a reopened draft.
 */
class SizingStagedTest {

    /** Holds the looks' jobs until {@link #runAll()}, counting submissions and cancellations. */
    private static final class Held implements Background {
        private final List<Runnable> jobs = new ArrayList<>();
        int submitted;
        int cancelled;

        @Override
        public <T> Job submit(Callable<T> work, Consumer<T> done, Consumer<Throwable> failed) {
            submitted++;
            boolean[] off = {false};
            jobs.add(() -> {
                if (!off[0]) {
                    Background.inline().submit(work, done, failed);
                }
            });
            return () -> {
                cancelled++;
                off[0] = true;
            };
        }

        void runAll() {
            while (!jobs.isEmpty()) {
                List<Runnable> now = new ArrayList<>(jobs);
                jobs.clear();
                now.forEach(Runnable::run);
            }
        }
    }

    @TempDir
    Path home;

    private final StudyDraft draft = new StudyDraft();
    private final GoalViewModel goal = new GoalViewModel(draft, new SimpleObjectProperty<StudyPlan>());
    private final Held looks = new Held();
    private final SizingViewModel vm = new SizingViewModel(draft, goal, Background.inline(), looks);

    private static CharacteristicDraft bore() {
        return CharacteristicDraft.of(Map.of("id", "D1", "unit", "mm", "lsl", "9.9", "usl", "10.1", "expected", "1.67"));
    }

    @Test
    void theLooksAreThoseOfPlanNewStagesForTheSameInputs() {
        draft.characteristics().add(bore());
        vm.staged().choice().chooseLooks(1); // two looks
        vm.staged().choice().chooseSpending(1); // evenly: Pocock
        assertTrue(vm.design().isEmpty(), "no design until the looks are computed");
        assertFalse(vm.completeBinding().get());
        looks.runAll();
        assertTrue(vm.completeBinding().get(), vm.missingProperty().get());

        Path file = home.resolve("staged.json");
        StringWriter out = new StringWriter();
        // the same characteristic, requirement (Cpk 1.33 at 95 %), expectation and power (0.90) as the draft's
        assertEquals(0, ProofrunCommand.run(new PrintWriter(out, true), new PrintWriter(out, true), "plan", "new",
                "--out", file.toString(), "--id", "PR-2027-0101", "--part", "valve body", "--characteristic", "D1",
                "--unit", "mm", "--lsl", "9.9", "--usl", "10.1", "--target", "1.33", "--expected", "1.67",
                "--stages", "2", "--spending", "pocock", "--start", "2027-04-05T06:00", "--span-days", "5",
                "--rate", "60", "--zone", "Europe/Berlin"), out.toString());
        StudyPlan plan = PlanFiles.read(file);
        assertEquals(plan.design(), vm.design().orElseThrow(), "K and n as plan new chooses them");
        assertEquals(plan.stages(), vm.plannedStages(), "the same looks, confidences and futility boundaries");
        assertTrue(vm.staged().text().get().startsWith("Look 1: "), vm.staged().text().get());
        assertTrue(vm.staged().text().get().contains("Single stage"), vm.staged().text().get());
        assertEquals(4, vm.staged().readings().get().size(), "staged, single stage, c0, c1");
    }

    @Test
    void anIdenticalRequestIsDroppedBeforeAnythingIsCancelledAndAnAnswerStartsNoNewWork() {
        draft.characteristics().add(bore());
        vm.staged().choice().chooseLooks(1);
        assertEquals(1, looks.submitted);
        // the same request again: other text for the same power, an edit the looks do not rest on
        draft.field(DraftField.POWER).set("0.9");
        draft.field(DraftField.PART_NAME).set("valve body");
        vm.entered();
        assertEquals(1, looks.submitted, "nothing new asked");
        assertEquals(0, looks.cancelled, "the job under way stands");
        looks.runAll();
        // the answer sets the plan's design to the looks' K, which the other steps follow; the request rests on
        // the single-stage design only, so nothing is asked again
        assertTrue(vm.design().isPresent());
        assertEquals(vm.plannedStages().orElseThrow().last().subgroups(), vm.design().orElseThrow().subgroups());
        vm.entered();
        assertEquals(1, looks.submitted, "an answer starts no new work");
        assertEquals(0, looks.cancelled);

        vm.staged().choice().chooseLooks(2); // three looks: a new request, the finished job needs no cancelling
        assertEquals(2, looks.submitted);
        vm.staged().choice().chooseSpending(1); // and another before it finishes: that one is cancelled
        assertEquals(3, looks.submitted);
        assertEquals(1, looks.cancelled);
        looks.runAll();
        assertEquals(3, vm.plannedStages().orElseThrow().count());
        assertEquals(3, looks.submitted);
    }

    @Test
    void everySpendingIsOfferedInWordsAndKeptAsItsToken() {
        LooksChoice choice = vm.staged().choice();
        assertEquals(dev.proofrun.design.Spending.values().length, choice.spendingChoices().size());
        assertEquals(dev.proofrun.design.Stages.MOST, choice.looksChoices().size(), "1 to 4 looks");
        for (dev.proofrun.design.Spending f : dev.proofrun.design.Spending.values()) {
            choice.chooseSpending(f.ordinal());
            assertEquals(f.token(), draft.text(DraftField.SPENDING));
            assertEquals(f.ordinal(), choice.spendingIndex().get());
        }
        draft.field(DraftField.STAGES).set("7"); // typed into a saved draft by hand: one look
        assertEquals(0, choice.looksIndex().get());
        assertEquals(0, looks.submitted);
    }

    @Test
    void oneLookIsTheSingleStageDesignWithoutWork() {
        draft.characteristics().add(bore());
        assertEquals(0, looks.submitted);
        assertEquals(Optional.empty(), vm.plannedStages());
        assertEquals(vm.singleStageDesign(), vm.design());
        assertEquals("", vm.staged().text().get());
    }

    @Test
    void aReopenedDraftRestoresTheChoiceAndItsLooks() {
        draft.characteristics().add(bore());
        vm.staged().choice().chooseLooks(1);
        looks.runAll();
        Optional<Stages> planned = vm.plannedStages();
        assertTrue(planned.isPresent());
        DraftSnapshot saved = draft.snapshot();

        StudyDraft again = new StudyDraft();
        GoalViewModel goalAgain = new GoalViewModel(again, new SimpleObjectProperty<StudyPlan>());
        SizingViewModel reopened = new SizingViewModel(again, goalAgain, Background.inline());
        again.restore(saved, false);
        assertEquals("2", again.text(DraftField.STAGES));
        assertEquals(1, reopened.staged().choice().looksIndex().get());
        assertEquals(dev.proofrun.design.Spending.byDefault().ordinal(), reopened.staged().choice().spendingIndex().get());
        assertEquals(planned, reopened.plannedStages());
        assertEquals(vm.design(), reopened.design());
    }

    @Test
    void aSkewedCharacteristicIsRefusedInWords() {
        CharacteristicDraft row = bore();
        row.cell(dev.proofrun.app.session.CharacteristicField.SHAPE).set("lognormal");
        draft.characteristics().add(row);
        vm.staged().choice().chooseLooks(1);
        assertEquals(0, looks.submitted);
        assertTrue(vm.missingProperty().get().contains("D1 is planned lognormal"), vm.missingProperty().get());
    }
}
