package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Files that are not text are refused before a CSV reader sees them. */
class TextFileTest {

    @TempDir
    Path dir;

    @Test
    void textInUtf8OrALegacyCodePageIsText() {
        assertTrue(TextFile.isText("plan,slot\r\nPR-1,S01\t\n".getBytes(StandardCharsets.UTF_8)));
        assertTrue(TextFile.isText("operator\nM\u00fcller\n".getBytes(StandardCharsets.UTF_8)));
        // "Müller" as a spreadsheet in Windows-1252 saves it: 0xFC is not UTF-8, but it is text
        assertTrue(TextFile.isText(new byte[] {'M', (byte) 0xfc, 'l', 'l', 'e', 'r', '\n'}));
        assertTrue(TextFile.isText(new byte[0]));
    }

    @Test
    void aNulOrManyControlBytesMarkBinaryContentWithTheFirstOffset() {
        assertEquals(3, TextFile.firstBinaryByte(new byte[] {'a', 'b', 'c', 0, 'd'}));
        // a PNG signature: 0x89 'P' 'N' 'G' CR LF 0x1A LF, then a NUL-bearing chunk length
        byte[] png = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n', 0, 0, 0, 13};
        assertEquals(8, TextFile.firstBinaryByte(png));
        // one stray control byte in a long text file is not enough
        byte[] text = ("x".repeat(500) + "\u0001" + "y".repeat(500)).getBytes(StandardCharsets.US_ASCII);
        assertFalse(TextFile.firstBinaryByte(text) >= 0);
    }

    @Test
    void aBinaryFileIsOneLineNamingTheFile() throws IOException {
        Path f = dir.resolve("photo.csv");
        Files.write(f, new byte[] {(byte) 0xff, (byte) 0xd8, (byte) 0xff, (byte) 0xe0, 0, 16, 'J', 'F', 'I', 'F', 0});
        UserException e = assertThrows(UserException.class, () -> TextFile.requireText(f, "photo.csv"));
        assertEquals("photo.csv: not a text file (binary content at byte 5): give the CSV file, or an .xlsx file "
                + "where one is accepted", e.getMessage());
        TextFile.requireText(dir.resolve("missing.csv"), "missing.csv"); // left to the reader's own message
    }
}
