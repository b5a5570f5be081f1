package dev.proofrun.app.session;

import dev.proofrun.text.Token;
import dev.proofrun.text.Tokens;

/** Where the expected value of the index comes from on the Goal step. */
public enum ExpectationSource implements Token {
    /** The expected index typed per characteristic (the Part table's "expected" column). */
    VALUE,
    /** An expected process mean and within sigma, turned into the index by its definition. */
    MEAN_SIGMA,
    /** Pilot readings from a file: the estimate of the index from them. */
    PILOT;

    /** The source for a token; {@link #VALUE} for anything unknown (drafts are forgiving). */
    public static ExpectationSource fromToken(String token) {
        return Tokens.find(ExpectationSource.class, token).orElse(VALUE);
    }
}
