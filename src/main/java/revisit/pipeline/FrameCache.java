package revisit.pipeline;

import java.io.BufferedInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.CRC32;
import revisit.features.FrameFeatures;
import revisit.io.BadInputException;

/**
 * The scan's checkpoint: an append-only file of {@link FrameRecord}s (format in docs/FORMAT-checkpoint.md).
 *
 * <p>Each record is {@code int length, payload, int crc32(payload)} and is forced to disk in batches. A scan killed
 * mid-write leaves at most one incomplete record at the end; {@link #open} keeps every complete record, cuts the
 * rest, and the scan replays the kept records into a fresh database (index operations are deterministic), so it
 * ends with the same closures as an uninterrupted run. The header carries a fingerprint of the settings that
 * shape the records (feature settings and vocabulary checksum); a checkpoint from other settings is refused.
 */
public final class FrameCache implements AutoCloseable {

    private static final int MAGIC = 0x52564643; // "RVFC"
    private static final int VERSION = 1;
    private static final int HEADER_BYTES = 16;
    /** Largest record accepted: 100k features of 4 longs plus arrays, far above any real frame. */
    private static final int MAX_RECORD_BYTES = 100_000 * 80 + 4096;

    private final Path file;
    private final FileChannel channel;
    private final List<FrameRecord> records;

    private FrameCache(Path file, FileChannel channel, List<FrameRecord> records) {
        this.file = file;
        this.channel = channel;
        this.records = records;
    }

    /**
     * Opens (or creates) a checkpoint file, keeping every complete record already in it.
     *
     * @param file        checkpoint file
     * @param fingerprint settings fingerprint; an existing file with another one is refused
     */
    public static FrameCache open(Path file, long fingerprint) {
        try {
            Files.createDirectories(file.toAbsolutePath().getParent());
            List<FrameRecord> kept = new ArrayList<>();
            long goodBytes = Files.exists(file) && Files.size(file) > 0 ? readExisting(file, fingerprint, kept) : 0;
            FileChannel ch = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                    StandardOpenOption.READ);
            if (goodBytes == 0) {
                ch.truncate(0);
                ch.write(java.nio.ByteBuffer.allocate(HEADER_BYTES).putInt(MAGIC).putInt(VERSION)
                        .putLong(fingerprint).flip());
                ch.force(true);
            } else {
                ch.truncate(goodBytes);
                ch.position(goodBytes);
            }
            return new FrameCache(file, ch, kept);
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot open checkpoint (" + e.getMessage() + ")", e);
        }
    }

    /**
     * Reads every complete record of a checkpoint without opening it for writing and whatever its fingerprint
     * (used by tuning, which reuses a finished scan's features and words).
     */
    public static List<FrameRecord> readRecords(Path file) {
        if (!Files.exists(file)) {
            throw new BadInputException(file + ": scan checkpoint not found; run 'revisit scan' into that folder"
                    + " first (its checkpoint holds the features that tuning reuses)");
        }
        try (DataInputStream in = new DataInputStream(new BufferedInputStream(Files.newInputStream(file)))) {
            if (Files.size(file) < HEADER_BYTES || in.readInt() != MAGIC) {
                throw new BadInputException(file + ": not a revisit checkpoint");
            }
            in.readInt();
            long fingerprint = in.readLong();
            List<FrameRecord> out = new ArrayList<>();
            readExisting(file, fingerprint, out);
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot read checkpoint (" + e.getMessage() + ")", e);
        }
    }

    /** Records recovered when the file was opened, in scan order. */
    public List<FrameRecord> recovered() {
        return List.copyOf(records);
    }

    /** Appends a record; call {@link #sync()} to force it to disk. */
    public void append(FrameRecord r) {
        try {
            ByteArrayOutputStream bytes = new ByteArrayOutputStream(r.features().count() * 64 + 256);
            writePayload(new DataOutputStream(bytes), r);
            byte[] payload = bytes.toByteArray();
            CRC32 crc = new CRC32();
            crc.update(payload);
            var buf = java.nio.ByteBuffer.allocate(payload.length + 8);
            buf.putInt(payload.length).put(payload).putInt((int) crc.getValue()).flip();
            while (buf.hasRemaining()) {
                channel.write(buf);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot append to checkpoint (" + e.getMessage() + ")", e);
        }
    }

    /** Forces appended records to disk. */
    public void sync() {
        try {
            channel.force(false);
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot sync checkpoint (" + e.getMessage() + ")", e);
        }
    }

    @Override
    public void close() {
        try {
            channel.force(true);
            channel.close();
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": cannot close checkpoint (" + e.getMessage() + ")", e);
        }
    }

    private static long readExisting(Path file, long fingerprint, List<FrameRecord> out) throws IOException {
        try (InputStream raw = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
             DataInputStream in = new DataInputStream(raw)) {
            if (Files.size(file) < HEADER_BYTES || in.readInt() != MAGIC) {
                throw new BadInputException(file + ": not a revisit checkpoint; delete it or choose another "
                        + "output folder");
            }
            int version = in.readInt();
            long stored = in.readLong();
            if (version != VERSION || stored != fingerprint) {
                throw new BadInputException(file + ": checkpoint was made with other settings (version " + version
                        + ", fingerprint " + Long.toHexString(stored) + " vs " + Long.toHexString(fingerprint)
                        + "); rerun with --fresh to start over");
            }
            long good = HEADER_BYTES;
            while (true) {
                int length;
                try {
                    length = in.readInt();
                } catch (EOFException e) {
                    return good;
                }
                if (length <= 0 || length > MAX_RECORD_BYTES || good + 8 + length > Files.size(file)) {
                    return good;
                }
                byte[] payload = in.readNBytes(length);
                if (payload.length < length) {
                    return good;
                }
                int crcStored;
                try {
                    crcStored = in.readInt();
                } catch (EOFException e) {
                    return good;
                }
                CRC32 crc = new CRC32();
                crc.update(payload);
                if ((int) crc.getValue() != crcStored) {
                    return good;
                }
                out.add(readPayload(new DataInputStream(new java.io.ByteArrayInputStream(payload)), file));
                good += 8 + length;
            }
        }
    }

    private static void writePayload(DataOutputStream d, FrameRecord r) throws IOException {
        FrameFeatures f = r.features();
        d.writeInt(r.sequence());
        d.writeInt(r.frame());
        d.writeDouble(r.time());
        d.writeUTF(r.name());
        int n = f.count();
        d.writeInt(n);
        for (int i = 0; i < n; i++) {
            d.writeFloat(f.x()[i]);
            d.writeFloat(f.y()[i]);
            d.writeFloat(f.angleRad()[i]);
            d.writeInt(f.level()[i]);
            d.writeFloat(f.scale()[i]);
            d.writeFloat(f.response()[i]);
            d.writeInt(r.words()[i]);
            d.writeInt(r.nodes()[i]);
        }
        for (int i = 0; i < n * FrameFeatures.STRIDE; i++) {
            d.writeLong(f.descriptors()[i]);
        }
    }

    private static FrameRecord readPayload(DataInputStream d, Path file) throws IOException {
        int sequence = d.readInt();
        int frame = d.readInt();
        double time = d.readDouble();
        String name = d.readUTF();
        int n = d.readInt();
        if (n < 0 || n > MAX_RECORD_BYTES / 64) {
            throw new BadInputException(file + ": checkpoint record claims " + n + " features; the file is damaged,"
                    + " rerun with --fresh");
        }
        float[] x = new float[n];
        float[] y = new float[n];
        float[] a = new float[n];
        int[] level = new int[n];
        float[] scale = new float[n];
        float[] resp = new float[n];
        int[] words = new int[n];
        int[] nodes = new int[n];
        for (int i = 0; i < n; i++) {
            x[i] = d.readFloat();
            y[i] = d.readFloat();
            a[i] = d.readFloat();
            level[i] = d.readInt();
            scale[i] = d.readFloat();
            resp[i] = d.readFloat();
            words[i] = d.readInt();
            nodes[i] = d.readInt();
        }
        long[] desc = new long[n * FrameFeatures.STRIDE];
        for (int i = 0; i < desc.length; i++) {
            desc[i] = d.readLong();
        }
        return new FrameRecord(sequence, frame, time, name,
                new FrameFeatures(n, x, y, a, level, scale, resp, desc), words, nodes);
    }
}
