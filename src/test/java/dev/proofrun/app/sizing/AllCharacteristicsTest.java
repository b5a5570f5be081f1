package dev.proofrun.app.sizing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.HeldJobs;
import dev.proofrun.design.Design;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The lines about all characteristics together: the latest inputs win, also over an answer still on its way. */
class AllCharacteristicsTest {

    private static final List<CharacteristicDraft> TWO = List.of(
            CharacteristicDraft.of(Map.of("id", "D1", "unit", "mm", "lsl", "9.9", "usl", "10.1")),
            CharacteristicDraft.of(Map.of("id", "D2", "unit", "mm", "lsl", "4.95", "usl", "5.05")));
    private static final Optional<Requirement> PLAN = Optional.of(Requirement.of(IndexKind.CPK, 1.33, 0.95));

    private final HeldJobs worker = new HeldJobs();
    private final AllCharacteristics all = new AllCharacteristics(worker);

    private void ask(Optional<Design> design) {
        all.update(TWO, PLAN, row -> Optional.of(Expectation.centred(1.67)), 0.9, design);
    }

    @Test
    void theAnswerFillsTheLines() {
        ask(Optional.of(Design.of(5, 30)));
        worker.job(0).end();
        assertTrue(all.together().get().contains("D1") && all.together().get().contains("D2"), all.together().get());
        assertFalse(all.sharedLine().get().isEmpty());
    }

    @Test
    void anAnswerStillOnItsWayDoesNotRefillLinesClearedSince() {
        ask(Optional.of(Design.of(5, 30)));
        ask(Optional.empty()); // the design went away (an edit made it incomplete): the lines are cleared
        assertTrue(worker.job(0).cancelled());
        worker.job(0).end(); // its answer was already on its way
        assertEquals("", all.together().get());
        assertEquals("", all.sharedLine().get());
    }
}
