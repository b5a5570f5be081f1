package dev.proofrun.grade;

import dev.proofrun.design.Design;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.SpecLimits;
import java.time.Duration;
import java.time.ZoneId;
import java.time.ZonedDateTime;
import java.util.ArrayList;
import java.util.List;

/** Small invented plans for grading tests: slots every 30 minutes from 2027-03-01 06:00 Berlin, window ±10 min. */
final class TestPlans {

    static final ZoneId ZONE = ZoneId.of("Europe/Berlin");

    private TestPlans() {
    }

    static PlannedCharacteristic bore() {
        return new PlannedCharacteristic("D1", "bore diameter", "mm", SpecLimits.twoSided(9.9, 10.1), 10.0, 0.001,
                Requirement.of(IndexKind.CPK, 1.33, 0.95));
    }

    static GradingPlan plan(int n, int k, PlannedCharacteristic... cs) {
        List<PlannedSlot> slots = new ArrayList<>();
        ZonedDateTime t = ZonedDateTime.of(2027, 3, 1, 6, 0, 0, 0, ZONE);
        for (int i = 0; i < k; i++) {
            slots.add(new PlannedSlot(String.format("S%02d", i + 1), t.plusMinutes(30L * i), 10));
        }
        return new GradingPlan("PR-TEST-1", "0123456789ab", ZONE, List.of(cs), Design.of(n, k), slots,
                GradingPlan.defaultAllowedShortfall(k), Duration.ofMinutes(30));
    }
}
