package dev.proofrun.design;

import java.util.List;

/**
 * The planned looks of a staged study and how they spend α. A single-stage study has one look at all its
 * subgroups; staged studies have 2 to {@value #MOST} looks, each at least {@value #LEAST_APART} subgroups after
 * the one before.
 */
public record Stages(Spending spending, List<Look> looks) {

    /** The most looks a plan may have. */
    public static final int MOST = 4;
    /** The fewest subgroups between two looks (proofrun's rule: fewer add a look without adding evidence). */
    public static final int LEAST_APART = 5;

    public Stages {
        looks = List.copyOf(looks);
        if (spending == null || looks.isEmpty() || looks.size() > MOST) {
            throw new IllegalArgumentException("1 to " + MOST + " looks with a spending function");
        }
        for (int j = 1; j < looks.size(); j++) {
            if (looks.get(j).subgroups() - looks.get(j - 1).subgroups() < LEAST_APART) {
                throw new IllegalArgumentException("looks fewer than " + LEAST_APART + " subgroups apart");
            }
        }
    }

    /** How many looks. */
    public int count() {
        return looks.size();
    }

    /** The last look, where the study ends at the latest. */
    public Look last() {
        return looks.get(looks.size() - 1);
    }

    /** Whether the study has more than one look. */
    public boolean staged() {
        return looks.size() > 1;
    }
}
