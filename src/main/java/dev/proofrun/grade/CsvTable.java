package dev.proofrun.grade;

import dev.proofrun.text.CsvReader;
import dev.proofrun.text.Location;
import dev.proofrun.text.UserException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/** Feeds a returned CSV file, read by the one reader ({@link CsvReader}), to a {@link RowHandler}, row by row. */
final class CsvTable {

    private CsvTable() {
    }

    static void read(Path path, String display, RowHandler handler) {
        try (CsvReader csv = CsvReader.open(path, display, GradeMessage.FILE_UNREADABLE, GradeMessage.FILE_UNREADABLE)) {
            if (!csv.next()) {
                return;
            }
            handler.separator(csv.separator());
            handler.header(csv.row(), csv.copy());
            while (csv.next()) {
                handler.row(csv.row(), csv.cells(), csv.count());
            }
        } catch (NoSuchFileException e) {
            throw new UserException(Location.file(display), GradeMessage.FILE_UNREADABLE, "no such file");
        }
    }
}
