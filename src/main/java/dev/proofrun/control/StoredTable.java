package dev.proofrun.control;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A table of simulated risks stored beside the control classes: one row a line, fields separated by white space;
 * blank lines and lines starting with {@code #} (the header naming the generator and the seeds) are skipped.
 */
final class StoredTable {

    private StoredTable() {
    }

    /** The fields of each row of {@code resource}, in file order; empty when the resource is not there. */
    static Optional<List<String[]>> rows(String resource) {
        try (InputStream in = StoredTable.class.getResourceAsStream(resource)) {
            if (in == null) {
                return Optional.empty();
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String[]> rows = new ArrayList<>();
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    rows.add(line.trim().split("\\s+"));
                }
            }
            return Optional.of(rows);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
