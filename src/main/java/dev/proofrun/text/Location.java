package dev.proofrun.text;

import java.util.Objects;

/**
 * Where in a user's file a problem sits. Row and column are 1-based as a spreadsheet shows them; either
 * may be absent (0 / null) when the problem concerns the whole file or a whole row.
 *
 * @param file   the file as the user named it
 * @param row    1-based row, or 0 when not tied to a row
 * @param column the column header or letter, or {@code null}
 */
public record Location(String file, long row, String column) {

    public Location {
        Objects.requireNonNull(file, "file");
    }

    public static Location file(String file) {
        return new Location(file, 0, null);
    }

    public static Location cell(String file, long row, String column) {
        return new Location(file, row, column);
    }

    /**
     * "data.csv, row 12, column x3" or shorter when row or column are unknown; the file name is shown
     * {@link Shown#escaped escaped} and the column header as a {@link Shown#cell cell} (it comes from the file).
     */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(Shown.escaped(file));
        if (row > 0) {
            sb.append(", row ").append(row);
        }
        if (column != null && !column.isEmpty()) {
            sb.append(", column ").append(Shown.cell(column));
        }
        return sb.toString();
    }
}
