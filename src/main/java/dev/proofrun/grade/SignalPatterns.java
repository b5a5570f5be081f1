package dev.proofrun.grade;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The signals of a study in words, one entry per <em>pattern</em>: a rule that fires at consecutive subgroups
 * (a run of nine on one side fires at the 9th, 10th, … point) is one pattern, said once with the slots it spans —
 * "run-one-side at S09–S16 (8 points)" — not eight signals. Patterns of one rule are listed in time order, at most
 * {@value #LISTED} per rule, then "and N more patterns".
 */
public final class SignalPatterns {

    static final int LISTED = 6;

    private SignalPatterns() {
    }

    /**
     * "trend at S07–S09 (3 points); beyond-limits at S12 (range)"; "none" without signals.
     *
     * @param signals the signals, in the order the charts give them; charts other than the location chart are
     *                named after the rule
     */
    public static String describe(List<SlotSignal> signals) {
        Map<String, List<SlotSignal>> byRule = new LinkedHashMap<>();
        for (SlotSignal s : signals) {
            String id = s.chart().token();
            boolean location = id.equals("mean") || id.equals("individual");
            byRule.computeIfAbsent(s.rule().token() + (location ? "" : " (" + id + ")"), r -> new ArrayList<>()).add(s);
        }
        StringBuilder sb = new StringBuilder();
        byRule.entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> {
            if (sb.length() > 0) {
                sb.append("; ");
            }
            List<String> runs = runs(e.getValue());
            sb.append(e.getKey()).append(" at ").append(String.join(", ", runs.subList(0, Math.min(LISTED, runs.size()))));
            if (runs.size() > LISTED) {
                int more = runs.size() - LISTED;
                sb.append(String.format(Locale.ROOT, " and %d more pattern%s", more, more == 1 ? "" : "s"));
            }
        });
        return sb.length() == 0 ? "none" : sb.toString();
    }

    /** The number of patterns (runs of consecutive subgroups of one rule on one chart). */
    public static int count(List<SlotSignal> signals) {
        Map<String, List<SlotSignal>> byRule = new LinkedHashMap<>();
        for (SlotSignal s : signals) {
            byRule.computeIfAbsent(s.chart().token() + " " + s.rule().token(), r -> new ArrayList<>()).add(s);
        }
        return byRule.values().stream().mapToInt(l -> runs(l).size()).sum();
    }

    /** "S09–S16 (8 points)" or "S12" per run of consecutive subgroups. */
    private static List<String> runs(List<SlotSignal> ofOneRule) {
        List<SlotSignal> sorted = new ArrayList<>(ofOneRule);
        sorted.sort((a, b) -> Integer.compare(a.subgroup(), b.subgroup()));
        List<String> out = new ArrayList<>();
        int i = 0;
        while (i < sorted.size()) {
            int j = i;
            while (j + 1 < sorted.size() && sorted.get(j + 1).subgroup() <= sorted.get(j).subgroup() + 1) {
                j++;
            }
            SlotSignal first = sorted.get(i);
            SlotSignal last = sorted.get(j);
            int points = last.subgroup() - first.subgroup() + 1;
            out.add(points == 1 ? first.slot()
                    : String.format(Locale.ROOT, "%s–%s (%d points)", first.slot(), last.slot(), points));
            i = j + 1;
        }
        return out;
    }

    /** "1 signalled point", "3 signalled points". */
    public static String points(int count) {
        return count == 1 ? "1 signalled point" : count + " signalled points";
    }
}
