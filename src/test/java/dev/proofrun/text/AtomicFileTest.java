package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFileTest {

    @TempDir
    Path dir;

    @Test
    void writesTheContentAndLeavesNoTemporaryFile() throws IOException {
        Path f = dir.resolve("sub/plan.json");
        AtomicFile.write(f, out -> out.write("first".getBytes(StandardCharsets.UTF_8)));
        AtomicFile.write(f, out -> out.write("second".getBytes(StandardCharsets.UTF_8)));
        assertEquals("second", Files.readString(f));
        assertEquals(1, count(f.getParent()));
    }

    @Test
    void aFailureLeavesTheTargetAsItWas() throws IOException {
        Path f = dir.resolve("kept.csv");
        Files.writeString(f, "original");
        assertThrows(IOException.class, () -> AtomicFile.write(f, out -> {
            out.write("half".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }));
        assertEquals("original", Files.readString(f));
        assertEquals(1, count(dir));
    }

    @Test
    void aNewFileGetsWhatTheUmaskGivesAndAReplacedOneKeepsItsPermissions() throws IOException {
        if (!dir.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            return; // the rule is about POSIX permissions
        }
        Path plain = Files.createFile(dir.resolve("plain")); // an ordinary new file: what the umask gives
        Path fresh = dir.resolve("fresh.pdf");
        AtomicFile.write(fresh, out -> out.write(1));
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(fresh));
        Set<PosixFilePermission> odd = PosixFilePermissions.fromString("rw-r-----");
        Files.setPosixFilePermissions(fresh, odd);
        AtomicFile.write(fresh, out -> out.write(2));
        assertEquals(odd, Files.getPosixFilePermissions(fresh));
    }

    @Test
    void severalFilesAppearOnlyWhenCommitted() throws IOException {
        Path a = dir.resolve("a.txt");
        try (AtomicFile.Pending p = AtomicFile.begin(a)) {
            Files.writeString(p.temp(), "by path");
            assertTrue(Files.notExists(a));
        }
        assertTrue(Files.notExists(a));
        assertEquals(0, count(dir));
        try (AtomicFile.Pending p = AtomicFile.begin(a)) {
            Files.writeString(p.temp(), "by path");
            p.commit();
        }
        assertEquals("by path", Files.readString(a));
    }

    private static long count(Path d) throws IOException {
        try (Stream<Path> s = Files.list(d)) {
            return s.count();
        }
    }
}
