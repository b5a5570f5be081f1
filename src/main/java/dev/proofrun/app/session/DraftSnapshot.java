package dev.proofrun.app.session;

import java.util.List;
import java.util.Map;

/**
 * A frozen copy of a draft as written to the side file: every field as typed, so that reopening the
 * wizard restores exactly what was on screen.
 *
 * @param format          the side-file format version (1)
 * @param planFile        the plan file the draft belongs to, or empty for an unsaved plan
 * @param fields          {@link DraftField} name → text
 * @param characteristics one header → text map per characteristic, in table order
 */
public record DraftSnapshot(int format, String planFile, Map<String, String> fields,
        List<Map<String, String>> characteristics) {

    public static final int FORMAT = 1;

    public DraftSnapshot {
        planFile = planFile == null ? "" : planFile;
        fields = Map.copyOf(fields);
        characteristics = characteristics.stream().map(Map::copyOf).toList();
    }
}
