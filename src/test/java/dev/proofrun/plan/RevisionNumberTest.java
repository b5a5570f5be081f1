package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.text.UserException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The revision as people say it (1, 2, 3…) beside the fingerprint: a plan's first issue is 1, each issued change
 * one more; a file without the number (every plan written before it) is 1 and keeps its bytes and fingerprint;
 * the number is covered by the fingerprint, so it cannot be changed by hand unnoticed.
 */
class RevisionNumberTest {

    @TempDir
    Path dir;

    @Test
    void aFileWithoutTheNumberIsRevisionOneAndKeepsItsBytes() throws Exception {
        StudyPlan demo = DemoPlan.create();
        assertEquals(1, demo.revisionNumber());
        String text = new String(PlanFiles.toBytes(demo), java.nio.charset.StandardCharsets.UTF_8);
        assertFalse(text.contains("revisionNumber"), "1 is left out of the file");
        Path p = dir.resolve("plan.json");
        Files.writeString(p, text);
        StudyPlan read = PlanFiles.read(p);
        assertEquals(1, read.revisionNumber());
        assertEquals(demo.revision(), read.revision(), "the fingerprint of a plan written before the number holds");
        assertEquals("revision 1 (" + demo.revision().orElseThrow() + ")", read.revisionWords());
    }

    @Test
    void eachIssuedChangeIsOneMoreAndTheFileSaysSo() throws Exception {
        StudyPlan first = DemoPlan.create();
        Path p = dir.resolve("plan.json");
        PlanFiles.write(p, first);
        Files.writeString(p, Files.readString(p).replace("\"usl\": 22.013", "\"usl\": 22.015"));
        StudyPlan second = PlanFiles.issue(p);
        assertEquals(2, second.revisionNumber());
        assertEquals(first.revision(), second.supersedes());
        String text = Files.readString(p);
        assertTrue(text.contains("\"revisionNumber\": 2,"), text.substring(0, 200));
        assertEquals(second, PlanFiles.read(p));
        assertArrayEquals(Files.readAllBytes(p), PlanFiles.toBytes(PlanFiles.read(p)), "round trip byte-identical");

        StudyPlan third = PlanFiles.issue(second.reopen());
        assertEquals(3, third.revisionNumber());
        assertEquals("DRAFT of revision 3", second.reopen().revisionWords());
        assertEquals(second.revision(), third.supersedes());

        // the number is in the fingerprinted content: the same content numbered otherwise is another revision
        Files.writeString(p, text.replace("\"revisionNumber\": 2,", "\"revisionNumber\": 5,"));
        UserException e = assertThrows(UserException.class, () -> PlanFiles.read(p));
        assertEquals(PlanMessage.EDITED_AFTER_ISSUE, e.key());
    }

    @Test
    void aNumberThatIsNoRevisionNumberIsRefusedInOneLine() throws Exception {
        String demo = new String(PlanFiles.toBytes(DemoPlan.draft()), java.nio.charset.StandardCharsets.UTF_8);
        for (String bad : new String[] {"1", "0", "-2"}) {
            Path p = dir.resolve("bad" + bad + ".json");
            Files.writeString(p, demo.replace("\"state\": \"draft\",", "\"state\": \"draft\",\n  \"revisionNumber\": " + bad + ","));
            UserException e = assertThrows(UserException.class, () -> PlanFiles.read(p), bad);
            assertEquals(PlanMessage.REVISION_NUMBER_RANGE, e.key(), e.getMessage());
            assertFalse(e.getMessage().contains("\n"), e.getMessage());
        }
        Path text = dir.resolve("text.json");
        Files.writeString(text, demo.replace("\"state\": \"draft\",", "\"state\": \"draft\",\n  \"revisionNumber\": \"two\","));
        assertThrows(UserException.class, () -> PlanFiles.read(text));
        assertNotEquals(0, Files.size(text), "the user's file is untouched");
        IllegalArgumentException zero = assertThrows(IllegalArgumentException.class, () -> withNumber(DemoPlan.draft(), 0));
        assertEquals("a revision number is 1 or more: 0", zero.getMessage());
    }

    private static StudyPlan withNumber(StudyPlan p, int n) {
        return new StudyPlan(p.id(), p.part(), p.people(), p.characteristics(), p.calendar(), p.span(), p.design(),
                p.spacing(), p.seed(), p.schedule(), p.state(), p.revision(), p.supersedes(), n);
    }
}
