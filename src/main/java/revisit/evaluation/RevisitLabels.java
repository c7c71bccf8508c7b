package revisit.evaluation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

/**
 * Labelled revisits of one scan: for every query frame, the set of earlier frames that show the same place.
 *
 * <p>A query is <em>positive</em> when its set is non-empty. Pairs that the detector is not allowed to report
 * (a match later than its query, the same frame, or a frame inside the {@link ExclusionWindow}) never appear
 * here; {@link #droppedPairs()} counts how many labelled pairs were removed for that reason.
 */
public final class RevisitLabels {

    private final FrameTimeline timeline;
    private final ExclusionWindow window;
    private final int[] offsets;
    private final int[] matches;
    private final long droppedPairs;

    RevisitLabels(FrameTimeline timeline, ExclusionWindow window, int[] offsets, int[] matches, long droppedPairs) {
        this.timeline = timeline;
        this.window = window;
        this.offsets = offsets;
        this.matches = matches;
        this.droppedPairs = droppedPairs;
    }

    /** Frames the labels cover. */
    public FrameTimeline timeline() {
        return timeline;
    }

    /** The window applied when the labels were built. */
    public ExclusionWindow window() {
        return window;
    }

    /** Number of labelled (query, match) pairs kept. */
    public int pairCount() {
        return matches.length;
    }

    /** Labelled pairs removed because the detector may not report them (same frame, inside the window). */
    public long droppedPairs() {
        return droppedPairs;
    }

    /** Number of positive queries (queries whose labelled set is non-empty). */
    public int positiveCount() {
        int n = 0;
        for (int q = 0; q < timeline.size(); q++) {
            n += offsets[q + 1] > offsets[q] ? 1 : 0;
        }
        return n;
    }

    /** True when the query has at least one labelled revisit. */
    public boolean isPositive(FrameKey query) {
        int q = timeline.globalIndex(query);
        return offsets[q + 1] > offsets[q];
    }

    /** The labelled matches of a query, in scan order (empty for a negative query). */
    public List<FrameKey> matchesOf(FrameKey query) {
        int q = timeline.globalIndex(query);
        List<FrameKey> out = new ArrayList<>(offsets[q + 1] - offsets[q]);
        for (int k = offsets[q]; k < offsets[q + 1]; k++) {
            out.add(timeline.keyOf(matches[k]));
        }
        return out;
    }

    /**
     * Whether a reported match is a true revisit: some labelled match of the query lies in the same sequence as
     * {@code match} and within {@code frameTolerance} frames of it.
     *
     * @param frameTolerance allowed offset, frames, >= 0
     */
    public boolean isTrueMatch(FrameKey query, FrameKey match, int frameTolerance) {
        if (frameTolerance < 0) {
            throw new IllegalArgumentException("frame tolerance must be >= 0, was " + frameTolerance);
        }
        int q = timeline.globalIndex(query);
        if (!timeline.contains(match)) {
            return false;
        }
        int m = timeline.globalIndex(match);
        int s = timeline.sequencePosition(m);
        int lo = Math.max(timeline.firstGlobalOf(s), m - frameTolerance);
        int hi = Math.min(timeline.endGlobalOf(s) - 1, m + frameTolerance);
        int k = Arrays.binarySearch(matches, offsets[q], offsets[q + 1], lo);
        int at = k >= 0 ? k : -k - 1;
        return at < offsets[q + 1] && matches[at] <= hi;
    }

    /** All kept pairs as (query, match) frame keys, query in scan order, for writing or plotting. */
    public List<RevisitPair> pairs() {
        List<RevisitPair> out = new ArrayList<>(matches.length);
        for (int q = 0; q < timeline.size(); q++) {
            for (int k = offsets[q]; k < offsets[q + 1]; k++) {
                out.add(new RevisitPair(timeline.keyOf(q), timeline.keyOf(matches[k])));
            }
        }
        return out;
    }

    /** Global indices of the labelled matches of the query at a global index (a fresh array). */
    int[] matchesOfGlobal(int queryGlobal) {
        return Arrays.copyOfRange(matches, offsets[queryGlobal], offsets[queryGlobal + 1]);
    }

    /**
     * The same labels with only queries from the given sequences kept (their matches may lie in any sequence);
     * used to score a tuning split and a held-out split of one multi-sequence scan separately.
     */
    public RevisitLabels restrictedToQueriesIn(Set<String> sequenceIds) {
        int[] newOffsets = new int[offsets.length];
        int[] kept = new int[matches.length];
        int n = 0;
        for (int q = 0; q < timeline.size(); q++) {
            if (sequenceIds.contains(timeline.keyOf(q).sequenceId())) {
                for (int k = offsets[q]; k < offsets[q + 1]; k++) {
                    kept[n++] = matches[k];
                }
            }
            newOffsets[q + 1] = n;
        }
        return new RevisitLabels(timeline, window, newOffsets, Arrays.copyOf(kept, n), droppedPairs);
    }
}
