package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** {@link CsvLines} gives the lines {@link BufferedReader#readLine} gives over a UTF-8 {@link InputStreamReader}. */
class CsvLinesTest {

    private static List<String> reference(byte[] bytes) throws IOException {
        List<String> lines = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(new ByteArrayInputStream(bytes), StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                lines.add(line);
            }
        }
        return lines;
    }

    private static List<String> ours(byte[] bytes, int buffer) throws IOException {
        List<String> lines = new ArrayList<>();
        CsvLines r = new CsvLines(new ByteArrayInputStream(bytes), buffer);
        for (String line = r.readLine(); line != null; line = r.readLine()) {
            lines.add(line);
        }
        return lines;
    }

    private static void same(byte[] bytes) throws IOException {
        List<String> expected = reference(bytes);
        for (int buffer : new int[] {16, 17, 64, 1 << 16}) { // small buffers put terminators and sequences on the edges
            assertEquals(expected, ours(bytes, buffer), () -> "buffer " + buffer + ", bytes " + java.util.Arrays.toString(bytes));
        }
    }

    @Test
    void terminatorsAndEnds() throws IOException {
        for (String s : new String[] {"", "a", "a\n", "a\r", "a\r\n", "\n", "\r\n", "\r\r\n\n", "a\n\nb", "a\rb\r\nc\n\rd",
                "\uFEFFplan,slot\r\nPR-1@abc,S01\r\n", "Maß;Ø;10,5\n", "x".repeat(100) + "\r" + "y".repeat(40) + "\n"}) {
            same(s.getBytes(StandardCharsets.UTF_8));
        }
    }

    /** 3,000 random byte strings (fixed seed) rich in terminators, multi-byte lead and continuation bytes. */
    @Test
    void randomBytesIncludingMalformedUtf8() throws IOException {
        Random r = new Random(6L);
        byte[] alphabet = {'a', ',', ' ', '\n', '\r', (byte) 0xC3, (byte) 0xA9, (byte) 0xE2, (byte) 0x82, (byte) 0xAC,
                (byte) 0xF0, (byte) 0x9F, (byte) 0x98, (byte) 0x80, (byte) 0xFF, (byte) 0xC0, (byte) 0xED, (byte) 0xA0,
                (byte) 0xEF, (byte) 0xBB, (byte) 0xBF};
        for (int t = 0; t < 3000; t++) {
            byte[] b = new byte[r.nextInt(80)];
            for (int i = 0; i < b.length; i++) {
                b[i] = alphabet[r.nextInt(alphabet.length)];
            }
            same(b);
        }
    }
}
