package dev.proofrun.readings;

import dev.proofrun.text.CsvDialect;
import dev.proofrun.text.CsvReader;
import dev.proofrun.text.Location;
import dev.proofrun.text.Shown;
import dev.proofrun.text.UserException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalInt;

/**
 * Reads a CSV file of readings for a capability estimate, one row at a time ({@link CsvReader}), in one of
 * three layouts chosen by the header (names case-insensitive, other columns ignored):
 * <ul>
 * <li>{@code value}: one reading per row, in time order; with {@code subgroupSize} consecutive
 *     readings form subgroups (the count must fill them), otherwise they are individuals;</li>
 * <li>{@code value} and {@code subgroup}: readings grouped by the label, subgroups in the order their
 *     label first appears;</li>
 * <li>{@code x1, x2, ..., xn}: one subgroup per row; blank cells are skipped, so a row may hold fewer.</li>
 * </ul>
 * Rows are numbered as a spreadsheet shows them (the header is row 1); blank lines are skipped. The file is in
 * the one dialect of {@link CsvDialect}: {@code ,} or {@code ;} as the header uses more, a point or a single
 * comma as the decimal mark ({@link CsvDialect#number}); {@code NaN}, {@code Infinity} and numbers that overflow ({@code 1e309})
 * are refused as not finite, and readings beyond ±{@value #MAGNITUDE} as too large to compute with. Every problem is a {@link UserException} naming file, row and
 * column.
 */
public final class ReadingsCsv {

    /**
     * No reading beyond ± this is taken: its square (1e200) and any sum of squares a file can hold stay far from
     * overflow (the largest double is about 1.8e308), so no estimate collapses to 0 or infinity on a typing
     * error such as 1e300. The grader uses the same bound.
     */
    static final double MAGNITUDE = 1e100;

    private ReadingsCsv() {
    }

    /**
     * Reads the file.
     *
     * @param file         the file
     * @param subgroupSize consecutive readings per subgroup for the {@code value} layout, or empty
     * @throws UserException for a missing, unreadable, empty or malformed file, a bad cell, fewer than
     *                       two readings, or a subgroup size that does not fit the layout or the count
     */
    public static Readings read(Path file, OptionalInt subgroupSize) {
        String name = file.toString();
        if (subgroupSize.isPresent() && subgroupSize.getAsInt() < 1) {
            throw new UserException(Location.file(name), ReadingsMessage.BAD_SUBGROUP_SIZE, subgroupSize.getAsInt());
        }
        try (CsvReader csv = CsvReader.open(file, name, ReadingsMessage.NOT_READABLE, ReadingsMessage.BAD_CSV)) {
            return parse(name, csv, subgroupSize);
        } catch (NoSuchFileException e) {
            throw new UserException(Location.file(name), ReadingsMessage.NOT_FOUND);
        }
    }

    private static Readings parse(String name, CsvReader records, OptionalInt subgroupSize) {
        Row header = next(records);
        if (header == null) {
            throw new UserException(Location.file(name), ReadingsMessage.EMPTY_FILE);
        }
        Map<String, Integer> columns = columns(name, header);
        Integer value = columns.get("value");
        Integer label = columns.get("subgroup");
        if (value != null) {
            if (label != null) {
                requireNoSize(name, subgroupSize, SubgroupLayout.LABELLED);
                return labelled(name, records, header, value, label);
            }
            return values(name, records, header, value, subgroupSize);
        }
        if (columns.containsKey("x1")) {
            requireNoSize(name, subgroupSize, SubgroupLayout.WIDE);
            return wide(name, records, header, columns);
        }
        throw new UserException(Location.cell(name, header.number(), null), ReadingsMessage.NO_HEADER);
    }

    private static Readings values(String name, CsvReader records, Row header, int value,
            OptionalInt subgroupSize) {
        double[] xs = new double[1024];
        long[] rows = new long[1024];
        int count = 0;
        long row = header.number();
        String column = header.get(value);
        for (Row r = next(records); r != null; r = next(records)) {
            row = r.number();
            checkWidth(name, r, header);
            if (count == xs.length) {
                xs = Arrays.copyOf(xs, 2 * count);
                rows = Arrays.copyOf(rows, 2 * count);
            }
            xs[count] = number(name, r, value, column, true);
            rows[count] = row;
            count++;
        }
        requireTwo(name, count);
        int size = subgroupSize.orElse(1);
        int remainder = count % size;
        if (remainder != 0) {
            throw new UserException(Location.cell(name, rows[count - remainder], column),
                    ReadingsMessage.INCOMPLETE_SUBGROUP, count, size, remainder);
        }
        List<double[]> groups = new ArrayList<>(count / size);
        for (int i = 0; i < count; i += size) {
            groups.add(Arrays.copyOfRange(xs, i, i + size));
        }
        return new Readings(name, SubgroupLayout.VALUES, groups, count);
    }

    private static Readings labelled(String name, CsvReader records, Row header, int value, int label) {
        Map<String, double[]> groups = new LinkedHashMap<>();
        Map<String, Integer> sizes = new HashMap<>();
        long count = 0;
        long row = header.number();
        String valueColumn = header.get(value);
        for (Row r = next(records); r != null; r = next(records)) {
            row = r.number();
            checkWidth(name, r, header);
            String key = cell(r, label);
            if (key.isEmpty()) {
                throw new UserException(Location.cell(name, row, header.get(label)), ReadingsMessage.MISSING_LABEL);
            }
            double x = number(name, r, value, valueColumn, true);
            double[] g = groups.computeIfAbsent(key, k -> new double[4]);
            int n = sizes.getOrDefault(key, 0);
            if (n == g.length) {
                g = Arrays.copyOf(g, 2 * n);
                groups.put(key, g);
            }
            g[n] = x;
            sizes.put(key, n + 1);
            count++;
        }
        requireTwo(name, count);
        List<double[]> list = new ArrayList<>(groups.size());
        groups.forEach((k, g) -> list.add(Arrays.copyOf(g, sizes.get(k))));
        return new Readings(name, SubgroupLayout.LABELLED, list, count);
    }

    private static Readings wide(String name, CsvReader records, Row header, Map<String, Integer> columns) {
        int width = 0;
        for (String c : columns.keySet()) {
            if (c.matches("x[1-9][0-9]{0,3}")) {
                width = Math.max(width, Integer.parseInt(c.substring(1)));
            }
        }
        int[] index = new int[width];
        for (int j = 1; j <= width; j++) {
            Integer at = columns.get("x" + j);
            if (at == null) {
                throw new UserException(Location.cell(name, header.number(), null), ReadingsMessage.MISSING_COLUMN, j);
            }
            index[j - 1] = at;
        }
        List<double[]> groups = new ArrayList<>();
        long count = 0;
        long row = header.number();
        double[] buffer = new double[width];
        for (Row r = next(records); r != null; r = next(records)) {
            row = r.number();
            checkWidth(name, r, header);
            int n = 0;
            for (int j = 0; j < width; j++) {
                if (!cell(r, index[j]).isEmpty()) {
                    buffer[n++] = number(name, r, index[j], header.get(index[j]), false);
                }
            }
            if (n == 0) {
                throw new UserException(Location.cell(name, row, null), ReadingsMessage.EMPTY_ROW);
            }
            groups.add(Arrays.copyOf(buffer, n));
            count += n;
        }
        requireTwo(name, count);
        return new Readings(name, SubgroupLayout.WIDE, groups, count);
    }

    private static Map<String, Integer> columns(String name, Row header) {
        Map<String, Integer> columns = new HashMap<>();
        for (int i = 0; i < header.size(); i++) {
            String c = header.get(i).replace("\uFEFF", "").trim().toLowerCase(Locale.ROOT);
            if (c.isEmpty()) {
                continue;
            }
            if (columns.put(c, i) != null && (c.equals("value") || c.equals("subgroup") || c.matches("x[0-9]+"))) {
                throw new UserException(Location.cell(name, header.number(), header.get(i)),
                        ReadingsMessage.DUPLICATE_COLUMN, Shown.cell(header.get(i)));
            }
        }
        return columns;
    }

    private static double number(String name, Row r, int index, String column, boolean required) {
        String text = cell(r, index);
        if (text.isEmpty()) {
            if (required) {
                throw new UserException(Location.cell(name, r.number(), column), ReadingsMessage.MISSING_VALUE);
            }
            return Double.NaN;
        }
        double x = CsvDialect.number(text);
        Location where = Location.cell(name, r.number(), column);
        if (CsvDialect.namesNonFinite(text, x)) {
            throw new UserException(where, ReadingsMessage.NOT_FINITE, Shown.cell(text));
        }
        if (Double.isNaN(x)) {
            throw new UserException(where, ReadingsMessage.NOT_A_NUMBER, Shown.cell(text));
        }
        if (Math.abs(x) > MAGNITUDE) {
            throw new UserException(where, ReadingsMessage.TOO_LARGE, Shown.cell(text), MAGNITUDE);
        }
        return x;
    }

    private static void checkWidth(String name, Row r, Row header) {
        for (int i = header.size(); i < r.size(); i++) {
            if (!r.get(i).isEmpty()) {
                throw new UserException(Location.cell(name, r.number(), null), ReadingsMessage.EXTRA_CELLS,
                        r.size(), header.size());
            }
        }
    }

    private static String cell(Row r, int index) {
        return index < r.size() ? r.get(index) : "";
    }

    private static void requireTwo(String name, long count) {
        if (count < 2) {
            throw new UserException(Location.file(name), ReadingsMessage.TOO_FEW_READINGS, count);
        }
    }

    private static void requireNoSize(String name, OptionalInt subgroupSize, SubgroupLayout layout) {
        if (subgroupSize.isPresent()) {
            throw new UserException(Location.file(name), ReadingsMessage.SIZE_WITH_SUBGROUPS, layout.description());
        }
    }

    /** The next row that is not blank, or null at the end. */
    private static Row next(CsvReader records) {
        return records.next() ? new Row(records.row(), records.copy()) : null;
    }

    /** One row of the file: its line number and its cells, trimmed. */
    private record Row(long number, String[] cells) {

        int size() {
            return cells.length;
        }

        String get(int i) {
            return cells[i];
        }
    }
}
