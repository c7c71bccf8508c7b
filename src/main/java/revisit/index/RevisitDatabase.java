package revisit.index;

import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The revisit database: every added frame's bag-of-words vector in an inverted index (word -> frames), its
 * features grouped by tree node in a direct index (frame -> node -> features), and its sequence, frame id and time.
 * Frames of several sequences (sessions) can live in one database. Queries go through {@link RevisitSearch}.
 *
 * <p>Not thread-safe: one thread adds, removes and queries at a time. Memory is about 4 bytes per distinct word per
 * frame plus the direct index (about 3.5 KB per frame of 500 features in all); see docs/INDEX.md for measured
 * figures and docs/FORMAT-database.md for the file.
 */
public final class RevisitDatabase {

    private final WordWeights weights;
    private final IndexConfig config;
    private final InvertedIndex index;
    private final FrameTable frames = new FrameTable();
    private final DirectIndex direct = new DirectIndex();
    private final FrameScorer scorer = new FrameScorer();

    /**
     * @param weights idf table of the vocabulary the word ids come from
     * @param config  settings; its {@link IndexConfig#scoreNorm()} fixes how stored vectors are normalised, the
     *                rest are the defaults for searches on this database
     */
    public RevisitDatabase(WordWeights weights, IndexConfig config) {
        this.weights = weights;
        this.config = config;
        this.index = new InvertedIndex(weights.wordCount());
    }

    /** The tf-idf vector of a frame's words, normalised as this database stores them. */
    public WordVector vectorOf(int[] words) {
        return WordVector.of(words, weights, config.scoreNorm());
    }

    /** Adds a frame, building its vector. */
    public void add(FrameWords frame) {
        add(frame, vectorOf(frame.words()));
    }

    /**
     * Adds a frame whose vector is already built (for example by a query just before).
     *
     * @param frame  the frame; its (sequence, frame id) must not be in the database yet
     * @param vector {@link #vectorOf}{@code (frame.words())}
     */
    public void add(FrameWords frame, WordVector vector) {
        if (vector.norm() != config.scoreNorm()) {
            throw new IllegalArgumentException("vector is " + vector.norm() + "-normalised, database stores "
                    + config.scoreNorm());
        }
        if (contains(frame.sequenceId(), frame.frameId())) {
            throw new IllegalArgumentException("frame " + frame.frameId() + " of sequence " + frame.sequenceId()
                    + " is already in the database; remove it first to replace it");
        }
        int slot = frames.append(frame.sequenceId(), frame.frameId(), frame.timeSeconds(), vector.inverseNorm());
        index.add(slot, vector);
        direct.append(frame.nodes());
    }

    /**
     * Removes a frame; its memory is reclaimed when removed frames reach a quarter of all slots.
     *
     * @return whether the frame was present
     */
    public boolean remove(int sequenceId, int frameId) {
        OptionalInt slot = frames.slotOf(sequenceId, frameId);
        if (slot.isEmpty()) {
            return false;
        }
        frames.markRemoved(slot.getAsInt());
        if (frames.slotCount() - frames.liveCount() > frames.slotCount() / 4) {
            compact();
        }
        return true;
    }

    /** Reclaims the memory of removed frames now. */
    public void compact() {
        if (frames.slotCount() == frames.liveCount()) {
            return;
        }
        int[] newSlot = frames.compact();
        index.compact(newSlot);
        direct.compact(newSlot);
    }

    public boolean contains(int sequenceId, int frameId) {
        return frames.slotOf(sequenceId, frameId).isPresent();
    }

    /** Number of frames held. */
    public int size() {
        return frames.liveCount();
    }

    /** The frame's features grouped by tree node, or empty if the frame is not in the database. */
    public Optional<NodeFeatures> featuresByNode(int sequenceId, int frameId) {
        OptionalInt slot = frames.slotOf(sequenceId, frameId);
        return slot.isEmpty() ? Optional.empty() : Optional.of(direct.features(slot.getAsInt()));
    }

    /** Stored (frame, word) pairs, removed frames included until compaction. */
    public long postingCount() {
        return index.postingCount();
    }

    /**
     * Bytes held by the index structures and the query scratch buffers (arrays with headers, estimated map
     * entries); see docs/INDEX.md.
     */
    public long memoryBytes() {
        return index.memoryBytes() + frames.memoryBytes() + direct.memoryBytes() + scorer.memoryBytes();
    }

    public WordWeights weights() {
        return weights;
    }

    public IndexConfig config() {
        return config;
    }

    /**
     * Writes the database to {@code file} atomically (compacting it first), in the format of
     * docs/FORMAT-database.md.
     */
    public void save(Path file) {
        compact();
        DatabaseFile.write(this, file);
    }

    /**
     * Reads a database written by {@link #save}.
     *
     * @param file    the file
     * @param weights the idf table of the vocabulary the database was built with (checked by fingerprint)
     * @param config  settings; its score normalisation must match the file's
     * @throws revisit.io.BadInputException when the file is missing, truncated, corrupt or does not match
     */
    public static RevisitDatabase load(Path file, WordWeights weights, IndexConfig config) {
        return DatabaseFile.read(file, weights, config);
    }

    RankedFrames rank(WordVector query, FrameWords queryFrame, IndexConfig queryConfig) {
        return scorer.rank(query, queryFrame, index, frames, weights, queryConfig);
    }

    /** The candidate record of a ranked frame. */
    Candidate candidate(int slot, double rawScore, double normalisedScore) {
        return new Candidate(frames.sequenceId(slot), frames.frameId(slot), frames.timeSeconds(slot), rawScore,
                normalisedScore);
    }

    FrameScorer scorer() {
        return scorer;
    }

    InvertedIndex index() {
        return index;
    }

    FrameTable frames() {
        return frames;
    }

    DirectIndex direct() {
        return direct;
    }
}
