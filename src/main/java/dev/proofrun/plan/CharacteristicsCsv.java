package dev.proofrun.plan;

import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SpecLimits;
import dev.proofrun.text.Location;
import dev.proofrun.text.TextFile;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
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
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Many characteristics at once from a CSV file with a header row. Columns (names case-insensitive, any
 * order): {@code id, name, unit, nominal, lsl, usl, target, expected}, and optionally {@code index},
 * {@code confidence}, {@code expected_cp}, {@code shape}, {@code threshold} (the declared threshold of a
 * {@code lognormal3} or {@code weibull3} shape, required there and refused elsewhere). Empty cells mean "none" for
 * nominal/lsl/usl/expected_cp/threshold,
 * "the command's default" for index and confidence, and "normal" for shape (the names are those of
 * {@link ShapeFamily}; an unknown name is refused with the list). Numbers use a decimal point; a row with more cells than
 * the header (a decimal comma splits a number) is refused.
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
        TextFile.requireText(file, name);
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser parser = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                     .setIgnoreSurroundingSpaces(true).setIgnoreEmptyLines(true).build().parse(in)) {
            Map<String, String> header = new TreeMap<>();
            for (String h : parser.getHeaderNames()) {
                header.put(h.trim().replace('\uFEFF', ' ').trim().toLowerCase(Locale.ROOT), h);
            }
            for (String col : REQUIRED) {
                if (!header.containsKey(col)) {
                    throw new UserException(Location.cell(name, 1, col), PlanMessage.CSV_MISSING_COLUMN, col,
                            String.join(",", REQUIRED));
                }
            }
            List<Characteristic> out = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            for (CSVRecord r : parser) {
                long row = r.getRecordNumber() + 1;
                for (int i = parser.getHeaderNames().size(); i < r.size(); i++) {
                    if (!r.get(i).isBlank()) {
                        throw new UserException(Location.cell(name, row, null), PlanMessage.CSV_EXTRA_CELLS, r.size(),
                                parser.getHeaderNames().size());
                    }
                }
                Cells c = new Cells(name, row, r, header);
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
                OptionalDouble threshold = thresholdCell(c, id, shape, limits);
                out.add(c.build("id", () -> new Characteristic(id, c.text("name", true), c.text("unit", false),
                        c.number("nominal"), limits, Optional.empty(), req, exp, shape, threshold)));
            }
            if (out.isEmpty()) {
                throw new UserException(Location.file(name), PlanMessage.CSV_NO_ROWS);
            }
            return out;
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new UserException(Location.file(name), PlanMessage.CANNOT_READ, e.getMessage());
        } catch (IllegalArgumentException e) {
            throw new UserException(Location.file(name), PlanMessage.CSV_BAD_CELL, e.getMessage());
        }
    }

    private static Double boxed(OptionalDouble x) {
        return x.isPresent() ? x.getAsDouble() : null;
    }

    /** One row's cells with their location. */
    /** The threshold cell, checked against the shape and the upper limit (the message names the threshold cell, or shape when it is missing). */
    private static OptionalDouble thresholdCell(Cells c, String id, ShapeFamily shape, SpecLimits limits) {
        OptionalDouble threshold = c.number("threshold");
        c.build(threshold.isPresent() ? "threshold" : "shape", () -> {
            Characteristic.requireThreshold(id, shape, threshold, limits);
            return threshold;
        });
        return threshold;
    }

    private static final class Cells {
        private final String file;
        private final long row;
        private final CSVRecord record;
        private final Map<String, String> header;

        Cells(String file, long row, CSVRecord record, Map<String, String> header) {
            this.file = file;
            this.row = row;
            this.record = record;
            this.header = header;
        }

        boolean has(String col) {
            return !raw(col).isEmpty();
        }

        String raw(String col) {
            String h = header.get(col);
            if (h == null || !record.isSet(h)) {
                return "";
            }
            return record.get(h).trim();
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
            try {
                double x = Double.parseDouble(v);
                if (!Double.isFinite(x)) {
                    throw new NumberFormatException();
                }
                return OptionalDouble.of(x);
            } catch (NumberFormatException e) {
                throw new UserException(Location.cell(file, row, col), PlanMessage.CSV_BAD_CELL, "not a number: '" + v + "'");
            }
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
