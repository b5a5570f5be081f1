package dev.proofrun.app.session;

import dev.proofrun.text.Tokens;

/** Where the expected value of the index comes from on the Goal step. */
public enum ExpectationSource {
    /** The expected index typed per characteristic (the Part table's "expected" column). */
    VALUE("value"),
    /** An expected process mean and within sigma, turned into the index by its definition. */
    MEAN_SIGMA("mean-sigma"),
    /** Pilot readings from a file: the estimate of the index from them. */
    PILOT("pilot");

    private final String token;

    ExpectationSource(String token) {
        this.token = token;
    }

    public String token() {
        return token;
    }

    /** The source for a token; {@link #VALUE} for anything unknown (drafts are forgiving). */
    public static ExpectationSource fromToken(String token) {
        return Tokens.find(ExpectationSource.class, ExpectationSource::token, token).orElse(VALUE);
    }
}
