package dev.proofrun.plan;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;

/**
 * Where a plan is in its life. A {@link #DRAFT} may be changed freely. {@link #ISSUED} is frozen: it
 * carries a revision fingerprint that the sheets print and the returned data must quote; changing it
 * afterwards makes a new revision (see {@link PlanFiles#issue(java.nio.file.Path)}).
 */
public enum PlanState implements Token {
    DRAFT,
    ISSUED;

    /** The state named by its word in plan files ({@code draft}, {@code issued}), as {@link Tokens#parse} reads it. */
    public static PlanState fromToken(String token) {
        return Tokens.parse(PlanState.class, "plan state", token);
    }
}
