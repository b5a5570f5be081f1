package dev.proofrun.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.parallel.ResourceLock;
import org.junit.jupiter.api.parallel.Resources;

/** The user's folder is set in one place, and plans default into it, never into the working folder. */
@ResourceLock(Resources.SYSTEM_PROPERTIES) // it sets proofrun.home for a moment; test classes run in parallel
class AppHomeTest {

    @Test
    void plansLiveInTheUsersFolderWhichTheSystemPropertyMoves() throws Exception {
        Path dir = Files.createTempDirectory("proofrun-home");
        String was = System.getProperty("proofrun.home");
        System.setProperty("proofrun.home", dir.toString());
        try {
            AppHome home = AppHome.standard();
            assertEquals(dir.toAbsolutePath(), home.dir());
            assertEquals(dir.toAbsolutePath().resolve("plans"), home.plansFolder());
            Session session = new Session(home);
            assertEquals(home.plansFolder().resolve("demo-valve-body.json"), session.demoFile(),
                    "the bundled demo is a copy in the user's folder");
            assertEquals(home.plansFolder().resolve("demo-valve-body.draft.json"),
                    home.draftFor(session.demoFile()));
        } finally {
            if (was == null) {
                System.clearProperty("proofrun.home");
            } else {
                System.setProperty("proofrun.home", was);
            }
        }
    }
}
