package dev.proofrun.app.session;

import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads a list of characteristics from CSV with the header {@link CharacteristicField#headers()}
 * (any order, case ignored; {@code id} and {@code unit} and at least one of {@code lsl}/{@code usl} must be
 * present as columns; the other columns may be left out). The text is taken as written; the Part step
 * validates it as it does typed input, so an imported list shows its problems in the table.
 */
public final class CharacteristicListFile {

    private CharacteristicListFile() {
    }

    /**
     * @throws UserException naming the file (and row/column) when the file cannot be read, has no header,
     *                       lacks a required column, has an unknown column or no rows
     */
    public static List<CharacteristicDraft> read(Path file) {
        String name = file.getFileName().toString();
        CSVFormat format = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                .setIgnoreSurroundingSpaces(true).setIgnoreEmptyLines(true).get();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser csv = CSVParser.parse(in, format)) {
            Map<String, String> columns = new HashMap<>();
            for (String h : csv.getHeaderNames()) {
                String key = h.replace("\uFEFF", "").trim().toLowerCase(Locale.ROOT);
                boolean known = false;
                for (CharacteristicField f : CharacteristicField.values()) {
                    known |= f.header().equals(key);
                }
                if (!known) {
                    throw new UserException(Location.cell(name, 1, h), ImportMessage.UNKNOWN_COLUMN, h, CharacteristicField.headers());
                }
                columns.put(key, h);
            }
            for (String required : List.of("id", "unit")) {
                if (!columns.containsKey(required)) {
                    throw new UserException(Location.cell(name, 1, required), ImportMessage.MISSING_COLUMN, required);
                }
            }
            if (!columns.containsKey("lsl") && !columns.containsKey("usl")) {
                throw new UserException(Location.cell(name, 1, "lsl"), ImportMessage.NO_LIMIT_COLUMN);
            }
            List<CharacteristicDraft> rows = new ArrayList<>();
            for (CSVRecord r : csv) {
                if (!r.isConsistent()) {
                    throw new UserException(Location.cell(name, r.getRecordNumber() + 1, null),
                            ImportMessage.ROW_LENGTH, r.size(), columns.size());
                }
                Map<String, String> values = new HashMap<>();
                columns.forEach((key, header) -> values.put(key, r.get(header)));
                rows.add(CharacteristicDraft.of(values));
            }
            if (rows.isEmpty()) {
                throw new UserException(Location.file(name), ImportMessage.NO_ROWS);
            }
            return rows;
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new UserException(Location.file(name), ImportMessage.UNREADABLE, e.getMessage());
        } catch (IllegalArgumentException | IllegalStateException e) {
            throw new UserException(Location.file(name), ImportMessage.UNREADABLE, e.getMessage());
        }
    }

    /** Problems with a characteristic list file. */
    public enum ImportMessage implements dev.proofrun.text.MessageKey {
        UNREADABLE("cannot read the list: %s"),
        UNKNOWN_COLUMN("unknown column '%s' (expected %s)"),
        MISSING_COLUMN("the column '%s' is required"),
        NO_LIMIT_COLUMN("a column lsl or usl is required"),
        ROW_LENGTH("the row has %d cells, the header %d"),
        NO_ROWS("the list has no characteristics");

        private final String english;

        ImportMessage(String english) {
            this.english = english;
        }

        @Override
        public String english() {
            return english;
        }
    }
}
