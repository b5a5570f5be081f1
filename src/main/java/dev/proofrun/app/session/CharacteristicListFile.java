package dev.proofrun.app.session;

import dev.proofrun.text.CsvReader;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Reads a list of characteristics from CSV with the header {@link CharacteristicField#headers()}
 * (any order, case ignored; {@code id} and {@code unit} and at least one of {@code lsl}/{@code usl} must be
 * present as columns; the other columns may be left out), read by the one reader in the one dialect
 * ({@link CsvReader}: {@code ,} or {@code ;} as the header uses more). The text is taken as written; the Part step
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
        try (CsvReader csv = CsvReader.open(file, name, ImportMessage.UNREADABLE, ImportMessage.UNREADABLE)) {
            if (!csv.next()) {
                throw new UserException(Location.file(name), ImportMessage.NO_ROWS);
            }
            String[] headers = csv.copy();
            Map<String, Integer> columns = new HashMap<>();
            for (int i = 0; i < headers.length; i++) {
                String h = headers[i];
                String key = h.toLowerCase(Locale.ROOT);
                boolean known = false;
                for (CharacteristicField f : CharacteristicField.values()) {
                    known |= f.header().equals(key);
                }
                if (!known) {
                    throw new UserException(Location.cell(name, csv.row(), h), ImportMessage.UNKNOWN_COLUMN, h, CharacteristicField.headers());
                }
                if (columns.put(key, i) != null) {
                    throw new UserException(Location.cell(name, csv.row(), h), ImportMessage.UNREADABLE,
                            "the header names '" + h + "' twice");
                }
            }
            for (String required : List.of("id", "unit")) {
                if (!columns.containsKey(required)) {
                    throw new UserException(Location.cell(name, csv.row(), required), ImportMessage.MISSING_COLUMN, required);
                }
            }
            if (!columns.containsKey("lsl") && !columns.containsKey("usl")) {
                throw new UserException(Location.cell(name, csv.row(), "lsl"), ImportMessage.NO_LIMIT_COLUMN);
            }
            List<CharacteristicDraft> rows = new ArrayList<>();
            while (csv.next()) {
                if (csv.count() != headers.length) {
                    throw new UserException(Location.cell(name, csv.row(), null), ImportMessage.ROW_LENGTH, csv.count(), headers.length);
                }
                Map<String, String> values = new HashMap<>();
                columns.forEach((key, at) -> values.put(key, csv.cell(at)));
                rows.add(CharacteristicDraft.of(values));
            }
            if (rows.isEmpty()) {
                throw new UserException(Location.file(name), ImportMessage.NO_ROWS);
            }
            return rows;
        } catch (NoSuchFileException e) {
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
