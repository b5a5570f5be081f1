package dev.proofrun.control;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Scans standardized chart points (centre 0, control limits ±3) for the {@link RunRule}s.
 *
 * <p>One pass over the points with a few counters and bit windows per rule: O(points), no allocation
 * unless a signal is found. {@link #firstSignal} stops at the first signal, for false-alarm simulation.
 */
public final class RunRules {

    private RunRules() {
    }

    /**
     * Every signal of the chosen rules, in order of index (and of rule at the same index).
     *
     * @param z     standardized points
     * @param rules the rules to apply
     * @return the signals; empty when none fire
     * @throws IllegalArgumentException if a point is not finite
     */
    public static List<RuleFiring> scan(double[] z, Set<RunRule> rules) {
        List<RuleFiring> found = null;
        Scanner s = new Scanner(mask(rules));
        for (int i = 0; i < z.length; i++) {
            int fired = s.step(z, i);
            if (fired != 0) {
                if (found == null) {
                    found = new ArrayList<>();
                }
                for (RunRule r : RULES) {
                    if ((fired & (1 << r.ordinal())) != 0) {
                        found.add(new RuleFiring(r, i));
                    }
                }
            }
        }
        return found == null ? Collections.emptyList() : found;
    }

    /**
     * The index of the first point at which any chosen rule fires, or −1 when none does.
     *
     * @throws IllegalArgumentException if a point up to the first signal is not finite
     */
    public static int firstSignal(double[] z, Set<RunRule> rules) {
        Scanner s = new Scanner(mask(rules));
        for (int i = 0; i < z.length; i++) {
            if (s.step(z, i) != 0) {
                return i;
            }
        }
        return -1;
    }

    /** The number of points at which at least one chosen rule fires. */
    public static int signalledPoints(double[] z, Set<RunRule> rules) {
        Scanner s = new Scanner(mask(rules));
        int count = 0;
        for (int i = 0; i < z.length; i++) {
            if (s.step(z, i) != 0) {
                count++;
            }
        }
        return count;
    }

    private static final RunRule[] RULES = RunRule.values();

    private static int mask(Set<RunRule> rules) {
        int m = 0;
        for (RunRule r : rules) {
            m |= 1 << r.ordinal();
        }
        return m;
    }

    /** The running state of every rule; {@link #step} consumes point i and returns the fired rules as bits. */
    private static final class Scanner {
        private final int mask;
        private int above;       // points in a row with z > 0
        private int below;       // points in a row with z < 0
        private int rises;       // rises in a row
        private int falls;       // falls in a row
        private int alternations; // differences in a row alternating in sign
        private int lastDirection; // sign of the last difference, 0 for none/equal
        private int outerHigh;   // bit window: z > 2, last 3 points
        private int outerLow;    // bit window: z < -2
        private int middleHigh;  // bit window: z > 1, last 5 points
        private int middleLow;   // bit window: z < -1
        private int inside;      // points in a row with |z| < 1
        private int outside;     // points in a row with |z| > 1

        Scanner(int mask) {
            this.mask = mask;
        }

        int step(double[] z, int i) {
            double x = z[i];
            if (!Double.isFinite(x)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "point %d is not finite: %s", i, x));
            }
            int fired = 0;
            if (x > 3 || x < -3) {
                fired |= bit(RunRule.BEYOND_LIMITS);
            }
            above = x > 0 ? above + 1 : 0;
            below = x < 0 ? below + 1 : 0;
            if (above >= 9 || below >= 9) {
                fired |= bit(RunRule.RUN_ONE_SIDE);
            }
            if (i > 0) {
                double prev = z[i - 1];
                int direction = x > prev ? 1 : (x < prev ? -1 : 0);
                rises = direction > 0 ? rises + 1 : 0;
                falls = direction < 0 ? falls + 1 : 0;
                if (direction == 0) {
                    alternations = 0;
                } else if (direction == -lastDirection) {
                    alternations++;
                } else {
                    alternations = 1;
                }
                lastDirection = direction;
                if (rises >= 5 || falls >= 5) {
                    fired |= bit(RunRule.TREND);
                }
                if (alternations >= 13) {
                    fired |= bit(RunRule.ALTERNATING);
                }
            }
            outerHigh = ((outerHigh << 1) | (x > 2 ? 1 : 0)) & 0b111;
            outerLow = ((outerLow << 1) | (x < -2 ? 1 : 0)) & 0b111;
            if ((x > 2 && Integer.bitCount(outerHigh) >= 2) || (x < -2 && Integer.bitCount(outerLow) >= 2)) {
                fired |= bit(RunRule.TWO_OF_THREE_OUTER);
            }
            middleHigh = ((middleHigh << 1) | (x > 1 ? 1 : 0)) & 0b11111;
            middleLow = ((middleLow << 1) | (x < -1 ? 1 : 0)) & 0b11111;
            if ((x > 1 && Integer.bitCount(middleHigh) >= 4) || (x < -1 && Integer.bitCount(middleLow) >= 4)) {
                fired |= bit(RunRule.FOUR_OF_FIVE_MIDDLE);
            }
            inside = (x < 1 && x > -1) ? inside + 1 : 0;
            if (inside >= 15) {
                fired |= bit(RunRule.HUGGING_CENTRE);
            }
            outside = (x > 1 || x < -1) ? outside + 1 : 0;
            if (outside >= 8) {
                fired |= bit(RunRule.AVOIDING_CENTRE);
            }
            return fired & mask;
        }

        private static int bit(RunRule r) {
            return 1 << r.ordinal();
        }
    }
}
