package revisit.evaluation;

import java.util.Arrays;

/**
 * Collects labelled pairs, orders each pair so that the query is the later frame in scan order, drops pairs the
 * detector may not report (see {@link FrameTimeline#allows}), removes duplicates and builds {@link RevisitLabels}.
 */
public final class LabelBuilder {

    /** Default cap on kept pairs: 50 million, 400 MB while building (a guard against runaway intervals). */
    public static final long DEFAULT_MAX_PAIRS = 50_000_000L;

    private final FrameTimeline timeline;
    private final ExclusionWindow window;
    private final long maxPairs;
    private long[] packed = new long[1024];
    private int count;
    private long dropped;

    /**
     * @param maxPairs most pairs accepted before {@link #add} refuses, >= 1
     */
    public LabelBuilder(FrameTimeline timeline, ExclusionWindow window, long maxPairs) {
        if (maxPairs < 1 || maxPairs > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("maxPairs must be in 1.." + (Integer.MAX_VALUE - 8) + ", was " + maxPairs);
        }
        this.timeline = timeline;
        this.window = window;
        this.maxPairs = maxPairs;
    }

    /** A builder with {@link #DEFAULT_MAX_PAIRS}. */
    public LabelBuilder(FrameTimeline timeline, ExclusionWindow window) {
        this(timeline, window, DEFAULT_MAX_PAIRS);
    }

    /**
     * Adds one labelled revisit between two frames given by global index, in either order.
     *
     * @return false when the pair was dropped (same frame or inside the exclusion window)
     * @throws LabelLimitException when more than maxPairs pairs would be kept
     */
    public boolean add(int frameA, int frameB) {
        int query = Math.max(frameA, frameB);
        int match = Math.min(frameA, frameB);
        if (!timeline.allows(window, query, match)) {
            dropped++;
            return false;
        }
        if (count == maxPairs) {
            throw new LabelLimitException(maxPairs);
        }
        if (count == packed.length) {
            packed = Arrays.copyOf(packed, (int) Math.min((long) packed.length * 2, maxPairs));
        }
        packed[count++] = ((long) query << 32) | match;
        return true;
    }

    /** Adds a pair given by frame keys (see {@link #add(int, int)}). */
    public boolean add(FrameKey a, FrameKey b) {
        return add(timeline.globalIndex(a), timeline.globalIndex(b));
    }

    /** Builds the labels; duplicates are merged. The builder may not be used afterwards. */
    public RevisitLabels build() {
        long[] sorted = Arrays.copyOf(packed, count);
        Arrays.sort(sorted);
        int[] offsets = new int[timeline.size() + 1];
        int[] matches = new int[sorted.length];
        int n = 0;
        for (int i = 0; i < sorted.length; i++) {
            if (i > 0 && sorted[i] == sorted[i - 1]) {
                continue;
            }
            offsets[(int) (sorted[i] >>> 32) + 1]++;
            matches[n++] = (int) sorted[i];
        }
        for (int q = 0; q < timeline.size(); q++) {
            offsets[q + 1] += offsets[q];
        }
        packed = null;
        return new RevisitLabels(timeline, window, offsets, Arrays.copyOf(matches, n), dropped);
    }

    /** Thrown when a label source expands to more pairs than the builder accepts. */
    public static final class LabelLimitException extends IllegalStateException {
        LabelLimitException(long maxPairs) {
            super("more than " + maxPairs + " labelled pairs");
        }
    }
}
