package dev.proofrun.app.shell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.app.session.Session;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Back / Next, what is missing, autosave and the close question, without a window. */
class ShellViewModelTest {

    @TempDir
    Path home;

    private static final class FakeStep extends StepViewModel {
        final StringProperty lack = new SimpleStringProperty("");

        FakeStep(String lack) {
            super("step", "hint");
            this.lack.set(lack);
            bindMissing(this.lack);
        }
    }

    private Session session() {
        return new Session(new AppHome(home, home.resolve("plans")));
    }

    @Test
    void nextWaitsForTheStepAndSaysWhatIsMissing() {
        FakeStep a = new FakeStep("name the part");
        FakeStep b = new FakeStep("");
        ShellViewModel vm = new ShellViewModel(session(), List.of(a, b));
        assertFalse(vm.canGoForwardBinding().get());
        assertFalse(vm.canGoBackBinding().get());
        assertEquals("Before going on: name the part", vm.missingBinding().get());
        assertFalse(vm.next());
        a.lack.set("");
        assertTrue(vm.canGoForwardBinding().get());
        assertEquals("", vm.missingBinding().get());
        assertTrue(vm.next());
        assertEquals(1, vm.currentProperty().get());
        assertFalse(vm.canGoForwardBinding().get(), "no Next on the last step");
        assertTrue(vm.back());
        assertEquals(0, vm.currentProperty().get());
    }

    @Test
    void backAlwaysWorksEvenWhenTheCurrentStepIsIncomplete() {
        FakeStep a = new FakeStep("");
        FakeStep b = new FakeStep("something");
        ShellViewModel vm = new ShellViewModel(session(), List.of(a, b));
        vm.next();
        assertTrue(vm.canGoBackBinding().get());
        assertTrue(vm.back());
    }

    @Test
    void theRailSkipsOnlyOverCompleteSteps() {
        FakeStep a = new FakeStep("");
        FakeStep b = new FakeStep("x");
        FakeStep c = new FakeStep("");
        ShellViewModel vm = new ShellViewModel(session(), List.of(a, b, c));
        assertTrue(vm.canGoTo(1));
        assertFalse(vm.canGoTo(2));
        assertFalse(vm.goTo(2));
        b.lack.set("");
        assertTrue(vm.goTo(2));
        b.lack.set("x");
        assertTrue(vm.goTo(0), "steps behind stay reachable");
    }

    @Test
    void closingWithoutChangesAsksNothing() {
        ShellViewModel vm = new ShellViewModel(session(), List.of(new FakeStep("")));
        assertFalse(vm.closeNeedsAnswer());
        assertTrue(vm.close(CloseChoice.STAY), "nothing to lose, so the window closes");
    }

    @Test
    void closingWithChangesAsksAndNoAnswerLosesTheEdit() {
        Session s = session();
        ShellViewModel vm = new ShellViewModel(s, List.of(new FakeStep("")));
        s.draft().field(DraftField.PART_NAME).set("Pump housing");
        assertTrue(vm.closeNeedsAnswer());
        assertFalse(vm.close(CloseChoice.STAY));
        Path side = s.drafts().sideFile(null);
        assertTrue(Files.exists(side), "the draft is written before anything else");
        assertTrue(vm.close(CloseChoice.KEEP_DRAFT));
        Session reopened = session();
        assertEquals("Pump housing", reopened.drafts().newerDraft(null).orElseThrow().fields().get("PART_NAME"));
    }

    @Test
    void saveClosesOnlyWhenTheSaveWorked() {
        Session s = session();
        ShellViewModel vm = new ShellViewModel(s, List.of(new FakeStep("")));
        s.draft().field(DraftField.PART_NAME).set("Pump housing");
        vm.setSaver(() -> false);
        assertFalse(vm.close(CloseChoice.SAVE));
        vm.setSaver(() -> true);
        assertTrue(vm.close(CloseChoice.SAVE));
    }
}
