package dev.proofrun.schedule;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;

/**
 * How the k slots are spread over the working time W of the span. The working time is cut into k equal
 * intervals of length Δ = W/k; with d the running time n consecutive parts take, slot i (0-based) starts at
 * working minute
 * <ul>
 * <li>{@link #EVEN}: t_i = i·Δ + (Δ − d)/2, the subgroup centred in its interval; neighbours are exactly Δ
 * apart in working time.</li>
 * <li>{@link #RANDOM}: t_i = i·Δ + u_i·(Δ − max(d, 1 min)), u_i uniform on [0, 1) from
 * {@code java.util.Random} seeded with the plan's seed (that generator's algorithm is fixed by its
 * specification, so the same seed gives the same schedule on every Java). Stratified: one random time
 * inside each interval, and the subgroup still ends inside it, so neighbours are at least d apart — and at
 * least a minute, so that slots rounded down to the minute never share one (subgroups of fast parts take
 * seconds). Random times avoid aliasing with a periodic cause such as a tool-wear cycle or the break
 * pattern (common practice).</li>
 * </ul>
 * Working time skips breaks, non-working days and time between shifts; see {@link Scheduler}.
 */
public enum Spacing implements Token {
    EVEN,
    RANDOM;

    /** The spacing named by its word on the command line and in plan files, as {@link Tokens#parse} reads it. */
    public static Spacing fromToken(String token) {
        return Tokens.parse(Spacing.class, "spacing", token);
    }
}
