package dev.proofrun.cli;

import dev.proofrun.capability.CapabilityJson;
import dev.proofrun.grade.CharacteristicGrade;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The capability keys of {@code grade --json}, from {@link CapabilityJson} — the same code and keys as
 * {@code estimate --json}. Without figures (fewer than 2 usable subgroups, no spread) the keys are present
 * with null values; readings/subgroups/subgroupSize then come from the completeness count.
 */
final class CapabilityKeys {

    private static final String[] NULL_KEYS = {"mean", "sigmaWithin", "sigmaOverall", "sigmaMethod", "cp", "cpu", "cpl",
        "cpk", "pp", "ppu", "ppl", "ppk", "cpm", "confidence", "bound", "lower", "degreesOfFreedom", "ppm"};

    private CapabilityKeys() {
    }

    static Map<String, Object> of(CharacteristicGrade g) {
        if (g.capability() != null) {
            return CapabilityJson.of(g.capability());
        }
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("readings", g.completeness().readings());
        m.put("subgroups", g.completeness().completeSubgroups());
        m.put("subgroupSize", g.completeness().subgroupSize());
        for (String k : NULL_KEYS) {
            m.put(k, null);
        }
        return m;
    }
}
