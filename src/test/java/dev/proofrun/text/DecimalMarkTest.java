package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.api.Test;

/** The decimal mark of typed numbers: one rule, a comma never read as anything but what the setting says. */
class DecimalMarkTest {

    @Test
    void underThePointACommaIsRefusedAndSaidToBeTheOtherMark() {
        assertEquals(1.33, DecimalMark.POINT.parse("1.33"), 0);
        assertTrue(Double.isNaN(DecimalMark.POINT.parse("1,33")));
        assertTrue(Double.isNaN(DecimalMark.POINT.parse("12,003")), "never read as 12003 nor as 12.003");
        assertTrue(DecimalMark.POINT.otherMarkIn("1,33"));
        assertFalse(DecimalMark.POINT.otherMarkIn("1,3,3"), "not a number with either mark");
        assertFalse(DecimalMark.POINT.otherMarkIn("1.33"));
    }

    @Test
    void underTheCommaBothMarksAreDecimalMarksAndThousandsSeparatorsAreNot() {
        assertEquals(1.33, DecimalMark.COMMA.parse("1,33"), 0);
        assertEquals(1.33, DecimalMark.COMMA.parse("1.33"), 0, "plan files write points");
        assertTrue(Double.isNaN(DecimalMark.COMMA.parse("1.000,5")), "no thousands separator");
        assertFalse(DecimalMark.COMMA.otherMarkIn("1,33"));
    }

    @Test
    void aLocalesOwnMark() {
        // the JDK's locale data (CLDR): German and French write a decimal comma, English a point
        assertEquals(DecimalMark.COMMA, DecimalMark.of(Locale.GERMANY));
        assertEquals(DecimalMark.COMMA, DecimalMark.of(Locale.FRANCE));
        assertEquals(DecimalMark.POINT, DecimalMark.of(Locale.US));
        assertEquals(DecimalMark.POINT, DecimalMark.fromToken(" Point "));
        assertEquals("1,33", DecimalMark.COMMA.example());
    }
}
