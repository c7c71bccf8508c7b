package revisit.index;

import java.io.BufferedInputStream;
import java.io.Closeable;
import java.io.DataInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.CRC32;
import java.util.zip.CheckedInputStream;
import revisit.io.BadInputException;

/**
 * Reads a database file while keeping its CRC32 and counting bytes, so that every declared length is checked
 * against the bytes actually left before anything is allocated.
 */
final class DatabaseInput implements Closeable {

    private static final int TRAILER_BYTES = 4;
    private final Path file;
    private final DataInputStream data;
    private final CRC32 crc = new CRC32();
    private final long size;
    private long consumed;
    private byte[] chunk = new byte[0];

    private DatabaseInput(Path file, long size) throws IOException {
        this.file = file;
        this.size = size;
        this.data = new DataInputStream(new CheckedInputStream(
                new BufferedInputStream(Files.newInputStream(file), 1 << 16), crc));
    }

    static DatabaseInput open(Path file) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new BadInputException(file + ": no such database file; check the path");
        }
        return new DatabaseInput(file, Files.size(file));
    }

    int readInt(String what) throws IOException {
        need(4, what);
        return data.readInt();
    }

    float readFloat(String what) throws IOException {
        need(4, what);
        return data.readFloat();
    }

    double readDouble(String what) throws IOException {
        need(8, what);
        return data.readDouble();
    }

    /**
     * Reads a count and checks it against a limit and against the bytes left (each item needing at least
     * {@code bytesPerItem}).
     */
    int count(String what, long max, int bytesPerItem) throws IOException {
        int n = readInt(what);
        if (n < 0 || n > max) {
            throw corrupt(what + " " + n + " outside [0, " + max + "]");
        }
        long needed = (long) n * bytesPerItem;
        if (needed > size - consumed - TRAILER_BYTES) {
            throw truncated(what + " " + n + " needs " + needed + " bytes, " + (size - consumed - TRAILER_BYTES)
                    + " remain");
        }
        return n;
    }

    byte[] bytes(int n, String what) throws IOException {
        need(n, what);
        byte[] out = new byte[n];
        readFully(out, n);
        return out;
    }

    /** Reads {@code n} big-endian ints into {@code into[0..n)}. */
    void ints(int[] into, int n, String what) throws IOException {
        need(4L * n, what);
        int done = 0;
        while (done < n) {
            int batch = Math.min(n - done, 1 << 14);
            if (chunk.length < 4 * batch) {
                chunk = new byte[4 * batch];
            }
            readFully(chunk, 4 * batch);
            ByteBuffer.wrap(chunk, 0, 4 * batch).asIntBuffer().get(into, done, batch);
            done += batch;
        }
    }

    /** Checks the trailing CRC32 and that nothing follows it. */
    void finish() throws IOException {
        int computed = (int) crc.getValue();
        int stored = readInt("checksum");
        if (stored != computed) {
            throw corrupt(String.format(java.util.Locale.ROOT, "checksum 0x%08x, content gives 0x%08x", stored,
                    computed));
        }
        if (consumed != size || data.read() != -1) {
            throw corrupt((size - consumed) + " bytes after the checksum");
        }
    }

    BadInputException bad(String message) {
        return new BadInputException(file + ": " + message);
    }

    BadInputException corrupt(String detail) {
        return bad("corrupt database (" + detail + "); restore it from a backup or rebuild it");
    }

    private BadInputException truncated(String detail) {
        return bad("database is truncated or corrupt (" + detail + "); restore it from a backup or rebuild it");
    }

    private void need(long n, String what) {
        if (n > size - consumed) {
            throw truncated("file ends inside the " + what);
        }
        consumed += n;
    }

    private void readFully(byte[] into, int n) throws IOException {
        try {
            data.readFully(into, 0, n);
        } catch (EOFException e) {
            throw truncated("file shrank while reading");
        }
    }

    @Override
    public void close() throws IOException {
        data.close();
    }
}
