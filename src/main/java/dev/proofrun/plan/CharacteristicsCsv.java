package dev.proofrun.plan;

import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.CsvDialect;
import dev.proofrun.text.CsvReader;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeMap;

/**
 * Many characteristics at once from a CSV file with a header row. Columns (names case-insensitive, any
 * order): {@code id, name, unit, nominal, lsl, usl, target, expected}, and optionally {@code index},
 * {@code confidence}, {@code expected_cp}, {@code shape}, {@code threshold} (the declared threshold of a
 * {@code lognormal3} or {@code weibull3} shape) and {@code floor} (the stop below an unknown threshold): exactly one
 * of the two for those shapes, refused elsewhere. Empty cells mean "none" for
 * nominal/lsl/usl/expected_cp/threshold/floor,
 * "the command's default" for index and confidence, and "normal" for shape (the names are those of
 * {@link ShapeFamily}; an unknown name is refused with the list). The file is read by the one reader in the one
 * dialect ({@link CsvReader}, {@link CsvDialect}: {@code ,} or {@code ;} as the header uses more, a point or a
 * single comma as the decimal mark); a row with more cells than the header (an unquoted decimal comma in a
 * {@code ,} file splits a number) is refused.
 */
public final class CharacteristicsCsv {

    private static final List<String> REQUIRED = List.of("id", "name", "unit", "nominal", "lsl", "usl", "target", "expected");

    private CharacteristicsCsv() {
    }

    /**
     * @throws UserException naming file, row and column for a missing column, a bad number or a refused value
     */
    public static List<Characteristic> read(Path file, IndexKind defaultIndex, double defaultConfidence) {
        String name = file.toString();
        try (CsvReader csv = CsvReader.open(file, name, PlanMessage.CSV_CANNOT_READ, PlanMessage.CSV_BAD_CELL)) {
            if (!csv.next()) {
                throw new UserException(Location.file(name), PlanMessage.CSV_NO_ROWS);
            }
            String[] names = csv.copy();
            Map<String, Integer> header = new TreeMap<>();
            for (int i = 0; i < names.length; i++) {
                header.put(names[i].toLowerCase(Locale.ROOT), i);
            }
            for (String col : REQUIRED) {
                if (!header.containsKey(col)) {
                    throw new UserException(Location.cell(name, csv.row(), col), PlanMessage.CSV_MISSING_COLUMN, col,
                            String.join(",", REQUIRED));
                }
            }
            List<Characteristic> out = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            while (csv.next()) {
                long row = csv.row();
                for (int i = names.length; i < csv.count(); i++) {
                    if (!csv.cell(i).isEmpty()) {
                        throw new UserException(Location.cell(name, row, null), PlanMessage.CSV_EXTRA_CELLS, csv.count(),
                                names.length);
                    }
                }
                Cells c = new Cells(name, row, csv.copy(), header);
                String id = c.text("id", true);
                if (!ids.add(id)) {
                    throw new UserException(Location.cell(name, row, "id"), PlanMessage.CSV_BAD_CELL, "the id " + id + " is used twice");
                }
                IndexKind index = c.has("index") ? c.parse("index", IndexKind::fromToken) : defaultIndex;
                double confidence = c.has("confidence") ? c.number("confidence").getAsDouble() : defaultConfidence;
                OptionalDouble expectedCp = c.number("expected_cp");
                ShapeFamily shape = c.has("shape") ? c.parse("shape", ShapeFamily::fromToken) : ShapeFamily.NORMAL;
                SpecLimits limits = c.build("lsl", () -> SpecLimits.of(boxed(c.number("lsl")), boxed(c.number("usl"))));
                Requirement req = c.build("target", () -> Requirement.of(index, c.required("target"), confidence));
                Expectation exp = c.build("expected", () -> new Expectation(c.required("expected"), expectedCp));
                OptionalDouble threshold = c.number("threshold");
                OptionalDouble floor = c.number("floor");
                c.build(floor.isPresent() ? "floor" : threshold.isPresent() ? "threshold" : "shape", () -> {
                    Characteristic.requireThreshold(id, shape, threshold, floor, limits);
                    return threshold;
                });
                out.add(c.build("id", () -> new Characteristic(id, c.text("name", true), c.text("unit", false),
                        c.number("nominal"), limits, Optional.empty(), req, exp, shape, threshold, floor)));
            }
            if (out.isEmpty()) {
                throw new UserException(Location.file(name), PlanMessage.CSV_NO_ROWS);
            }
            return out;
        } catch (NoSuchFileException e) {
            throw new UserException(Location.file(name), PlanMessage.CSV_CANNOT_READ, e.getMessage());
        } catch (IllegalArgumentException e) {
            throw new UserException(Location.file(name), PlanMessage.CSV_BAD_CELL, e.getMessage());
        }
    }

    private static Double boxed(OptionalDouble x) {
        return x.isPresent() ? x.getAsDouble() : null;
    }

    /** One row's cells with their location. */

    private static final class Cells {
        private final String file;
        private final long row;
        private final String[] cells;
        private final Map<String, Integer> header;

        Cells(String file, long row, String[] cells, Map<String, Integer> header) {
            this.file = file;
            this.row = row;
            this.cells = cells;
            this.header = header;
        }

        boolean has(String col) {
            return !raw(col).isEmpty();
        }

        String raw(String col) {
            Integer at = header.get(col);
            return at == null || at >= cells.length ? "" : cells[at];
        }

        String text(String col, boolean required) {
            String v = raw(col);
            if (required && v.isEmpty()) {
                throw new UserException(Location.cell(file, row, col), PlanMessage.CSV_BAD_CELL, "a value is required");
            }
            return v;
        }

        OptionalDouble number(String col) {
            String v = raw(col);
            if (v.isEmpty()) {
                return OptionalDouble.empty();
            }
            double x = CsvDialect.number(v);
            if (Double.isNaN(x) || CsvDialect.namesNonFinite(v, x)) {
                throw new UserException(Location.cell(file, row, col), PlanMessage.CSV_BAD_CELL, "not a number: '" + v + "'");
            }
            return OptionalDouble.of(x);
        }

        double required(String col) {
            OptionalDouble x = number(col);
            if (x.isEmpty()) {
                throw new UserException(Location.cell(file, row, col), PlanMessage.CSV_BAD_CELL, "a number is required");
            }
            return x.getAsDouble();
        }

        <T> T parse(String col, java.util.function.Function<String, T> f) {
            return build(col, () -> f.apply(raw(col)));
        }

        <T> T build(String col, java.util.function.Supplier<T> make) {
            try {
                return make.get();
            } catch (IllegalArgumentException e) {
                throw new UserException(Location.cell(file, row, col), PlanMessage.CSV_BAD_CELL, e.getMessage());
            }
        }
    }
}
