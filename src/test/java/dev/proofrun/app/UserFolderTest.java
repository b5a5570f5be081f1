package dev.proofrun.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.AppHome;
import dev.proofrun.app.session.DraftField;
import dev.proofrun.plan.PlanFiles;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The wizard keeps its work in the user's folder: the demo opens as a copy there, drafts and issued
 * revisions go there, and "Save as…" writes where the user chose; nothing lands in the working folder
 * (the checkout, with its tracked demo plan) unless chosen.
 */
@UsesToolkit
@ExtendWith(ApplicationExtension.class)
class UserFolderTest {

    private static final Path WORKING = Path.of("").toAbsolutePath();
    private static final Path TRACKED_DEMO = WORKING.resolve("plans").resolve("demo-valve-body.json");

    private WizardApp app;
    private Path home;
    private Map<String, String> before;
    private byte[] trackedDemo;

    @Start
    void start(Stage stage) throws Exception {
        before = workingFolder();
        trackedDemo = Files.exists(TRACKED_DEMO) ? Files.readAllBytes(TRACKED_DEMO) : null;
        home = Files.createTempDirectory("proofrun-user").toAbsolutePath();
        app = new WizardApp();
        app.start(stage, new AppHome(home, home.resolve("plans")));
    }

    /** Name, size and time of every file in the working folder and its plans/ (target/ changes on its own). */
    private static Map<String, String> workingFolder() throws IOException {
        Map<String, String> out = new TreeMap<>();
        for (Path dir : List.of(WORKING, WORKING.resolve("plans"))) {
            if (!Files.isDirectory(dir)) {
                continue;
            }
            try (Stream<Path> files = Files.list(dir)) {
                for (Path f : files.filter(Files::isRegularFile).toList()) {
                    out.put(WORKING.relativize(f).toString(), Files.size(f) + " " + Files.getLastModifiedTime(f));
                }
            }
        }
        return out;
    }

    private static <T> T fx(Callable<T> read) throws Exception {
        return WaitForAsyncUtils.asyncFx(read).get(Settle.TIMEOUT_S, TimeUnit.SECONDS);
    }

    @Test
    void nothingIsWrittenIntoTheWorkingFolderUnlessChosen(FxRobot robot) throws Exception {
        Settle.onStep(app, 1);
        Path demo = fx(() -> app.wizard().session().draft().planFileProperty().get());
        assertEquals(home.resolve("plans").resolve("demo-valve-body.json"), demo, "the demo opens as a copy");
        String shown = fx(() -> robot.lookup("#work-folder").queryAs(Label.class).getText());
        assertTrue(shown.contains(home.toString()), "the window names the user's folder: " + shown);

        // an edit, autosaved, then issued as a new revision: both beside the copy
        robot.interact(() -> {
            app.wizard().session().draft().field(DraftField.PART_NAME).set("Valve body, second casting");
            app.wizard().shell().autosave();
        });
        assertTrue(Files.exists(home.resolve("plans").resolve("demo-valve-body.draft.json")));
        robot.interact(() -> app.wizard().shell().goTo(5));
        Settle.onStep(app, 5);
        List<Path> asked = new ArrayList<>();
        robot.interact(() -> app.wizard().session().setPlanFileChooser(s -> {
            asked.add(s);
            return Optional.empty();
        }));
        robot.interact(() -> assertTrue(app.wizard().handout().issue()));
        Settle.onStep(app, 5);
        assertEquals(List.of(), asked, "a plan with a file is issued into it without asking");
        assertEquals("Valve body, second casting", PlanFiles.read(demo).part().name());
        assertTrue(robot.lookup("#save-as").queryButton().isVisible());

        // Save as…, answered "nothing": nothing written
        robot.interact(() -> assertFalse(app.wizard().handout().saveAs()));
        assertEquals(List.of(home.resolve("plans").resolve("PR-2027-0311.json")), asked,
                "Save as offers the plan's folder");
        assertEquals("Not saved: no file was chosen.", fx(() -> app.wizard().handout().messageProperty().get()));

        // Save as… into a chosen folder: the plan is there and the draft belongs to it
        Path chosen = Files.createTempDirectory("proofrun-chosen").resolve("valve-copy.json");
        robot.interact(() -> app.wizard().session().setPlanFileChooser(s -> Optional.of(chosen)));
        robot.interact(() -> assertTrue(app.wizard().handout().saveAs()));
        Settle.onStep(app, 5);
        assertEquals(chosen, fx(() -> app.wizard().session().draft().planFileProperty().get()));
        assertEquals(PlanFiles.read(demo), PlanFiles.read(chosen), "the issued plan, saved as a copy");

        assertEquals(before, workingFolder(), "files of the working folder and its plans/");
        if (trackedDemo != null) {
            assertArrayEquals(trackedDemo, Files.readAllBytes(TRACKED_DEMO), "the tracked demo plan");
        }
    }
}
