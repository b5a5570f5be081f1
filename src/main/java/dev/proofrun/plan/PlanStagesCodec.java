package dev.proofrun.plan;

import dev.proofrun.design.Look;
import dev.proofrun.design.Spending;
import dev.proofrun.design.Stages;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads the {@code stages} object of a plan file and refuses, with the JSON path, what a staged study cannot
 * be graded by: an unknown spending function; fewer than 2 or more than {@value Stages#MOST} looks; looks not
 * increasing or fewer than {@value Stages#LEAST_APART} subgroups apart; a last look not at the design's k; a
 * confidence outside (0.5, 1) or below the characteristics' own; a futility boundary that is not a finite
 * number, or one at the last look (which has no next stage); characteristics with different confidences (one
 * look's boundary serves them all).
 */
final class PlanStagesCodec {

    private PlanStagesCodec() {
    }

    static Stages read(PlanJson.StagesJ sj, int subgroups, List<Characteristic> characteristics, Location file) {
        String token = required(sj.spending(), "$.stages.spending", file);
        Spending spending = value(file, "$.stages.spending", () -> Spending.fromToken(token));
        List<PlanJson.LookJ> lj = required(sj.looks(), "$.stages.looks", file);
        if (lj.size() < 2 || lj.size() > Stages.MOST) {
            throw bad(file, "$.stages.looks", String.format(Locale.ROOT,
                    "a staged plan has 2 to %d looks, not %d (a single-stage plan has no stages object)", Stages.MOST,
                    lj.size()));
        }
        double planned = characteristics.get(0).requirement().confidence();
        for (int i = 1; i < characteristics.size(); i++) {
            if (characteristics.get(i).requirement().confidence() != planned) {
                throw bad(file, "$.characteristics[" + i + "].requirement.confidence",
                        "a staged plan needs one confidence for all characteristics: each look's boundary serves them all");
            }
        }
        List<Look> looks = new ArrayList<>();
        for (int i = 0; i < lj.size(); i++) {
            String p = "$.stages.looks[" + i + "]";
            PlanJson.LookJ l = required(lj.get(i), p, file);
            int k = required(l.subgroups(), p + ".subgroups", file);
            double c = required(l.confidence(), p + ".confidence", file);
            boolean last = i == lj.size() - 1;
            if (i > 0 && k - looks.get(i - 1).subgroups() < Stages.LEAST_APART) {
                throw bad(file, p + ".subgroups", String.format(Locale.ROOT,
                        "look %d is at %d subgroups, look %d at %d: looks must increase by at least %d subgroups",
                        i + 1, k, i, looks.get(i - 1).subgroups(), Stages.LEAST_APART));
            }
            if (last && k != subgroups) {
                throw bad(file, p + ".subgroups", String.format(Locale.ROOT,
                        "the last look must be at the design's %d subgroups, not %d", subgroups, k));
            }
            if (!(c > 0.5 && c < 1)) {
                throw bad(file, p + ".confidence", String.format(Locale.ROOT,
                        "a look's confidence lies between 0.5 and 1 (exclusive), not %s", c));
            }
            if (c < planned) {
                throw bad(file, p + ".confidence", String.format(Locale.ROOT,
                        "a look's confidence %s is below the plan's %s: the looks together would spend more than the"
                                + " plan's risk", c, planned));
            }
            if (l.futility() != null && last) {
                throw bad(file, p + ".futility", "the last look has no futility boundary: it has no next stage");
            }
            if (l.futility() != null && !Double.isFinite(l.futility())) {
                throw bad(file, p + ".futility", "a futility boundary is a finite index value");
            }
            double futility = l.futility() == null ? Double.NaN : l.futility();
            looks.add(value(file, p, () -> new Look(k, c, futility)));
        }
        return value(file, "$.stages", () -> new Stages(spending, looks));
    }

    private static <T> T required(T v, String path, Location file) {
        if (v == null) {
            throw new UserException(file, PlanMessage.MISSING, path);
        }
        return v;
    }

    private static UserException bad(Location file, String path, String why) {
        return new UserException(file, PlanMessage.BAD_VALUE, path, why);
    }

    private static <T> T value(Location file, String path, java.util.function.Supplier<T> make) {
        try {
            return make.get();
        } catch (IllegalArgumentException e) {
            throw bad(file, path, e.getMessage());
        }
    }
}
