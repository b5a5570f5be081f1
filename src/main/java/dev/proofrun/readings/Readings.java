package dev.proofrun.readings;

import java.util.Collections;
import java.util.List;
import java.util.Objects;

/**
 * Readings from one file, in subgroups (individuals as subgroups of one), in file order.
 *
 * @param file      the file as the user named it
 * @param layout    how the file arranged them
 * @param subgroups the subgroups (read-only list; the arrays are not copied)
 * @param count     the number of readings
 */
public record Readings(String file, SubgroupLayout layout, List<double[]> subgroups, long count) {

    public Readings {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(layout, "layout");
        subgroups = Collections.unmodifiableList(subgroups);
    }

    /** True if every subgroup has one reading. */
    public boolean individuals() {
        return subgroups.stream().allMatch(g -> g.length == 1);
    }
}
