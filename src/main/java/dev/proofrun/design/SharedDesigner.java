package dev.proofrun.design;

import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Plans one study for several characteristics measured on the same parts. For each subgroup size n that
 * every characteristic can use, each characteristic's own k is found as in {@link StudyDesigner}; the
 * shared k is the largest of them, the power of every characteristic is evaluated at that (n, k), and the
 * one that needs the largest k is named as the driver. The recommended design has the fewest readings
 * (on a tie, the most subgroups). The candidate sizes are those of the first request.
 *
 * <p>{@code size --characteristics} shows its table; {@code plan new} takes its first design through
 * {@code plan.PlanDesign}, which adds only what a plan needs (a fixed n and k, a given k, refusals that
 * name the characteristic).
 */
public final class SharedDesigner {

    private SharedDesigner() {
    }

    /**
     * @param requests one per characteristic (at least one)
     * @return one shared design per subgroup size that every characteristic can reach, best first
     * @throws UserException as {@link StudyDesigner#design} for any characteristic, or when no subgroup size
     *                       suits them all
     */
    public static List<SharedDesign> design(List<DesignRequest> requests) {
        if (requests.isEmpty()) {
            throw new IllegalArgumentException("at least one characteristic is needed");
        }
        for (DesignRequest r : requests) {
            r.requireAttainable();
        }
        List<SharedDesign> out = new ArrayList<>();
        double best = 0;
        int bestN = requests.get(0).subgroupSizes().get(0);
        for (int n : requests.get(0).subgroupSizes()) {
            List<SizeSearch> searches = new ArrayList<>();
            List<DesignRow> rows = new ArrayList<>();
            for (DesignRequest r : requests) {
                SizeSearch s = new SizeSearch(r, n);
                DesignRow row = s.row();
                searches.add(s);
                rows.add(row);
                if (row == null && s.bestPower() > best) {
                    best = s.bestPower();
                    bestN = n;
                }
            }
            if (rows.contains(null)) {
                continue;
            }
            int driver = 0;
            for (int i = 1; i < rows.size(); i++) {
                if (rows.get(i).subgroups() > rows.get(driver).subgroups()) {
                    driver = i;
                }
            }
            int k = rows.get(driver).subgroups();
            List<Double> powers = new ArrayList<>();
            List<Integer> own = new ArrayList<>();
            for (int i = 0; i < searches.size(); i++) {
                powers.add(searches.get(i).power(k));
                own.add(rows.get(i).subgroups());
            }
            DesignRow d = searches.get(driver).rowAt(k, rows.get(driver).limitedBy());
            out.add(new SharedDesign(n, k, n * k, powers, own, driver, d.limitedBy(), d.falseAlarm(), d.detection(),
                    d.anySignalFalseAlarm(), d.anySignalDetection()));
        }
        if (out.isEmpty()) {
            throw new UserException(DesignMessage.UNREACHABLE, requests.get(0).power(), StudyDesigner.MAX_READINGS,
                    best, bestN);
        }
        out.sort(Comparator.comparingInt(SharedDesign::readings)
                .thenComparing(Comparator.comparingInt(SharedDesign::subgroups).reversed()));
        return out;
    }
}
