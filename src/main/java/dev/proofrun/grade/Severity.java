package dev.proofrun.grade;

import dev.proofrun.text.Token;

/** How much a problem found in a returned file matters; its {@link #token() token} is the word in JSON. */
public enum Severity implements Token {
    /** The cell, row or file could not be used as returned (a reading is missing from the analysis, or the file is refused). */
    ERROR,
    /** Used, but suspicious or off the plan: a reading off the gauge's resolution, a probable typing error, a reading taken outside its window. */
    WARNING,
    /** Worth knowing, no effect on the analysis. */
    NOTE
}
