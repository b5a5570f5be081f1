package dev.proofrun.text;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;

/**
 * The lines of a UTF-8 stream, exactly as {@code new BufferedReader(new InputStreamReader(in, UTF_8)).readLine()}
 * gives them (terminators {@code \n}, {@code \r} and {@code \r\n}; no empty line after a final terminator;
 * malformed bytes replaced), but found in the bytes: a line of ASCII bytes becomes a string by copying them,
 * without decoding to UTF-16 and compressing back, and only a line with other bytes is decoded.
 * {@code CsvLinesTest} compares both readers on random bytes.
 */
final class CsvLines {

    private final InputStream in;
    private byte[] buf;
    private int pos;
    private int lim;
    /** The last line ended with {@code \r}: a {@code \n} right after it belongs to that terminator. */
    private boolean skipLf;

    CsvLines(InputStream in, int bufferSize) {
        this.in = in;
        this.buf = new byte[Math.max(16, bufferSize)];
    }

    /** The next line without its terminator, or null at the end. */
    String readLine() throws IOException {
        if (skipLf) {
            skipLf = false;
            if (pos == lim) {
                fill();
            }
            if (pos < lim && buf[pos] == '\n') {
                pos++;
            }
        }
        int i = pos;
        boolean ascii = true;
        while (true) {
            while (i < lim) {
                byte b = buf[i];
                if (b == '\n' || b == '\r') {
                    String line = text(pos, i, ascii);
                    pos = i + 1;
                    skipLf = b == '\r';
                    return line;
                }
                if (b < 0) {
                    ascii = false;
                }
                i++;
            }
            int scanned = i - pos;
            if (!fill()) {
                if (pos == lim) {
                    return null;
                }
                String line = text(pos, lim, ascii);
                pos = lim;
                return line;
            }
            i = pos + scanned;
        }
    }

    private String text(int from, int to, boolean ascii) {
        return new String(buf, from, to - from, ascii ? StandardCharsets.ISO_8859_1 : StandardCharsets.UTF_8);
    }

    /** Moves the unread bytes to the front, grows the buffer when a line fills it, reads more; false at the end. */
    private boolean fill() throws IOException {
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, lim - pos);
            lim -= pos;
            pos = 0;
        }
        if (lim == buf.length) {
            buf = java.util.Arrays.copyOf(buf, buf.length * 2);
        }
        int got = in.read(buf, lim, buf.length - lim);
        if (got < 0) {
            return false;
        }
        lim += got;
        return true;
    }
}
