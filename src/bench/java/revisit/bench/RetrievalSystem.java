package revisit.bench;

import java.util.List;

/**
 * A frame database that the retrieval comparison fills and queries in scan order. Both implementations apply the
 * same exclusion rule ({@link #allowed}) and return their best frames by their own bag-of-words score.
 */
interface RetrievalSystem {

    /** A stored frame returned by a query. */
    record Hit(int sequence, int frame) {
    }

    String name();

    /** Stores a frame; its (sequence, frame) must be new. */
    void add(DescriptorFrame frame);

    /** The at most {@code limit} best stored frames outside the query's exclusion window, best first. */
    List<Hit> query(DescriptorFrame frame, int limit);

    /** Bytes the database retains beyond its trained vocabulary (object-graph walk, see the implementations). */
    long retainedBytes();

    /**
     * The exclusion rule both systems apply, the revisit index's own ({@code index.FrameTable}): a stored frame of
     * the query's sequence is returned only when at least {@code exclusionSeconds} apart in time; other sequences
     * are never excluded.
     */
    static boolean allowed(int querySequence, double queryTime, int storedSequence, double storedTime,
                           double exclusionSeconds) {
        return querySequence != storedSequence || Math.abs(queryTime - storedTime) >= exclusionSeconds;
    }
}
