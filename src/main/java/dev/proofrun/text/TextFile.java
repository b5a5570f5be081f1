package dev.proofrun.text;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * Refuses a file that is not text before a CSV reader sees it: a picture, a spreadsheet saved in its own
 * format, an executable. Looks at the first {@value #PROBE} bytes for NUL and other control bytes, which
 * text has (almost) none of ({@link #firstBinaryByte}). Without this check the readers' own decoders fail
 * with messages such as "Input length = 1", which say nothing to the person who chose the file.
 */
public final class TextFile {

    /** How much of the file is looked at. */
    static final int PROBE = 64 * 1024;

    private TextFile() {
    }

    /**
     * @param file    the file
     * @param display the file as the user named it
     * @throws UserException when the first bytes are not UTF-8 text; a missing file is left to the caller
     */
    public static void requireText(Path file, String display) {
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(PROBE);
        } catch (NoSuchFileException e) {
            return; // the reader says "file not found" in its own words
        } catch (IOException e) {
            return; // likewise for a file that cannot be read
        }
        long at = firstBinaryByte(head);
        if (at >= 0) {
            throw new UserException(Location.file(display), TextMessage.NOT_TEXT, at + 1);
        }
    }

    /**
     * The offset of the first byte that marks binary content, or −1: a NUL byte, or control bytes (other than
     * tab, line feed, form feed, carriage return and escape) making up more than 1 % of the probe. Bytes that
     * are not UTF-8 are not held against a file: a CSV saved by a spreadsheet in a legacy 8-bit code page
     * ("Müller" in Windows-1252) is text, and the readers decide what to make of it.
     */
    static long firstBinaryByte(byte[] head) {
        int first = -1;
        int controls = 0;
        for (int i = 0; i < head.length; i++) {
            int b = head[i] & 0xff;
            if (b == 0) {
                return i;
            }
            if (b < 0x20 && b != '\t' && b != '\n' && b != '\f' && b != '\r' && b != 0x1b) {
                controls++;
                if (first < 0) {
                    first = i;
                }
            }
        }
        return controls > 0 && controls * 100L > head.length ? first : -1;
    }

    /** For tests: the same check on bytes in memory. */
    static boolean isText(byte[] bytes) {
        return firstBinaryByte(Arrays.copyOf(bytes, Math.min(bytes.length, PROBE))) < 0;
    }
}
