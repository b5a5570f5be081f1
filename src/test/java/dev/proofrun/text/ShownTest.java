package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/** Values from files in messages: escaped so a message stays one line, cut so it stays short. */
class ShownTest {

    @Test
    void lineBreaksTabsAndHiddenCharactersAreEscaped() {
        assertEquals("22.001\\n1", Shown.escaped("22.001\n1"));
        assertEquals("a\\r\\nb\\tc", Shown.escaped("a\r\nb\tc"));
        assertEquals("x\\u0000y\\u001Bz", Shown.escaped("x\u0000y\u001Bz"));
        assertEquals("\\uFEFFplan \\u2028 \\u202E", Shown.escaped("\uFEFFplan \u2028 \u202E"));
        String plain = "Ø 22,001 µm — Prüfmaß";
        assertSame(plain, Shown.escaped(plain), "text without such characters is returned as it is");
        assertEquals(Shown.escaped("a\nb"), Shown.escaped(Shown.escaped("a\nb")), "escaping twice changes nothing");
    }

    @Test
    void longCellsAreCutWithTheirLength() {
        String cell = "22.0015" + "x".repeat(10_000);
        assertEquals("22.0015" + "x".repeat(Shown.CELL_CHARACTERS - 7) + "\u2026 (10007 characters)", Shown.cell(cell));
        String exactly = "y".repeat(Shown.CELL_CHARACTERS);
        assertEquals(exactly, Shown.cell(exactly));
        // a character outside the basic plane is never cut in two
        String emoji = "z".repeat(Shown.CELL_CHARACTERS - 1) + "\uD83D\uDE00" + "tail";
        assertEquals("z".repeat(Shown.CELL_CHARACTERS - 1) + "\u2026 (" + emoji.length() + " characters)", Shown.cell(emoji));
    }

    @Test
    void messagesAndLocationsStayOnOneLine() {
        MessageKey key = new MessageKey() {
            @Override
            public String name() {
                return "TEST";
            }

            @Override
            public String english() {
                return "'%s' is not a number (%d)";
            }
        };
        assertEquals("'22.001\\n1' is not a number (3)", key.format("22.001\n1", 3));
        assertEquals("in\\nfile.csv, row 2, column x\\t1", Location.cell("in\nfile.csv", 2, "x\t1").toString());
    }
}
