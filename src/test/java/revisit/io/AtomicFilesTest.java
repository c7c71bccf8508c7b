package revisit.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @TempDir
    Path dir;

    @Test
    void failedWriteLeavesOldContentAndNoPartFile() throws Exception {
        Path f = dir.resolve("out.txt");
        AtomicFiles.writeString(f, "first");
        assertThrows(RuntimeException.class, () -> AtomicFiles.write(f, out -> {
            out.write("half".getBytes());
            throw new IOException("disk gone");
        }));
        assertEquals("first", Files.readString(f));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(1, s.count(), "only the target remains");
        }
    }

    @Test
    void createsMissingParentFolders() throws Exception {
        Path f = dir.resolve("a/b/c.txt");
        AtomicFiles.writeString(f, "x");
        assertEquals("x", Files.readString(f));
    }
}
