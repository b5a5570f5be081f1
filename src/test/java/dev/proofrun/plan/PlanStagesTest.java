package dev.proofrun.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.text.UserException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The plan file holds a staged study's looks; a single-stage plan's file has no {@code stages} object, so the
 * demo's revision and every plan written before stages existed stay byte for byte what they were; a hostile
 * {@code stages} object is refused in one line naming the file and the JSON path. The demo plan has 25 subgroups
 * of 5. The confidences below are invented round values, not a design.
 */
class PlanStagesTest {

    @TempDir
    Path dir;

    /** Two looks at 12 and 25 subgroups; look 1 stops for futility below 1.10. */
    static Stages twoLooks() {
        return new Stages(Spending.POCOCK, List.of(new Look(12, 0.975, 1.10), new Look(25, 0.97, Double.NaN)));
    }

    @Test
    void stagesRoundTripByteForByteAndChangeTheRevision() throws Exception {
        StudyPlan single = DemoPlan.draft();
        StudyPlan staged = single.withStages(Optional.of(twoLooks()));
        for (StudyPlan plan : List.of(staged, PlanFiles.issue(staged))) {
            Path p = dir.resolve("staged.json");
            Files.deleteIfExists(p);
            PlanFiles.write(p, plan);
            byte[] first = Files.readAllBytes(p);
            StudyPlan back = PlanFiles.read(p);
            assertEquals(plan, back);
            assertEquals(twoLooks(), back.stages().orElseThrow());
            assertArrayEquals(first, PlanFiles.toBytes(back));
        }
        assertTrue(staged.isStaged());
        assertFalse(single.isStaged());
        assertFalse(PlanFiles.fingerprint(single).equals(PlanFiles.fingerprint(staged)), "the looks are content");
    }

    @Test
    void aSingleStagePlanHasNoStagesObjectAndTheDemoKeepsItsRevision() {
        String text = new String(PlanFiles.toBytes(DemoPlan.create()), StandardCharsets.UTF_8);
        assertFalse(text.contains("\"stages\""));
        // the demo's revision as issued before stages existed (plans/demo-valve-body.json at main 74ce74a)
        assertEquals("31ec1269d925", PlanFiles.fingerprint(DemoPlan.draft()));
    }

    @Test
    void theFileCarriesSpendingLooksAndFutilityOnlyWhereALookHasOne() {
        String text = new String(PlanFiles.toBytes(DemoPlan.draft().withStages(Optional.of(twoLooks()))),
                StandardCharsets.UTF_8);
        assertTrue(text.contains("\"spending\": \"pocock\""), text);
        assertTrue(text.contains("\"futility\": 1.1"), text);
        assertEquals(1, text.split("\"futility\"", -1).length - 1, "the last look has none");
    }

    private String stagedText() {
        return new String(PlanFiles.toBytes(DemoPlan.draft().withStages(Optional.of(twoLooks()))), StandardCharsets.UTF_8);
    }

    private String refused(String from, String to) throws Exception {
        String text = stagedText();
        int stages = text.indexOf("\"stages\"");
        int characteristics = text.indexOf("\"characteristics\"");
        String object = text.substring(stages, characteristics); // the change is made inside the stages object only
        assertTrue(object.contains(from), from);
        Path p = dir.resolve("hostile.json");
        Files.writeString(p, text.substring(0, stages) + object.replace(from, to) + text.substring(characteristics));
        UserException e = assertThrows(UserException.class, () -> PlanFiles.read(p));
        String m = e.getMessage();
        assertTrue(m.contains("hostile.json"), m);
        assertFalse(m.contains("\n") || m.contains("Exception"), m);
        return m;
    }

    @Test
    void hostileStagesAreRefusedWithTheFileAndTheJsonPath() throws Exception {
        String looks = "\"subgroups\": 12,";
        assertTrue(refused(looks, "\"subgroups\": 25,").contains("$.stages.looks[1].subgroups"), "not increasing");
        assertTrue(refused(looks, "\"subgroups\": 21,").contains("$.stages.looks[1].subgroups"), "< 5 apart");
        assertTrue(refused("\"subgroups\": 25,\n", "\"subgroups\": 24,\n").contains("$.stages.looks[1].subgroups"),
                "last look not at k");
        assertTrue(refused("\"confidence\": 0.975", "\"confidence\": 1.0").contains("$.stages.looks[0].confidence"));
        assertTrue(refused("\"confidence\": 0.975", "\"confidence\": 0.5").contains("$.stages.looks[0].confidence"));
        assertTrue(refused("\"confidence\": 0.975", "\"confidence\": 0.9").contains("$.stages.looks[0].confidence"),
                "below the plan's 95 %");
        String m = refused("\"pocock\"", "\"haybittle\"");
        assertTrue(m.contains("$.stages.spending") && m.contains("obrien-fleming, pocock"), m);
        assertTrue(refused("\"confidence\": 0.97\n", "\"confidence\": 0.97,\n\"futility\": 1.2\n")
                .contains("$.stages.looks[1].futility"), "futility at the last look");
        assertTrue(refused("\"looks\": [", "\"looks\": [ ], \"x\": [").contains("$.stages"), "no looks");
    }
}
