package revisit.vocabulary;

import java.io.DataOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.zip.CRC32;
import java.util.zip.CheckedOutputStream;
import revisit.features.FrameFeatures;
import revisit.io.AtomicFiles;
import revisit.io.BadInputException;

/**
 * Reads and writes vocabulary files (format described in docs/FORMAT-vocabulary.md): magic, version,
 * parameters, descriptor kind and length, the breadth-first tree, the word weights and occupancy, the provenance,
 * then a CRC32 of everything before it. All numbers are big-endian.
 *
 * <p>Reading checks the magic, the version and the checksum, then every count against the bytes that remain
 * before allocating anything for it, and finally that the tree is a tree; any problem is one
 * {@link BadInputException} line.
 */
public final class VocabularyFile {

    /** First 8 bytes of every vocabulary file. */
    static final byte[] MAGIC = {(byte) 0x89, 'R', 'V', 'O', 'C', '\r', '\n', 0x1A};
    /** The format version this build writes and reads. */
    static final int VERSION = 1;
    /** Largest file accepted (a tree at the configuration limits stays well below it). */
    static final long MAX_FILE_BYTES = 1L << 30;
    private static final int CENTRE_BYTES = FrameFeatures.STRIDE * Long.BYTES;
    private static final String FIX = "copy the file again or retrain it with 'revisit vocab-train'";

    private VocabularyFile() {
    }

    /**
     * Writes {@code vocabulary} to {@code file} atomically.
     *
     * @param file       target, replaced if it exists
     * @param vocabulary what to write
     */
    public static void write(Path file, Vocabulary vocabulary) {
        AtomicFiles.write(file, out -> {
            CRC32 crc = new CRC32();
            DataOutputStream data = new DataOutputStream(new CheckedOutputStream(out, crc));
            writeBody(data, vocabulary);
            data.flush();
            data.writeInt((int) crc.getValue());
            data.flush();
        });
    }

    private static void writeBody(DataOutputStream data, Vocabulary v) throws IOException {
        data.write(MAGIC);
        data.writeInt(VERSION);
        data.writeInt(v.branching());
        data.writeInt(v.depth());
        data.writeInt(FrameFeatures.DESCRIPTOR_BITS);
        writeString(data, v.descriptorKind());
        data.writeInt(v.nodeCount());
        data.writeInt(v.wordCount());
        for (int c : v.childCounts()) {
            data.writeByte(c);
        }
        for (long word : v.centres()) {
            data.writeLong(word);
        }
        for (double w : v.weightArray()) {
            data.writeDouble(w);
        }
        for (int o : v.occupancies()) {
            data.writeInt(o);
        }
        Provenance p = v.provenance();
        writeString(data, p.createdUtc());
        writeString(data, p.command());
        data.writeLong(p.seed());
        data.writeInt(p.maxIterations());
        data.writeInt(p.imageCount());
        data.writeLong(p.descriptorCount());
        data.writeInt(p.sources().size());
        for (String s : p.sources()) {
            writeString(data, s);
        }
    }

    private static void writeString(DataOutputStream data, String s) throws IOException {
        byte[] bytes = s.getBytes(StandardCharsets.UTF_8);
        if (bytes.length > 0xFFFF) {
            throw new IllegalArgumentException("text longer than 65535 UTF-8 bytes cannot be stored");
        }
        data.writeShort(bytes.length);
        data.write(bytes);
    }

    /**
     * Reads a vocabulary.
     *
     * @param file a file written by {@link #write(Path, Vocabulary)}
     * @return the vocabulary
     * @throws BadInputException when the file is missing, unreadable, truncated, damaged or not a vocabulary
     */
    public static Vocabulary read(Path file) {
        byte[] bytes = readBytes(file);
        int minimum = MAGIC.length + 2 * Integer.BYTES;
        if (bytes.length < minimum || !Arrays.equals(bytes, 0, MAGIC.length, MAGIC, 0, MAGIC.length)) {
            throw new BadInputException(file + ": not a Revisit vocabulary file (no vocabulary header); pass a file "
                    + "written by 'revisit vocab-train'");
        }
        int version = ByteBuffer.wrap(bytes, MAGIC.length, Integer.BYTES).getInt();
        if (version != VERSION) {
            throw new BadInputException(file + ": vocabulary format version " + version + ", this build reads "
                    + VERSION + "; retrain it with this build's 'revisit vocab-train'");
        }
        int end = bytes.length - Integer.BYTES;
        CRC32 crc = new CRC32();
        crc.update(bytes, 0, end);
        int stored = ByteBuffer.wrap(bytes, end, Integer.BYTES).getInt();
        if (stored != (int) crc.getValue()) {
            throw new BadInputException(file + ": checksum mismatch, the file is damaged or truncated; " + FIX);
        }
        BoundedBytes in = new BoundedBytes(file, bytes, end, FIX);
        in.readBytes(new byte[MAGIC.length + Integer.BYTES], "header");
        return readBody(in);
    }

    private static byte[] readBytes(Path file) {
        try {
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                throw new BadInputException(file + ": " + size + " bytes is larger than any vocabulary ("
                        + MAX_FILE_BYTES + " bytes at most); pass a vocabulary file");
            }
            return Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file + ": no such vocabulary file; check the path", e);
        } catch (IOException e) {
            throw new BadInputException(file + ": cannot read (" + e.getMessage() + "); check the path and "
                    + "permissions", e);
        }
    }

    private static Vocabulary readBody(BoundedBytes in) {
        int branching = in.readInt("branching", 2, VocabularyConfig.MAX_BRANCHING);
        int depth = in.readInt("depth", 1, VocabularyConfig.MAX_DEPTH);
        int bits = in.readInt("descriptor length");
        if (bits != FrameFeatures.DESCRIPTOR_BITS) {
            throw in.fail("descriptor length " + bits + " bits, this build uses " + FrameFeatures.DESCRIPTOR_BITS);
        }
        String kind = in.readString("descriptor kind", 200);
        int nodes = in.readInt("node count", 3, Integer.MAX_VALUE);
        int words = in.readInt("word count", 2, nodes - 1);
        in.need(nodes, 1 + CENTRE_BYTES, "tree of " + nodes + " nodes");
        int[] childCount = new int[nodes];
        for (int i = 0; i < nodes; i++) {
            childCount[i] = in.readUnsignedByte("child count");
        }
        long[] centres = new long[nodes * FrameFeatures.STRIDE];
        for (int i = 0; i < centres.length; i++) {
            centres[i] = in.readLong("centre");
        }
        in.need(words, Double.BYTES + Integer.BYTES, "weights and occupancy of " + words + " words");
        double[] weights = new double[words];
        for (int w = 0; w < words; w++) {
            weights[w] = in.readDouble("weight");
        }
        int[] occupancy = new int[words];
        for (int w = 0; w < words; w++) {
            occupancy[w] = in.readInt("occupancy");
        }
        Provenance provenance = readProvenance(in);
        in.expectEnd("the provenance");
        try {
            return new Vocabulary(branching, depth, kind, childCount, centres, weights, occupancy, provenance);
        } catch (IllegalArgumentException e) {
            throw in.fail("inconsistent tree: " + e.getMessage(), e);
        }
    }

    private static Provenance readProvenance(BoundedBytes in) {
        String created = in.readString("creation time", 100);
        String command = in.readString("command", 4000);
        long seed = in.readLong("seed");
        int iterations = in.readInt("iterations", 1, 1000);
        int images = in.readInt("image count", 1, Integer.MAX_VALUE);
        long descriptors = in.readLong("descriptor count");
        if (descriptors < 0) {
            throw in.fail("descriptor count is " + descriptors + ", expected >= 0");
        }
        int sourceCount = in.readInt("source count", 0, 10_000);
        in.need(sourceCount, Short.BYTES, sourceCount + " sources");
        List<String> sources = new ArrayList<>(sourceCount);
        for (int i = 0; i < sourceCount; i++) {
            sources.add(in.readString("source", 1000));
        }
        return new Provenance(sources, command, created, seed, iterations, images, descriptors);
    }
}
