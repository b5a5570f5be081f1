package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The one number rule. Its grammar is checked against a regular expression of it (the one the wizard used
 * before the rule was shared) and its values against the JDK's own parser, bit for bit, on seeded random text
 * from the characters people mistype numbers with — no recalled values, so no tolerance to choose.
 */
class DecimalsTest {

    /** A point-only number: the wizard's former pattern ({@code \d} is ASCII in Java's default mode). */
    private static final Pattern POINT = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");
    private static final String ALPHABET = "0123456789012345678901234567890123456789..,,eE+-- xa";

    private static void same(String text, double expected, double got) {
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(got), text);
    }

    @Test
    void pointNumbersAreExactlyThePatternAndTheJdksValue() {
        // 200,000 seeded strings of 0–12 characters; about one in ten is a number
        SplittableRandom rng = new SplittableRandom(20261203);
        int numbers = 0;
        for (int i = 0; i < 200_000; i++) {
            StringBuilder sb = new StringBuilder();
            int len = rng.nextInt(13);
            for (int j = 0; j < len; j++) {
                sb.append(ALPHABET.charAt(rng.nextInt(ALPHABET.length())));
            }
            String t = sb.toString();
            double got = Decimals.parse(t, false);
            if (POINT.matcher(t).matches()) {
                numbers++;
                same(t, Double.parseDouble(t), got);
            } else {
                assertTrue(Double.isNaN(got), t);
            }
        }
        assertTrue(numbers > 10_000, "the alphabet makes numbers often enough: " + numbers);
    }

    @Test
    void aSingleCommaIsADecimalMarkOnlyWhereAllowed() {
        same("22,001", 22.001, Decimals.parse("22,001", true));
        same("-1,5e3", -1500.0, Decimals.parse("-1,5e3", true));
        assertTrue(Double.isNaN(Decimals.parse("22,001", false)));
        assertTrue(Double.isNaN(Decimals.parse("1,000.5", true)), "a thousands separator is not a number");
        assertTrue(Double.isNaN(Decimals.parse("10,0,2", true)));
    }

    @Test
    void wordsForNonFiniteValuesAreNotNumbersButAreNamed() {
        for (String t : new String[] {"NaN", "nan", "Infinity", "-Infinity", "+inf", "\u221E"}) {
            assertTrue(Double.isNaN(Decimals.parse(t, true)), t);
            assertTrue(Decimals.namesNonFinite(t), t);
        }
        assertEquals(Double.POSITIVE_INFINITY, Decimals.parse("1e309", false), "an overflow comes back infinite");
        assertTrue(Double.isNaN(Decimals.parse("0x1p3", false)));
        assertTrue(Double.isNaN(Decimals.parse("1.5d", false)));
        // long numbers are numbers (the returned-file reader once refused more than 40 characters)
        String longOne = "22.00100000000000000000000000000000000000000001";
        same(longOne, Double.parseDouble(longOne), Decimals.parse(longOne, true));
    }
}
