package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The one CSV dialect: the separator from the header line, numbers with either decimal mark. */
class CsvDialectTest {

    @Test
    void theHeaderLineChoosesTheSeparator() {
        assertEquals(',', CsvDialect.separator("plan,slot,characteristic,taken,value"));
        assertEquals(';', CsvDialect.separator("plan;slot;characteristic;taken;value"));
        assertEquals(';', CsvDialect.separator("\uFEFFsubgroup;value;remark, with a comma"));
        assertEquals(',', CsvDialect.separator("value"), "one column: a comma, as the fill-in files are written");
        assertEquals(',', CsvDialect.separator("a;b,c"), "a tie keeps the comma");
    }

    @Test
    void numbersTakeEitherDecimalMark() {
        assertEquals(22.001, CsvDialect.number("22,001"), 0.0);
        assertEquals(22.001, CsvDialect.number("22.001"), 0.0);
        assertTrue(Double.isNaN(CsvDialect.number("22,001.5")));
    }

    @Test
    void anOverflowOrANameOfInfinityIsNotFiniteAndOtherTextIsMerelyNotANumber() {
        for (String cell : new String[] {"1e309", "-1e309", "Infinity", "-inf", "NaN", "\u221E"}) {
            assertTrue(CsvDialect.namesNonFinite(cell, CsvDialect.number(cell)), cell);
        }
        for (String cell : new String[] {"22,001", "1e308", "n/a", "22,001.5", ""}) {
            assertFalse(CsvDialect.namesNonFinite(cell, CsvDialect.number(cell)), cell);
        }
    }
}
