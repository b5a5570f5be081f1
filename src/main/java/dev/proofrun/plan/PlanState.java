package dev.proofrun.plan;

import java.util.Locale;

/**
 * Where a plan is in its life. A {@link #DRAFT} may be changed freely. {@link #ISSUED} is frozen: it
 * carries a revision fingerprint that the sheets print and the returned data must quote; changing it
 * afterwards makes a new revision (see {@link PlanFiles#issue(java.nio.file.Path)}).
 */
public enum PlanState {
    DRAFT("draft"),
    ISSUED("issued");

    private final String token;

    PlanState(String token) {
        this.token = token;
    }

    /** The word in plan files. */
    public String token() {
        return token;
    }

    /** @throws IllegalArgumentException for an unknown token */
    public static PlanState fromToken(String token) {
        for (PlanState s : values()) {
            if (s.token.equals(token)) {
                return s;
            }
        }
        throw new IllegalArgumentException(String.format(Locale.ROOT, "unknown plan state '%s' (draft or issued)", token));
    }
}
