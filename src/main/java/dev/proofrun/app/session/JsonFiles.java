package dev.proofrun.app.session;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.proofrun.text.AtomicFile;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;

/** Small JSON files of the wizard, written atomically ({@link AtomicFile}). */
final class JsonFiles {

    static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private JsonFiles() {
    }

    static void write(Path file, Object value) {
        try {
            AtomicFile.write(file, out -> MAPPER.writeValue(out, value));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
