package revisit.evaluation;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * All frames of a scan in scan order: the sequences in the order they are scanned, each in frame order.
 *
 * <p>Every frame has a global index: its position in scan order. A query can only be matched to a frame with a
 * smaller global index (an earlier frame of its own sequence, or any frame of an earlier sequence), because the
 * detector's database holds only frames it has already seen.
 */
public final class FrameTimeline {

    private final List<SequenceFrames> sequences;
    private final Map<String, Integer> positionById;
    private final int[] firstGlobal;
    private final int size;

    /** @param sequences sequences in scan order, ids unique, at least one */
    public FrameTimeline(List<SequenceFrames> sequences) {
        if (sequences == null || sequences.isEmpty()) {
            throw new IllegalArgumentException("a timeline needs at least one sequence");
        }
        this.sequences = List.copyOf(sequences);
        this.positionById = new HashMap<>();
        this.firstGlobal = new int[sequences.size() + 1];
        long total = 0;
        for (int s = 0; s < sequences.size(); s++) {
            String id = sequences.get(s).sequenceId();
            if (positionById.put(id, s) != null) {
                throw new IllegalArgumentException("sequence id '" + id + "' appears twice");
            }
            firstGlobal[s] = (int) total;
            total += sequences.get(s).size();
            if (total > Integer.MAX_VALUE - 1) {
                throw new IllegalArgumentException("more than " + (Integer.MAX_VALUE - 1) + " frames in one scan");
            }
        }
        firstGlobal[sequences.size()] = (int) total;
        this.size = (int) total;
    }

    /** A timeline of one sequence. */
    public static FrameTimeline of(SequenceFrames sequence) {
        return new FrameTimeline(List.of(sequence));
    }

    /** Sequences in scan order (unmodifiable). */
    public List<SequenceFrames> sequences() {
        return Collections.unmodifiableList(sequences);
    }

    /** Total number of frames. */
    public int size() {
        return size;
    }

    /** The sequence with this id, if the timeline has it. */
    public Optional<SequenceFrames> sequence(String sequenceId) {
        Integer s = positionById.get(sequenceId);
        return s == null ? Optional.empty() : Optional.of(sequences.get(s));
    }

    /** True when the frame exists in this timeline. */
    public boolean contains(FrameKey key) {
        Integer s = positionById.get(key.sequenceId());
        return s != null && key.frame() < sequences.get(s).size();
    }

    /**
     * Position of a frame in scan order.
     *
     * @throws IllegalArgumentException when the frame is not in this timeline
     */
    public int globalIndex(FrameKey key) {
        Integer s = positionById.get(key.sequenceId());
        if (s == null || key.frame() >= sequences.get(s).size()) {
            throw new IllegalArgumentException("frame " + key + " is not in the timeline");
        }
        return firstGlobal[s] + key.frame();
    }

    /** The frame at a position in scan order. */
    public FrameKey keyOf(int globalIndex) {
        int s = sequencePosition(globalIndex);
        return new FrameKey(sequences.get(s).sequenceId(), globalIndex - firstGlobal[s]);
    }

    /** Time of the frame at a position in scan order, seconds. */
    public double timeOf(int globalIndex) {
        int s = sequencePosition(globalIndex);
        return sequences.get(s).timeOf(globalIndex - firstGlobal[s]);
    }

    /** Position in scan order (0-based) of the sequence holding a global index. */
    public int sequencePosition(int globalIndex) {
        if (globalIndex < 0 || globalIndex >= size) {
            throw new IllegalArgumentException("global index " + globalIndex + " outside 0.." + (size - 1));
        }
        int lo = 0;
        int hi = sequences.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (firstGlobal[mid] <= globalIndex) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /** Global index of the first frame of the sequence at a scan position. */
    int firstGlobalOf(int sequencePosition) {
        return firstGlobal[sequencePosition];
    }

    /** Global index one past the last frame of the sequence at a scan position. */
    int endGlobalOf(int sequencePosition) {
        return firstGlobal[sequencePosition + 1];
    }

    /**
     * True when the detector may report {@code match} for {@code query}: the match comes earlier in scan order,
     * and, within one sequence, lies outside the exclusion window.
     */
    public boolean allows(ExclusionWindow window, int queryGlobal, int matchGlobal) {
        if (matchGlobal >= queryGlobal) {
            return false;
        }
        int sq = sequencePosition(queryGlobal);
        if (matchGlobal < firstGlobal[sq]) {
            return true;
        }
        return !window.excludes(queryGlobal - matchGlobal, timeOf(queryGlobal) - timeOf(matchGlobal));
    }

    /** Scan-order copy of the sequence ids. */
    public List<String> sequenceIds() {
        List<String> ids = new ArrayList<>();
        sequences.forEach(s -> ids.add(s.sequenceId()));
        return ids;
    }
}
