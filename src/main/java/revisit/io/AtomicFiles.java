package revisit.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes files so that a reader never sees a half-written one: content goes to a temporary file in the same
 * folder, is flushed to disk, and is then moved over the target in one step.
 */
public final class AtomicFiles {

    /** Body of a write: fills the stream. */
    @FunctionalInterface
    public interface Writer {
        void write(OutputStream out) throws IOException;
    }

    private AtomicFiles() {
    }

    /**
     * Writes {@code target} atomically.
     *
     * @param target file to create or replace; its parent folder is created if missing
     * @param body   writes the content
     */
    public static void write(Path target, Writer body) {
        Path parent = target.toAbsolutePath().getParent();
        Path tmp = null;
        try {
            Files.createDirectories(parent);
            tmp = Files.createTempFile(parent, "." + target.getFileName() + ".", ".part");
            try (var channel = Files.newOutputStream(tmp); OutputStream out = new BufferedOutputStream(channel)) {
                body.write(out);
                out.flush();
            }
            if (tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
                // createTempFile makes the file owner-only (0600); outputs are ordinary files (0644, common practice)
                Files.setPosixFilePermissions(tmp, java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
            }
            try (var fc = java.nio.channels.FileChannel.open(tmp, java.nio.file.StandardOpenOption.WRITE)) {
                fc.force(true);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
        } catch (IOException e) {
            throw new UncheckedIOException(target + ": could not write (" + e.getMessage()
                    + "); check the folder exists, is writable and the disk has space", e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the original error is the one worth reporting; a stray .part file is harmless
                }
            }
        }
    }

    /** Writes UTF-8 text atomically. */
    public static void writeString(Path target, String text) {
        write(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }
}
