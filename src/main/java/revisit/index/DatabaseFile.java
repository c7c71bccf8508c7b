package revisit.index;

import java.io.DataOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.file.Path;
import java.util.Map;
import java.util.zip.CRC32;
import java.util.zip.CheckedOutputStream;
import revisit.io.AtomicFiles;
import revisit.io.BadInputException;

/**
 * Writes and reads the database file, format version 1 (docs/FORMAT-database.md): magic {@code RVDB}, version,
 * vocabulary size and weight fingerprint, score norm, frames, posting lists, large counts, direct index entries,
 * CRC32 of everything before it. Big-endian throughout.
 */
final class DatabaseFile {

    /** "RVDB" in ASCII. */
    static final int MAGIC = 0x52564442;
    static final int VERSION = 1;
    /** Bytes of one frame record. */
    static final int FRAME_BYTES = 20;

    private DatabaseFile() {
    }

    static void write(RevisitDatabase database, Path file) {
        AtomicFiles.write(file, out -> writeTo(database, out));
    }

    private static void writeTo(RevisitDatabase database, OutputStream out) throws IOException {
        CRC32 crc = new CRC32();
        DataOutputStream data = new DataOutputStream(new CheckedOutputStream(out, crc));
        data.writeInt(MAGIC);
        data.writeInt(VERSION);
        data.writeInt(database.weights().wordCount());
        data.writeInt(database.weights().fingerprint());
        data.writeInt(database.config().scoreNorm().code());
        writeFrames(database.frames(), data);
        writeLists(database.index(), data);
        writeLargeCounts(database.index(), data);
        DirectIndex direct = database.direct();
        for (int slot = 0; slot < direct.slotCount(); slot++) {
            byte[] entry = direct.encoded(slot);
            data.writeInt(entry.length);
            data.write(entry);
        }
        data.flush();
        new DataOutputStream(out).writeInt((int) crc.getValue());
    }

    private static void writeFrames(FrameTable frames, DataOutputStream data) throws IOException {
        data.writeInt(frames.slotCount());
        for (int slot = 0; slot < frames.slotCount(); slot++) {
            data.writeInt(frames.sequenceId(slot));
            data.writeInt(frames.frameId(slot));
            data.writeDouble(frames.timeSeconds(slot));
            data.writeFloat(frames.inverseNorm(slot));
        }
    }

    private static void writeLists(InvertedIndex index, DataOutputStream data) throws IOException {
        int lists = 0;
        for (int w = 0; w < index.wordCount(); w++) {
            lists += index.length(w) > 0 ? 1 : 0;
        }
        data.writeInt(lists);
        ByteBuffer buffer = ByteBuffer.allocate(0);
        for (int w = 0; w < index.wordCount(); w++) {
            int length = index.length(w);
            if (length == 0) {
                continue;
            }
            if (buffer.capacity() < 8 + 4 * length) {
                buffer = ByteBuffer.allocate(8 + 4 * length);
            }
            buffer.clear();
            buffer.putInt(w).putInt(length).asIntBuffer().put(index.list(w), 1, length);
            data.write(buffer.array(), 0, 8 + 4 * length);
        }
    }

    private static void writeLargeCounts(InvertedIndex index, DataOutputStream data) throws IOException {
        Map<Long, Integer> large = index.largeCounts();
        data.writeInt(large.size());
        for (Map.Entry<Long, Integer> e : large.entrySet()) {
            data.writeInt((int) (e.getKey() >>> 32));
            data.writeInt((int) (long) e.getKey());
            data.writeInt(e.getValue());
        }
    }

    static RevisitDatabase read(Path file, WordWeights weights, IndexConfig config) {
        try (DatabaseInput in = DatabaseInput.open(file)) {
            return readFrom(in, weights, config);
        } catch (IOException e) {
            throw new BadInputException(file + ": could not read the database (" + e.getMessage()
                    + "); check the path and permissions", e);
        }
    }

    private static RevisitDatabase readFrom(DatabaseInput in, WordWeights weights, IndexConfig config)
            throws IOException {
        readHeader(in, weights, config);
        RevisitDatabase database = new RevisitDatabase(weights, config);
        int frameCount = in.count("frame count", InvertedIndex.MAX_SLOT + 1L, FRAME_BYTES);
        for (int slot = 0; slot < frameCount; slot++) {
            readFrame(in, database.frames());
        }
        int escapes = readLists(in, database.index(), frameCount);
        readLargeCounts(in, database.index(), escapes);
        for (int slot = 0; slot < frameCount; slot++) {
            int length = in.count("direct index entry length", Integer.MAX_VALUE, 1);
            byte[] entry = in.bytes(length, "direct index entry");
            try {
                database.direct().appendEncoded(entry);
            } catch (IllegalArgumentException e) {
                throw in.corrupt("direct index entry of frame slot " + slot + ": " + e.getMessage());
            }
        }
        in.finish();
        return database;
    }

    private static void readHeader(DatabaseInput in, WordWeights weights, IndexConfig config) throws IOException {
        int magic = in.readInt("magic number");
        if (magic != MAGIC) {
            throw in.bad(String.format(java.util.Locale.ROOT, "not a Revisit database (starts with 0x%08x, expected "
                    + "0x%08x \"RVDB\"); give a file written by the database's save", magic, MAGIC));
        }
        int version = in.readInt("version");
        if (version != VERSION) {
            throw in.bad("database format version " + version + ", this build reads version " + VERSION
                    + "; rebuild the database with this build");
        }
        int wordCount = in.readInt("word count");
        if (wordCount != weights.wordCount()) {
            throw in.bad("database was built with a vocabulary of " + wordCount + " words, the given one has "
                    + weights.wordCount() + "; load it with the vocabulary it was built with");
        }
        if (in.readInt("weight fingerprint") != weights.fingerprint()) {
            throw in.bad("database was built with other word weights (fingerprint differs); load it with the "
                    + "vocabulary it was built with, or rebuild the database");
        }
        int norm = in.readInt("score norm");
        if (norm < 0 || norm >= ScoreNorm.values().length) {
            throw in.corrupt("score norm code " + norm);
        }
        if (ScoreNorm.values()[norm] != config.scoreNorm()) {
            throw in.bad("database stores " + ScoreNorm.values()[norm] + "-normalised vectors but the settings ask"
                    + " for " + config.scoreNorm() + "; set the score norm to " + ScoreNorm.values()[norm]
                    + " or rebuild the database");
        }
    }

    private static void readFrame(DatabaseInput in, FrameTable frames) throws IOException {
        int sequenceId = in.readInt("sequence id");
        int frameId = in.readInt("frame id");
        double time = in.readDouble("frame time");
        float inverseNorm = in.readFloat("frame norm");
        if (sequenceId < 0 || frameId < 0 || !Double.isFinite(time)
                || !(inverseNorm > 0 && Float.isFinite(inverseNorm))) {
            throw in.corrupt("frame record " + sequenceId + "/" + frameId + " time " + time + " norm "
                    + inverseNorm);
        }
        if (frames.slotOf(sequenceId, frameId).isPresent()) {
            throw in.corrupt("frame " + frameId + " of sequence " + sequenceId + " appears twice");
        }
        frames.append(sequenceId, frameId, time, inverseNorm);
    }

    /** Reads the posting lists and returns how many postings point to a large count. */
    private static int readLists(DatabaseInput in, InvertedIndex index, int frameCount) throws IOException {
        int lists = in.count("posting list count", index.wordCount(), 8);
        int previousWord = -1;
        int escapes = 0;
        int[] entries = new int[0];
        for (int l = 0; l < lists; l++) {
            int word = in.readInt("word id");
            if (word <= previousWord || word >= index.wordCount()) {
                throw in.corrupt("posting list word " + word + " after word " + previousWord);
            }
            int length = in.count("posting list length", frameCount, 4);
            if (length == 0) {
                throw in.corrupt("empty posting list for word " + word);
            }
            entries = entries.length < length ? new int[Math.max(length, entries.length * 2)] : entries;
            in.ints(entries, length, "posting list");
            int previousSlot = -1;
            for (int k = 0; k < length; k++) {
                int slot = entries[k] >>> 8;
                if (slot <= previousSlot || slot >= frameCount || (entries[k] & 0xFF) == 0) {
                    throw in.corrupt("posting " + k + " of word " + word);
                }
                escapes += (entries[k] & 0xFF) == 0xFF ? 1 : 0;
                previousSlot = slot;
            }
            index.setList(word, entries, length);
            previousWord = word;
        }
        return escapes;
    }

    private static void readLargeCounts(DatabaseInput in, InvertedIndex index, int escapes) throws IOException {
        int large = in.count("large count entries", Integer.MAX_VALUE, 12);
        if (large != escapes) {
            throw in.corrupt(large + " large counts for " + escapes + " postings that need one");
        }
        for (int i = 0; i < large; i++) {
            int word = in.readInt("large count word");
            int slot = in.readInt("large count slot");
            int count = in.readInt("large count");
            if (word < 0 || word >= index.wordCount() || slot < 0 || count < 0xFF
                    || (index.entryOf(word, slot) & 0xFF) != 0xFF
                    || index.largeCounts().containsKey(InvertedIndex.key(word, slot))) {
                throw in.corrupt("large count " + count + " of word " + word + " in slot " + slot);
            }
            index.putLargeCount(word, slot, count);
        }
    }
}
