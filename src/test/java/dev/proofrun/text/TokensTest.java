package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;

class TokensTest {

    @Test
    void aWordMatchesInAnyCaseWithTheSpaceAroundItIgnored() {
        assertEquals(Optional.of(DecimalMark.COMMA), Tokens.find(DecimalMark.class, DecimalMark::token, " Comma\t"));
        assertEquals(Optional.of(DecimalMark.POINT), Tokens.find(DecimalMark.class, DecimalMark::token, "point"));
    }

    @Test
    void anUnknownOrMissingWordMatchesNothing() {
        assertTrue(Tokens.find(DecimalMark.class, DecimalMark::token, "dot").isEmpty());
        assertTrue(Tokens.find(DecimalMark.class, DecimalMark::token, "poi nt").isEmpty());
        assertTrue(Tokens.find(DecimalMark.class, DecimalMark::token, null).isEmpty());
    }
}
