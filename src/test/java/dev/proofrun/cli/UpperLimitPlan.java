package dev.proofrun.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The words of {@code plan new} for one invented characteristic with an upper limit only, a target Cpk of 1.33 and an
 * expected 1.8, 25 subgroups of 5 from {@code start} in Europe/Berlin: the set-up the command tests of shapes share.
 *
 * @param id             the plan's id
 * @param part           the part's name
 * @param characteristic the characteristic's name (unit mm)
 * @param usl            the upper limit as typed
 * @param start          the first slot, local time
 */
record UpperLimitPlan(String id, String part, String characteristic, String usl, String start) {

    /** {@code plan new --out FILE ...} with {@code extra} added at the end. */
    String[] args(Path file, String... extra) {
        List<String> a = new ArrayList<>(List.of("plan", "new", "--out", file.toString(), "--id", id,
                "--part", part, "--characteristic", characteristic, "--unit", "mm",
                "--usl", usl, "--target", "1.33", "--expected", "1.8",
                "--subgroup-size", "5", "--subgroups", "25", "--zone", "Europe/Berlin",
                "--start", start));
        a.addAll(List.of(extra));
        return a.toArray(new String[0]);
    }
}
