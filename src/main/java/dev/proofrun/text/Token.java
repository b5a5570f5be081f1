package dev.proofrun.text;

import java.util.Locale;

/**
 * An enum whose constants are named by a word in files, options and JSON: by default the constant's name in lower
 * case with {@code _} as {@code -} ({@code NOT_VALID} is {@code not-valid}, {@code XBAR_R} is {@code xbar-r}).
 * A constant whose word is not that form overrides {@link #token()} (the sigma method {@code MOVING_RANGE} is
 * {@code mr}). {@link Tokens#parse} reads a constant back from its word.
 */
public interface Token {

    /** The constant's name, as every enum has it. */
    String name();

    /** The word in files, options and JSON: the name in lower case with {@code _} as {@code -}. */
    default String token() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
