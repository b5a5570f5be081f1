package dev.proofrun.app.session;

import dev.proofrun.text.DecimalMark;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * The window's decimal mark, kept in the user's folder ({@code decimal-mark.txt}: {@code point} or
 * {@code comma}) so that it stays chosen from one start to the next. No file, or a file that says
 * anything else: {@link DecimalMark#POINT}, as the command line reads numbers.
 */
public final class DecimalSetting {

    private DecimalSetting() {
    }

    static Path file(AppHome home) {
        return home.dir().resolve("decimal-mark.txt");
    }

    /** The mark last chosen, or the point. */
    public static DecimalMark load(AppHome home) {
        Path f = file(home);
        try {
            return Files.isRegularFile(f) ? DecimalMark.fromToken(Files.readString(f, StandardCharsets.UTF_8).trim()) : DecimalMark.POINT;
        } catch (IOException | IllegalArgumentException e) {
            return DecimalMark.POINT;
        }
    }

    /** Writes the choice (a temporary file moved into place). */
    public static void save(AppHome home, DecimalMark mark) {
        Path f = file(home);
        try {
            Files.createDirectories(f.getParent());
            Path tmp = Files.createTempFile(f.getParent(), "decimal-mark", ".tmp");
            Files.writeString(tmp, mark.token() + "\n", StandardCharsets.UTF_8);
            Files.move(tmp, f, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
