package dev.proofrun.plan;

import dev.proofrun.design.Design;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.DesignRow;
import dev.proofrun.design.DesignTable;
import dev.proofrun.design.StudyDesigner;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.stream.IntStream;

/**
 * One design for all characteristics of a plan: every slot takes the same n consecutive parts and measures
 * each characteristic on them, so the plan has one n and one k.
 *
 * <ul>
 * <li>n and k both given: taken as they are, nothing is solved.</li>
 * <li>Otherwise each characteristic is sized by {@link StudyDesigner} for the candidate n (the given n, or
 * 1–10); for each n that every characteristic can reach, k(n) is the largest k any characteristic needs;
 * the design with the fewest readings n·k(n) is chosen (on a tie, more subgroups — the designer's own rule).
 * A given k replaces k(n) (the engineer's choice; the power then is what that k gives).</li>
 * </ul>
 *
 * @param design   the chosen design
 * @param reason   one sentence saying how it was chosen
 * @param perCharacteristic the designer's row for the chosen n, by characteristic id (empty when nothing was solved)
 */
public record CommonDesign(Design design, String reason, Map<String, DesignRow> perCharacteristic) {

    public CommonDesign {
        perCharacteristic = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(perCharacteristic));
    }

    /**
     * @param characteristics the plan's characteristics
     * @param power           wanted power for the designer
     * @param subgroupSize    n, if fixed
     * @param subgroups       k, if fixed
     * @throws dev.proofrun.text.UserException when a characteristic cannot be sized, or no n suits all
     */
    public static CommonDesign choose(List<Characteristic> characteristics, double power, OptionalInt subgroupSize,
            OptionalInt subgroups) {
        if (subgroupSize.isPresent() && subgroups.isPresent()) {
            Design d = Design.of(subgroupSize.getAsInt(), subgroups.getAsInt());
            return new CommonDesign(d, String.format(Locale.ROOT, "%d subgroups of %d as given; not solved.",
                    d.subgroups(), d.subgroupSize()), Map.of());
        }
        List<Integer> sizes = subgroupSize.isPresent() ? List.of(subgroupSize.getAsInt())
                : IntStream.rangeClosed(1, 10).boxed().toList();
        Map<String, DesignTable> tables = new LinkedHashMap<>();
        for (Characteristic c : characteristics) {
            DesignRequest req = DesignRequest.of(c.limits().sides(), c.requirement(), c.expectation())
                    .withPower(power).withSubgroupSizes(sizes);
            tables.put(c.id(), StudyDesigner.design(req));
        }
        List<int[]> candidates = new ArrayList<>();
        for (int n : sizes) {
            int k = 0;
            boolean all = true;
            for (DesignTable t : tables.values()) {
                Optional<DesignRow> row = rowFor(t, n);
                if (row.isEmpty()) {
                    all = false;
                    break;
                }
                k = Math.max(k, row.get().subgroups());
            }
            if (all) {
                candidates.add(new int[] {n, k});
            }
        }
        if (candidates.isEmpty()) {
            throw new dev.proofrun.text.UserException(PlanMessage.NO_COMMON_DESIGN, sizes.toString());
        }
        int[] best = candidates.stream().min(Comparator.<int[]>comparingInt(c -> c[0] * c[1])
                .thenComparing(c -> -c[1])).orElseThrow();
        int n = best[0];
        int k = subgroups.orElse(best[1]);
        Map<String, DesignRow> rows = new LinkedHashMap<>();
        String hardest = null;
        for (Map.Entry<String, DesignTable> e : tables.entrySet()) {
            DesignRow r = rowFor(e.getValue(), n).orElseThrow();
            rows.put(e.getKey(), r);
            if (r.subgroups() == best[1] && hardest == null) {
                hardest = e.getKey();
            }
        }
        String reason = subgroups.isPresent()
                ? String.format(Locale.ROOT, "subgroups of %d as sized by the designer; %d subgroups as given (the designer asked for %d).",
                        n, k, best[1])
                : String.format(Locale.ROOT, "%d subgroups of %d (%d readings): the fewest readings that give every characteristic"
                        + " the wanted power of %.2f; %s needs the most subgroups.", k, n, n * k, power, hardest);
        return new CommonDesign(Design.of(n, k), reason, rows);
    }

    private static Optional<DesignRow> rowFor(DesignTable t, int n) {
        return t.rows().stream().filter(r -> r.subgroupSize() == n).findFirst();
    }
}
