package dev.proofrun.grade;

import dev.proofrun.text.CsvDialect;
import dev.proofrun.text.Location;
import dev.proofrun.text.TextFile;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads a returned CSV file as people leave it after editing, in the one dialect ({@link CsvDialect}): a UTF-8
 * byte-order mark, blank rows, cells padded with spaces, {@code ,} or {@code ;} as the separator, fields in double quotes with {@code ""} for a quote.
 * Row numbers are the file's line numbers, as a spreadsheet shows them. A quoted field may not span lines
 * (the fill-in files never need that). Streams: one line in memory at a time.
 */
final class CsvTable {

    private CsvTable() {
    }

    static void read(Path path, String display, RowHandler handler) {
        TextFile.requireText(path, display);
        try (InputStream in = Files.newInputStream(path)) {
            CsvLines reader = new CsvLines(in, 1 << 16);
            String line;
            long row = 0;
            char separator = 0;
            String[] cells = new String[32];
            while ((line = reader.readLine()) != null) {
                row++;
                if (row == 1 && !line.isEmpty() && line.charAt(0) == '\uFEFF') {
                    line = line.substring(1);
                }
                if (isBlank(line)) {
                    continue;
                }
                if (separator == 0) {
                    separator = CsvDialect.separator(line);
                    handler.separator(separator);
                    int n = split(line, separator, cells, display, row);
                    if (n > cells.length) {
                        cells = ensure(cells, n);
                        n = split(line, separator, cells, display, row);
                    }
                    String[] header = new String[n];
                    System.arraycopy(cells, 0, header, 0, n);
                    handler.header(row, header);
                    continue;
                }
                int n = split(line, separator, cells, display, row);
                if (n > cells.length) {
                    cells = ensure(cells, n);
                    n = split(line, separator, cells, display, row);
                }
                if (allEmpty(cells, n)) {
                    continue;
                }
                handler.row(row, cells, n);
            }
        } catch (IOException e) {
            throw new UserException(Location.file(display), GradeMessage.FILE_UNREADABLE, e.getMessage());
        }
    }

    private static String[] ensure(String[] cells, int n) {
        return n <= cells.length ? cells : new String[Math.max(n, cells.length * 2)];
    }

    /** Splits into cells (trimmed); returns the number of cells, which may exceed the array (then call again). */
    private static int split(String line, char sep, String[] cells, String display, long row) {
        int n = 0;
        int i = 0;
        int len = line.length();
        while (true) {
            String cell;
            while (i < len && line.charAt(i) == ' ') {
                i++;
            }
            if (i < len && line.charAt(i) == '"') {
                StringBuilder sb = new StringBuilder();
                i++;
                boolean closed = false;
                while (i < len) {
                    char c = line.charAt(i);
                    if (c == '"') {
                        if (i + 1 < len && line.charAt(i + 1) == '"') {
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
                    throw new UserException(Location.cell(display, row, null), GradeMessage.FILE_UNREADABLE,
                            "a quoted field is not closed on its line");
                }
                cell = sb.toString().trim();
                while (i < len && line.charAt(i) != sep) {
                    i++;
                }
            } else {
                int start = i;
                i = line.indexOf(sep, i); // String.indexOf is vectorised by the JVM: the hot loop of a large file
                if (i < 0) {
                    i = len;
                }
                cell = line.substring(start, i).trim();
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

    private static boolean isBlank(String line) {
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c != ' ' && c != '\t' && c != ',' && c != ';') {
                return false;
            }
        }
        return true;
    }

    private static boolean allEmpty(String[] cells, int n) {
        for (int i = 0; i < n; i++) {
            if (!cells[i].isEmpty()) {
                return false;
            }
        }
        return true;
    }
}
