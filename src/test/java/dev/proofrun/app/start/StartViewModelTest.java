package dev.proofrun.app.start;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.Background;
import dev.proofrun.app.session.HeldJobs;
import dev.proofrun.app.session.Session;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Opening plan files off the FX thread: the draft changes only when the reading is done, the latest wins. */
class StartViewModelTest {

    @TempDir
    Path tmp;

    @Test
    void theDraftChangesOnlyWhenTheFileIsRead() {
        Session session = new Session(new AppHome(tmp, tmp.resolve("plans")));
        HeldJobs held = new HeldJobs();
        StartViewModel vm = new StartViewModel(session, held);
        vm.openDemo();
        assertTrue(vm.openingProperty().get());
        assertFalse(vm.loadedProperty().get());
        assertTrue(session.base().isEmpty(), "nothing is on the desk while the file is read");
        held.job(0).end();
        assertFalse(vm.openingProperty().get());
        assertTrue(vm.loadedProperty().get());
        assertEquals("PR-2027-0311", session.base().orElseThrow().id());
        assertEquals(List.of(session.demoFile().toAbsolutePath().normalize()), vm.recent());
        assertTrue(vm.messageProperty().get().startsWith("Opened "), vm.messageProperty().get());
    }

    @Test
    void anEarlierRequestAnsweringLateIsDropped() throws Exception {
        Session session = new Session(new AppHome(tmp, tmp.resolve("plans")));
        Path demo = session.demoFile();
        Path other = tmp.resolve("plans").resolve("other.json");
        Files.copy(demo, other);
        HeldJobs held = new HeldJobs();
        StartViewModel vm = new StartViewModel(session, held);
        vm.open(demo);
        vm.open(other);
        held.job(1).end();
        held.job(0).end();
        assertEquals(other.toAbsolutePath().normalize(), session.draft().planFileProperty().get(),
                "the plan asked for last is on the desk");
        assertFalse(vm.openingProperty().get());
    }

    @Test
    void aNewPlanStartedWhileAFileIsReadWins() {
        Session session = new Session(new AppHome(tmp, tmp.resolve("plans")));
        HeldJobs held = new HeldJobs();
        StartViewModel vm = new StartViewModel(session, held);
        vm.openDemo();
        vm.newPlan();
        assertFalse(vm.openingProperty().get());
        held.job(0).end();
        assertTrue(session.base().isEmpty(), "the demo read late does not replace the new plan");
        assertTrue(vm.loadedProperty().get());
    }

    @Test
    void aFileThatIsNotAPlanIsOneLineAndNothingChanges() throws Exception {
        Session session = new Session(new AppHome(tmp, tmp.resolve("plans")));
        Path bad = Files.writeString(tmp.resolve("notes.json"), "{\"not\": \"a plan\"}");
        StartViewModel vm = new StartViewModel(session, Background.inline());
        vm.open(bad);
        assertFalse(vm.openingProperty().get());
        assertFalse(vm.loadedProperty().get());
        assertTrue(session.base().isEmpty());
        String m = vm.messageProperty().get();
        assertTrue(m.contains("notes.json") && !m.contains("\n") && !m.contains("Exception"), m);
    }

    @Test
    void theDecimalMarkIsChosenHereForEveryFieldAndKeptForTheNextStart() {
        AppHome home = new AppHome(tmp, tmp.resolve("plans"));
        try {
            StartViewModel vm = new StartViewModel(new Session(home), Background.inline());
            assertEquals("point  1.33", vm.markChoiceProperty().get(), "the command line's point to start with");
            vm.markChoiceProperty().set("comma  1,33");
            assertEquals(dev.proofrun.text.DecimalMark.COMMA, dev.proofrun.app.session.FieldNumbers.decimalMarkProperty().get());
            assertEquals(1.33, dev.proofrun.app.session.FieldNumbers.parse("1,33").getAsDouble(), 0);
            dev.proofrun.app.session.FieldNumbers.decimalMarkProperty().set(dev.proofrun.text.DecimalMark.POINT);
            StartViewModel next = new StartViewModel(new Session(home), Background.inline());
            assertEquals("comma  1,33", next.markChoiceProperty().get(), "kept in the user's folder");
        } finally {
            dev.proofrun.app.session.FieldNumbers.decimalMarkProperty().set(dev.proofrun.text.DecimalMark.POINT);
        }
    }
}
