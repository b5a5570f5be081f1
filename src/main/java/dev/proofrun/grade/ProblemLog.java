package dev.proofrun.grade;

import dev.proofrun.text.Location;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Collects problems, keeping at most {@value #KEEP} of each kind per characteristic in full and counting
 * the rest, so a file with a million off-resolution readings does not hold a million messages. The count of
 * those not listed is reported as one note per kind ({@link GradeMessage#MORE_LIKE_THIS}) — nothing is
 * silently dropped.
 */
final class ProblemLog {

    static final int KEEP = 100;

    private final List<Problem> kept = new ArrayList<>();
    private final Map<String, int[]> counts = new HashMap<>();
    private final Map<String, Problem> firstOfKind = new HashMap<>();

    void add(Location location, Severity severity, String characteristic, GradeMessage key, Object... args) {
        String kind = key.name() + '\u0000' + characteristic;
        int[] c = counts.computeIfAbsent(kind, x -> new int[1]);
        c[0]++;
        if (c[0] <= KEEP) {
            Problem p = Problem.of(location, severity, characteristic, key, args);
            kept.add(p);
            firstOfKind.putIfAbsent(kind, p);
        }
    }

    /** Number of problems of one kind for one characteristic, listed or not. */
    int count(GradeMessage key, String characteristic) {
        int[] c = counts.get(key.name() + '\u0000' + characteristic);
        return c == null ? 0 : c[0];
    }

    /** The problems in the order found, followed by one note per kind that was cut short. */
    List<Problem> all(String display) {
        List<Problem> out = new ArrayList<>(kept);
        for (Map.Entry<String, int[]> e : counts.entrySet()) {
            int extra = e.getValue()[0] - KEEP;
            if (extra > 0) {
                Problem first = firstOfKind.get(e.getKey());
                out.add(Problem.of(Location.file(display), Severity.NOTE, first.characteristic(), GradeMessage.MORE_LIKE_THIS,
                        extra, first.location(), first.message()));
            }
        }
        return out;
    }
}
