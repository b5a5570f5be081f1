package dev.proofrun.text;

import java.io.Closeable;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/**
 * The one CSV reader of proofrun — returned files, files of readings, characteristic lists — in the one dialect
 * ({@link CsvDialect}): UTF-8 with an optional byte-order mark, {@code ,} or {@code ;} as the header line uses
 * more, blank rows skipped (a row of nothing but spaces and separators is blank), cells trimmed, fields in
 * double quotes with {@code ""} for a quote. A quoted field may not span lines (no file proofrun reads needs
 * that; such a file is refused at the row where the quote opens). Rows are the file's line numbers, as a
 * spreadsheet shows them; the first non-blank row is the header. Streams: one line in memory at a time.
 *
 * <p>Hand-made rather than commons-csv because it splits a returned file of 1,000,000 readings about three times
 * as fast (JMH, {@code src/bench/.../CsvReaderBenchmark}; {@code docs/decisions/one-csv-reader.md}).
 *
 * <pre>
 * try (CsvReader csv = CsvReader.open(file, display, MyMessage.UNREADABLE, MyMessage.BAD_CSV)) {
 *     while (csv.next()) { ... csv.row(), csv.cell(i), csv.count() ... }
 * }
 * </pre>
 */
public final class CsvReader implements Closeable {

    private final InputStream in;
    private final CsvLines lines;
    private final String display;
    private final MessageKey unreadable;
    private final MessageKey malformed;
    private char separator;
    private long line;
    private long row;
    private String[] cells = new String[32];
    private int count;

    private CsvReader(InputStream in, String display, MessageKey unreadable, MessageKey malformed) {
        this.in = in;
        this.lines = new CsvLines(in, 1 << 16);
        this.display = display;
        this.unreadable = unreadable;
        this.malformed = malformed;
    }

    /**
     * Opens a file for reading.
     *
     * @param display    the file as messages name it
     * @param unreadable the caller's message for a file that cannot be read, with one {@code %s} for the reason
     * @param malformed  the caller's message for a row that is not CSV, with one {@code %s} for the reason
     * @throws NoSuchFileException for a missing file, so the caller can say so in its own words
     * @throws UserException       for a file that is not text or cannot be opened
     */
    public static CsvReader open(Path file, String display, MessageKey unreadable, MessageKey malformed)
            throws NoSuchFileException {
        if (!Files.exists(file)) {
            throw new NoSuchFileException(file.toString());
        }
        TextFile.requireText(file, display);
        try {
            return new CsvReader(Files.newInputStream(file), display, unreadable, malformed);
        } catch (NoSuchFileException e) {
            throw e;
        } catch (IOException e) {
            throw new UserException(Location.file(display), unreadable, e.getMessage());
        }
    }

    /** Moves to the next row that is not blank (the header first); false at the end of the file. */
    public boolean next() {
        try {
            String text;
            while ((text = lines.readLine()) != null) {
                line++;
                if (line == 1 && !text.isEmpty() && text.charAt(0) == '\uFEFF') {
                    text = text.substring(1);
                }
                if (isBlank(text)) {
                    continue;
                }
                if (separator == 0) {
                    separator = CsvDialect.separator(text);
                }
                count = split(text);
                if (count > cells.length) {
                    cells = new String[Math.max(count, 2 * cells.length)];
                    count = split(text);
                }
                if (allEmpty()) {
                    continue;
                }
                row = line;
                return true;
            }
            return false;
        } catch (IOException e) {
            throw new UserException(Location.file(display), unreadable, e.getMessage());
        }
    }

    /** The separator the header line chose; 0 before the first row. */
    public char separator() {
        return separator;
    }

    /** The current row's line number (1-based). */
    public long row() {
        return row;
    }

    /** How many cells the current row has (missing trailing cells are absent). */
    public int count() {
        return count;
    }

    /** The current row's cell i, trimmed; "" beyond {@link #count()}. */
    public String cell(int i) {
        return i >= 0 && i < count ? cells[i] : "";
    }

    /**
     * The current row's cells: the first {@link #count()} are valid. The array is reused for the next row; copy
     * what you keep ({@link #copy()}).
     */
    public String[] cells() {
        return cells;
    }

    /** The current row's cells in an array of their own. */
    public String[] copy() {
        String[] out = new String[count];
        System.arraycopy(cells, 0, out, 0, count);
        return out;
    }

    @Override
    public void close() {
        try {
            in.close();
        } catch (IOException e) {
            throw new UserException(Location.file(display), unreadable, e.getMessage());
        }
    }

    /** Splits into cells (trimmed); returns the number of cells, which may exceed the array (then call again). */
    private int split(String text) {
        int n = 0;
        int i = 0;
        int len = text.length();
        char sep = separator;
        while (true) {
            String cell;
            while (i < len && text.charAt(i) == ' ') {
                i++;
            }
            if (i < len && text.charAt(i) == '"') {
                StringBuilder sb = new StringBuilder();
                i++;
                boolean closed = false;
                while (i < len) {
                    char c = text.charAt(i);
                    if (c == '"') {
                        if (i + 1 < len && text.charAt(i + 1) == '"') {
                            sb.append('"');
                            i += 2;
                            continue;
                        }
                        i++;
                        closed = true;
                        break;
                    }
                    sb.append(c);
                    i++;
                }
                if (!closed) {
                    throw new UserException(Location.cell(display, line, null), malformed, "a quoted field is not closed on its line");
                }
                cell = sb.toString().trim();
                while (i < len && text.charAt(i) != sep) {
                    i++;
                }
            } else {
                int start = i;
                i = text.indexOf(sep, i); // String.indexOf is vectorised by the JVM: the hot loop of a large file
                if (i < 0) {
                    i = len;
                }
                cell = text.substring(start, i).trim();
            }
            if (n < cells.length) {
                cells[n] = cell;
            }
            n++;
            if (i >= len) {
                return n;
            }
            i++; // the separator
        }
    }

    private static boolean isBlank(String text) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c != ' ' && c != '\t' && c != ',' && c != ';') {
                return false;
            }
        }
        return true;
    }

    private boolean allEmpty() {
        for (int i = 0; i < count; i++) {
            if (!cells[i].isEmpty()) {
                return false;
            }
        }
        return true;
    }
}
