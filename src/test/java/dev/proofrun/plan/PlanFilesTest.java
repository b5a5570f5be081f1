package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.proofrun.text.UserException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PlanFilesTest {

    @TempDir
    Path dir;

    private Path saved(StudyPlan plan) {
        Path p = dir.resolve("plan.json");
        PlanFiles.write(p, plan);
        return p;
    }

    private String demoText() {
        return new String(PlanFiles.toBytes(DemoPlan.create()), StandardCharsets.UTF_8);
    }

    private UserException refused(String text) throws Exception {
        Path p = dir.resolve("broken.json");
        Files.writeString(p, text);
        return assertThrows(UserException.class, () -> PlanFiles.read(p));
    }

    /** The demo's file with {@code from} replaced by {@code to}, refused as {@code key} with a message that holds {@code words}. */
    private UserException refused(String from, String to, PlanMessage key, String words) throws Exception {
        UserException e = refused(demoText().replace(from, to));
        assertEquals(key, e.key());
        assertTrue(e.getMessage().contains(words), e.getMessage());
        return e;
    }

    @Test
    void roundTripFileModelFileIsByteIdentical() throws Exception {
        for (StudyPlan plan : new StudyPlan[] {DemoPlan.draft(), DemoPlan.create()}) {
            Path p = saved(plan);
            byte[] first = Files.readAllBytes(p);
            StudyPlan back = PlanFiles.inspect(p).plan();
            assertEquals(plan, back);
            assertArrayEquals(first, PlanFiles.toBytes(back));
        }
    }

    @Test
    void issuingFreezesWithTheFingerprintOfTheContent() {
        StudyPlan draft = DemoPlan.draft();
        StudyPlan issued = PlanFiles.issue(draft);
        assertEquals(PlanState.ISSUED, issued.state());
        assertEquals(PlanFiles.fingerprint(draft), issued.revision().orElseThrow());
        assertEquals(PlanFiles.fingerprint(draft), PlanFiles.fingerprint(issued), "state and revision are not content");
        assertTrue(issued.revision().orElseThrow().matches("[0-9a-f]{12}"));
        assertEquals("PR-2027-0311@" + issued.revision().orElseThrow(), issued.reference());
        assertEquals("PR-2027-0311@draft", draft.reference());
        StudyPlan other = StudyPlan.draft("PR-2027-0312", draft.part(), draft.people(), draft.characteristics(),
                draft.calendar(), draft.span(), draft.design(), draft.spacing(), draft.seed());
        assertNotEquals(PlanFiles.fingerprint(draft), PlanFiles.fingerprint(other));
    }

    @Test
    void fingerprintIsSha256OfTheCanonicalForm() throws Exception {
        // independent recomputation with the JDK's digest, over the documented canonical bytes
        StudyPlan plan = DemoPlan.create();
        byte[] canonical = PlanFiles.canonical(plan);
        String text = new String(canonical, StandardCharsets.UTF_8);
        assertFalse(text.contains("\"state\"") || text.contains("\"revision\":\"" + plan.revision().orElseThrow()));
        assertFalse(text.contains("\n"));
        byte[] hash = java.security.MessageDigest.getInstance("SHA-256").digest(canonical);
        StringBuilder hex = new StringBuilder();
        for (int i = 0; i < 6; i++) {
            hex.append(String.format("%02x", hash[i]));
        }
        assertEquals(hex.toString(), plan.revision().orElseThrow());
    }

    @Test
    void anEditedIssuedPlanIsDetectedAndReissuedAsANewRevision() throws Exception {
        StudyPlan issued = DemoPlan.create();
        Path p = saved(issued);
        String text = Files.readString(p).replace("\"usl\": 22.013", "\"usl\": 22.015");
        Files.writeString(p, text);
        UserException e = assertThrows(UserException.class, () -> PlanFiles.read(p));
        assertEquals(PlanMessage.EDITED_AFTER_ISSUE, e.key());
        assertTrue(e.getMessage().contains(issued.revision().orElseThrow()), e.getMessage());
        assertEquals(PlanFiles.Integrity.CHANGED_AFTER_ISSUE, PlanFiles.inspect(p).integrity());

        StudyPlan next = PlanFiles.issue(p);
        assertNotEquals(issued.revision(), next.revision());
        assertEquals(issued.revision(), next.supersedes());
        assertEquals(PlanFiles.Integrity.INTACT, PlanFiles.inspect(p).integrity());
        assertEquals(text, Files.readString(dir.resolve("plan.json.bak")), "the file as found is kept");
        // issuing an intact plan again changes nothing
        byte[] before = Files.readAllBytes(p);
        assertEquals(next, PlanFiles.issue(p));
        assertArrayEquals(before, Files.readAllBytes(p));
    }

    @Test
    void anIssuedFileIsNeverOverwrittenByAnotherPlan() throws Exception {
        Path p = saved(DemoPlan.create());
        byte[] before = Files.readAllBytes(p);
        UserException e = assertThrows(UserException.class, () -> PlanFiles.write(p, DemoPlan.draft()));
        assertEquals(PlanMessage.ISSUED_FILE_PROTECTED, e.key());
        assertArrayEquals(before, Files.readAllBytes(p));
        // a reopened plan issued as the successor may replace it, the old one kept as .bak
        StudyPlan successor = PlanFiles.issue(DemoPlan.create().reopen());
        PlanFiles.write(p, successor);
        assertArrayEquals(before, Files.readAllBytes(dir.resolve("plan.json.bak")));
        Path notAPlan = dir.resolve("notes.json");
        Files.writeString(notAPlan, "{\"shopping\": [1, 2]}");
        assertEquals(PlanMessage.NOT_A_PLAN_FILE_TO_REPLACE,
                assertThrows(UserException.class, () -> PlanFiles.write(notAPlan, DemoPlan.draft())).key());
        assertEquals("{\"shopping\": [1, 2]}", Files.readString(notAPlan));
    }

    @Test
    void savingKeepsThePreviousVersionAndLeavesNoTemporaryFiles() throws Exception {
        Path p = saved(DemoPlan.draft());
        byte[] draft = Files.readAllBytes(p);
        PlanFiles.issue(p);
        assertArrayEquals(draft, Files.readAllBytes(dir.resolve("plan.json.bak")));
        try (var files = Files.list(dir)) {
            assertEquals(2, files.count(), "plan.json and plan.json.bak only");
        }
    }

    @Test
    void aNewPlanGetsOrdinaryPermissionsAndAReplacedOneKeepsItsOwn() throws Exception {
        assumeTrue(Files.getFileAttributeView(dir, PosixFileAttributeView.class) != null, "POSIX file system");
        Path plain = Files.createFile(dir.resolve("plain.txt"));
        Path p = saved(DemoPlan.draft());
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(p),
                "a new plan is shared like any new file (umask), not private to its owner");
        Set<PosixFilePermission> groupRead = PosixFilePermissions.fromString("rw-r-----");
        Files.setPosixFilePermissions(p, groupRead);
        PlanFiles.issue(p);
        assertEquals(groupRead, Files.getPosixFilePermissions(p), "replacing keeps the file's permissions");
    }

    @Test
    void truncatedFileIsRefusedWithThePath() throws Exception {
        String text = demoText();
        int cut = text.indexOf("\"lsl\": 21.987");
        UserException e = refused(text.substring(0, cut));
        assertEquals(PlanMessage.TRUNCATED, e.key());
        assertTrue(e.getMessage().contains("$.characteristics[0]"), e.getMessage());
        assertTrue(e.getMessage().startsWith(dir.resolve("broken.json").toString()), e.getMessage());
        assertEquals(PlanMessage.EMPTY_FILE, refused("").key());
    }

    @Test
    void handBrokenFilesAreRefusedWithThePath() throws Exception {
        String text = demoText();
        refused("\"usl\": 0.8", "\"usl\": \"zero point eight\"", PlanMessage.WRONG_TYPE, "$.characteristics[1].usl");
        refused("\"unit\": \"kN\"", "\"unit\": \"kN\", \"colour\": \"red\"", PlanMessage.UNKNOWN_FIELD,
                "$.characteristics[2].colour");
        UserException reversed = refused("\"lsl\": 21.987", "\"lsl\": 22.02", PlanMessage.BAD_VALUE, "$.characteristics[0]");
        assertTrue(reversed.getMessage().contains("LSL must be below USL"), reversed.getMessage());

        UserException zone = refused(text.replace("Europe/Berlin", "Europe/Atlantis"));
        assertTrue(zone.getMessage().contains("$.calendar.zone"), zone.getMessage());

        UserException time = refused(text.replace("\"start\": \"2027-03-24T07:53+01:00\"", "\"start\": \"yesterday\""));
        assertTrue(time.getMessage().contains("$.schedule.slots[0].start"), time.getMessage());

        refused("\"subgroups\": 25,", "", PlanMessage.MISSING, "$.design.subgroups");
        refused("\"days\": 3", "\"days\": 3,,", PlanMessage.NOT_JSON, "$.span");

        UserException typing = refused(text.replace("\"part\": {", "\"part\": {\"@class\": \"java.lang.ProcessBuilder\","));
        assertEquals(PlanMessage.UNKNOWN_FIELD, typing.key(), "no type information is taken from the file");
    }

    @Test
    void unknownVersionAndOtherFormatsAreRefused() throws Exception {
        String text = demoText();
        UserException v2 = refused("\"formatVersion\": 1", "\"formatVersion\": 2", PlanMessage.UNKNOWN_VERSION, "$.formatVersion");
        assertTrue(v2.getMessage().contains(" 2 "), v2.getMessage());
        assertEquals(PlanMessage.NOT_A_PLAN, refused(text.replace("proofrun-plan", "shopping-list")).key());
        assertEquals(PlanMessage.WRONG_TYPE, refused("[1, 2, 3]").key());
    }

    /**
     * A plan is read once, straight into the records, and only a file refused that way is read again as a tree
     * for its message. Header refusals come before any refusal of the body. A key said twice in one object is
     * refused whichever way the file is read (issue 17: {@code "id":"DUP","id":"PR-…"} kept the last value and
     * passed the revision check), naming the key and its JSON path.
     */
    @Test
    void theHeaderIsCheckedAsTheTreeSeesIt() throws Exception {
        String text = demoText();
        // an unknown field and another format: the format is what is wrong
        assertEquals(PlanMessage.NOT_A_PLAN, refused(text.replace("proofrun-plan", "shopping-list")
                .replace("\"part\": {", "\"part\": {\"colour\": \"red\",")).key());
        // the version given as text is another version, not a type error of the body
        assertEquals(PlanMessage.UNKNOWN_VERSION, refused(text.replace("\"formatVersion\": 1", "\"formatVersion\": \"1\"")).key());
        assertEquals(PlanMessage.UNKNOWN_VERSION, refused(text.replace("\"formatVersion\": 1", "\"formatVersion\": 1.0")).key());
        // repeated keys, even ones that agree with the file, are refused
        String lastFormatOther = text.replaceFirst("\\{", "{\"format\": \"proofrun-plan\", \"formatVersion\": 1,");
        UserException header = refused(lastFormatOther);
        assertEquals(PlanMessage.DUPLICATE_KEY, header.key());
        assertTrue(header.getMessage().contains("at $.format: the key \"format\" appears twice"), header.getMessage());
    }

    @Test
    void duplicateKeysAreRefusedWithKeyAndPath() throws Exception {
        String text = demoText();
        UserException id = refused(text.replace("\"id\": \"PR-2027-0311\"", "\"id\": \"DUP\", \"id\": \"PR-2027-0311\""));
        assertEquals(PlanMessage.DUPLICATE_KEY, id.key());
        assertTrue(id.getMessage().startsWith(dir.resolve("broken.json") + ": at $.id: the key \"id\" appears twice"), id.getMessage());
        refused("\"lsl\": 21.987", "\"lsl\": 21.987, \"lsl\": 21.0", PlanMessage.DUPLICATE_KEY,
                "at $.characteristics[0].lsl: the key \"lsl\"");
    }

    @Test
    void syntaxErrorsAreSaidInOurWords() throws Exception {
        String text = demoText();
        for (String broken : List.of(text.replace("\"days\": 3", "\"days\": 3,,"), text.replace("\"days\": 3", "\"days\": three"),
                text.replace("\"days\": 3", "\"days\": 99999999999999999999"), text.replace("\"unit\": \"kN\"", "\"unit\": \"k\nN\""))) {
            UserException e = refused(broken);
            assertEquals(1, e.getMessage().lines().count(), e.getMessage());
            for (String libraryWord : List.of("code ", "Unexpected character", "Unrecognized token", "CTRL-CHAR", "out of range of", "Jackson",
                    "Exception")) {
                assertFalse(e.getMessage().contains(libraryWord), e.getMessage());
            }
        }
    }

    @Test
    void aSubgroupSizeBeyondTheFillInFilesIsRefusedWithTheRange() throws Exception {
        String text = demoText().replace("\"subgroupSize\": 5", "\"subgroupSize\": 100000");
        UserException e = refused(text);
        assertEquals(PlanMessage.SUBGROUP_SIZE_RANGE, e.key());
        assertTrue(e.getMessage().endsWith("at $.design.subgroupSize: the fill-in files hold subgroups of 1 to 16376 readings, not 100000"),
                e.getMessage());
    }

    private StudyPlan readText(String text) throws Exception {
        Path p = dir.resolve("text.json");
        Files.writeString(p, text);
        return PlanFiles.read(p);
    }

    @Test
    void slotCountMustMatchTheDesign() throws Exception {
        String text = demoText();
        String cut = text.replaceAll(",\\n      \\{\\n        \"id\": \"S25\"[^}]*\\}", "");
        assertNotEquals(text, cut);
        UserException e = refused(cut.replace("\"state\": \"issued\"", "\"state\": \"draft\"")
                .replaceFirst("\"revision\": \"[0-9a-f]{12}\",\n  ", ""));
        assertTrue(e.getMessage().contains("does not match the design"), e.getMessage());
        assertTrue(Arrays.asList(PlanMessage.values()).contains(e.key()));
    }
}
