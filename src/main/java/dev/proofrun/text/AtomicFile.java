package dev.proofrun.text;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.UUID;

/**
 * The one way proofrun writes a file: the content goes to a temporary file beside the target
 * ({@code .<name>.<random>.tmp}), is forced to the disk, and is moved into place in one step (a plain replace
 * where the file system cannot move atomically). A failure leaves the target as it was and removes the temporary
 * file; a reader never sees half a file.
 *
 * <p>Permissions: a new file gets what the user's umask gives any new file (the temporary file is created the
 * ordinary way — not with {@code Files.createTempFile}, which makes it private to its owner); a replaced file keeps
 * the permissions it had.
 *
 * <p>{@link #write} for one file; {@link #begin} when several files must appear together (write all, then
 * {@link Pending#commit} each) or when the writer wants a path rather than a stream.
 */
public final class AtomicFile {

    /** What goes into the file. */
    @FunctionalInterface
    public interface Body {
        void write(OutputStream out) throws IOException;
    }

    private AtomicFile() {
    }

    /**
     * Writes {@code target} atomically; its folder is created if missing.
     *
     * @throws IOException if the folder, the temporary file or the move fails; the target is then untouched
     */
    public static void write(Path target, Body body) throws IOException {
        try (Pending p = begin(target)) {
            p.write(body);
            p.commit();
        }
    }

    /**
     * Creates the (empty) temporary file for {@code target}, and its folder if missing. Close the result in any
     * case: unless committed, closing removes the temporary file.
     *
     * @throws IOException if the folder or the temporary file cannot be made
     */
    public static Pending begin(Path target) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        Files.createDirectories(dir);
        Path temp = dir.resolve("." + absolute.getFileName() + "." + UUID.randomUUID() + ".tmp");
        Files.createFile(temp);
        return new Pending(absolute, temp);
    }

    /** A file being written: its content is in {@link #temp()} until {@link #commit()}. */
    public static final class Pending implements AutoCloseable {

        private final Path target;
        private final Path temp;
        private boolean committed;

        private Pending(Path target, Path temp) {
            this.target = target;
            this.temp = temp;
        }

        /** The temporary file, for a writer that takes a path; it replaces the target on {@link #commit()}. */
        public Path temp() {
            return temp;
        }

        /** Writes the body into the temporary file (replacing what it held). */
        public void write(Body body) throws IOException {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                    OutputStream out = Channels.newOutputStream(ch)) {
                body.write(out);
            }
        }

        /** Forces the temporary file to the disk and moves it into place, keeping a replaced file's permissions. */
        public void commit() throws IOException {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                ch.force(true);
            }
            if (Files.exists(target)) {
                keepPermissions(target, temp);
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            committed = true;
        }

        /** Removes the temporary file unless it was committed; best effort. */
        @Override
        public void close() {
            if (!committed) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // the temporary file is all that is left; the target is untouched
                }
            }
        }

        private static void keepPermissions(Path from, Path to) throws IOException {
            PosixFileAttributeView source = Files.getFileAttributeView(from, PosixFileAttributeView.class);
            PosixFileAttributeView dest = Files.getFileAttributeView(to, PosixFileAttributeView.class);
            if (source != null && dest != null) {
                dest.setPermissions(source.readAttributes().permissions());
            }
        }
    }
}
