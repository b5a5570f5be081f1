package dev.proofrun.plan;

import dev.proofrun.design.Design;
import dev.proofrun.design.DesignMessage;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.SharedDesign;
import dev.proofrun.design.SharedDesigner;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.IntStream;

/**
 * One design for all characteristics of a plan: every slot takes the same n consecutive parts and measures
 * each characteristic on them, so the plan has one n and one k.
 *
 * <ul>
 * <li>n and k both given: taken as they are, nothing is solved.</li>
 * <li>Otherwise {@link SharedDesigner} solves it, as {@code size --characteristics} shows it: for each
 * candidate n (the given n, or 1–10) that every characteristic can reach, k(n) is the largest k any
 * characteristic needs; the design with the fewest readings n·k(n) is chosen (on a tie, more subgroups).
 * A given k replaces k(n) (the engineer's choice; the power then is what that k gives).</li>
 * </ul>
 *
 * What this class adds to the designer is what a plan needs: the fixed design, the given k, a refusal about
 * one characteristic that names it ({@link PlanMessage#CHARACTERISTIC_REFUSED}), and the sentence that says
 * how the design was chosen.
 *
 * @param design the chosen design
 * @param reason one sentence saying how it was chosen
 * @param solved the designer's shared design for the chosen n (empty when n and k were both given)
 */
public record PlanDesign(Design design, String reason, Optional<SharedDesign> solved) {

    /** Refusals of the designer that are about one characteristic, so they are reported with its id. */
    private static final Set<DesignMessage> ABOUT_THE_CHARACTERISTIC = Set.of(DesignMessage.NOT_BETTER_THAN_REQUIRED,
            DesignMessage.INDEX_NEEDS_BOTH_LIMITS, DesignMessage.INDEX_NEEDS_LIMIT);

    /**
     * @param characteristics the plan's characteristics
     * @param power           wanted power for the designer
     * @param subgroupSize    n, if fixed
     * @param subgroups       k, if fixed
     * @throws UserException when a characteristic cannot be sized (naming it), or no n suits all
     */
    public static PlanDesign choose(List<Characteristic> characteristics, double power, OptionalInt subgroupSize,
            OptionalInt subgroups) {
        if (subgroupSize.isPresent() && subgroups.isPresent()) {
            Design d = Design.of(subgroupSize.getAsInt(), subgroups.getAsInt());
            return new PlanDesign(d, String.format(Locale.ROOT, "%d subgroups of %d as given; not solved.",
                    d.subgroups(), d.subgroupSize()), Optional.empty());
        }
        List<Integer> sizes = subgroupSize.isPresent() ? List.of(subgroupSize.getAsInt())
                : IntStream.rangeClosed(1, 10).boxed().toList();
        List<SharedDesign> designs = solve(characteristics, c -> DesignRequest.of(c.limits().sides(), c.requirement(),
                c.expectation()).withPower(power).withSubgroupSizes(sizes));
        SharedDesign best = designs.get(0);
        int n = best.subgroupSize();
        int k = subgroups.orElse(best.subgroups());
        List<String> floors = characteristics.stream().filter(c -> c.floor().isPresent()).map(Characteristic::id).toList();
        String reason;
        if (subgroups.isPresent()) {
            reason = String.format(Locale.ROOT, "subgroups of %d as sized by the designer; %d subgroups as given (the designer asked for %d).",
                    n, k, best.subgroups());
        } else if (floors.size() == characteristics.size()) {
            // a floor's power is not what the normal model says (stats.FloorBound): never called the wanted power
            reason = String.format(Locale.ROOT, "%d subgroups of %d (%d readings): sized as the normal model would for a power of"
                    + " %.2f, but no power is promised: every characteristic is planned with a floor.", k, n, n * k, power);
        } else {
            String those = floors.isEmpty() ? "every characteristic" : "every characteristic without a floor";
            String unpromised = floors.isEmpty() ? "" : String.format(Locale.ROOT, " (none is promised for %s, planned with a floor)",
                    String.join(", ", floors));
            reason = String.format(Locale.ROOT, "%d subgroups of %d (%d readings): the fewest readings that give %s"
                    + " the wanted power of %.2f%s; %s needs the most subgroups.", k, n, n * k, those, power, unpromised,
                    characteristics.get(best.driver()).id());
        }
        return new PlanDesign(Design.of(n, k), reason, Optional.of(best));
    }

    /**
     * The shared designs of {@link SharedDesigner} for these characteristics, each asked with the request the
     * caller makes for it; a refusal about one characteristic (c₁ ≤ c₀, an index its limits cannot give, a
     * power out of reach for it even alone) names it.
     *
     * @param characteristics the characteristics measured on the same parts (at least one)
     * @param request         the caller's design options applied to one characteristic
     * @return as {@link SharedDesigner#design}: one per subgroup size every characteristic can reach, best first
     * @throws UserException {@link PlanMessage#CHARACTERISTIC_REFUSED} with the id and the designer's words (also
     *                       for a characteristic whose wanted power is out of reach even alone),
     *                       {@link PlanMessage#NO_COMMON_DESIGN} when each can be sized alone but no subgroup size
     *                       suits them all, or as {@link SharedDesigner#design}
     */
    public static List<SharedDesign> solve(List<Characteristic> characteristics,
            Function<Characteristic, DesignRequest> request) {
        List<DesignRequest> requests = new ArrayList<>();
        for (Characteristic c : characteristics) {
            try {
                DesignRequest r = request.apply(c);
                r.requireAttainable();
                requests.add(r);
            } catch (UserException e) {
                if (e.key() instanceof DesignMessage m && ABOUT_THE_CHARACTERISTIC.contains(m)) {
                    throw new UserException(PlanMessage.CHARACTERISTIC_REFUSED, c.id(), e.getMessage());
                }
                throw e;
            }
        }
        try {
            return SharedDesigner.design(requests);
        } catch (UserException e) {
            if (requests.size() < 2 || e.key() != DesignMessage.UNREACHABLE) {
                throw e;
            }
            // which one stands in the way: a characteristic that cannot reach the power even alone is named
            // with the designer's words for it; if each can alone, no one subgroup size suits them all
            for (int i = 0; i < requests.size(); i++) {
                try {
                    SharedDesigner.design(List.of(requests.get(i)));
                } catch (UserException alone) {
                    if (alone.key() == DesignMessage.UNREACHABLE) {
                        throw new UserException(PlanMessage.CHARACTERISTIC_REFUSED, characteristics.get(i).id(),
                                alone.getMessage());
                    }
                    throw alone;
                }
            }
            throw new UserException(PlanMessage.NO_COMMON_DESIGN, requests.get(0).subgroupSizes().toString());
        }
    }
}
