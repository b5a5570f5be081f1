package dev.proofrun.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RecentPlansTest {

    @TempDir
    Path dir;

    @Test
    void mostRecentFirstWithoutRepeatsAndBounded() {
        RecentPlans r = new RecentPlans(new AppHome(dir, dir));
        assertTrue(r.isFirstStart());
        for (int i = 0; i < 10; i++) {
            r.remember(dir.resolve("p" + i + ".json"));
        }
        r.remember(dir.resolve("p5.json"));
        List<Path> list = new RecentPlans(new AppHome(dir, dir)).list();
        assertEquals(RecentPlans.LIMIT, list.size());
        assertEquals(dir.resolve("p5.json"), list.get(0));
        assertEquals(dir.resolve("p9.json"), list.get(1));
        assertFalse(r.isFirstStart());
    }

    @Test
    void aDamagedListCountsAsEmpty() throws Exception {
        Files.writeString(dir.resolve("recent.json"), "{not json");
        assertEquals(List.of(), new RecentPlans(new AppHome(dir, dir)).list());
    }

    @Test
    void aDraftRoundTripsEveryField() {
        StudyDraft d = new StudyDraft();
        d.field(DraftField.MINIMUM).set("1.67");
        d.characteristics().add(CharacteristicDraft.of(java.util.Map.of("id", "T1", "unit", "N·m", "usl", "9")));
        DraftStore store = new DraftStore(new AppHome(dir, dir));
        store.write(d.snapshot());
        StudyDraft back = new StudyDraft();
        back.restore(store.newerDraft(null).orElseThrow(), true);
        assertEquals("1.67", back.text(DraftField.MINIMUM));
        assertEquals("N·m", back.characteristics().get(0).text(CharacteristicField.UNIT));
        assertTrue(back.dirtyProperty().get());
    }
}
