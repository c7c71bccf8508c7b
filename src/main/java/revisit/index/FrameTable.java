package revisit.index;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import java.util.OptionalInt;

/**
 * Per-frame facts by slot (the frame's position in the database, in order of addition): sequence, frame id, time,
 * {@code 1 / Z} of its vector, and whether it was removed. Removed frames keep their slot until {@link #compact()}.
 */
final class FrameTable {

    private int[] sequenceIds = new int[16];
    private int[] frameIds = new int[16];
    private double[] times = new double[16];
    private float[] inverseNorms = new float[16];
    private boolean[] removed = new boolean[16];
    private final Map<Long, Integer> slotByKey = new HashMap<>();
    private int slots;
    private int live;
    private int version;

    /** Adds a frame and returns its slot. */
    int append(int sequenceId, int frameId, double timeSeconds, float inverseNorm) {
        if (slots > InvertedIndex.MAX_SLOT) {
            throw new IllegalStateException("the database holds its maximum of " + (InvertedIndex.MAX_SLOT + 1)
                    + " frames; save it and start a new one for further frames");
        }
        if (slots == sequenceIds.length) {
            int capacity = slots + (slots >> 1);
            sequenceIds = Arrays.copyOf(sequenceIds, capacity);
            frameIds = Arrays.copyOf(frameIds, capacity);
            times = Arrays.copyOf(times, capacity);
            inverseNorms = Arrays.copyOf(inverseNorms, capacity);
            removed = Arrays.copyOf(removed, capacity);
        }
        sequenceIds[slots] = sequenceId;
        frameIds[slots] = frameId;
        times[slots] = timeSeconds;
        inverseNorms[slots] = inverseNorm;
        slotByKey.put(key(sequenceId, frameId), slots);
        live++;
        return slots++;
    }

    OptionalInt slotOf(int sequenceId, int frameId) {
        Integer slot = slotByKey.get(key(sequenceId, frameId));
        return slot == null ? OptionalInt.empty() : OptionalInt.of(slot);
    }

    void markRemoved(int slot) {
        removed[slot] = true;
        slotByKey.remove(key(sequenceIds[slot], frameIds[slot]));
        live--;
    }

    /**
     * Drops removed frames, keeping the order of the others.
     *
     * @return new slot of each old slot, -1 for removed ones
     */
    int[] compact() {
        int[] newSlot = new int[slots];
        int next = 0;
        for (int s = 0; s < slots; s++) {
            if (removed[s]) {
                newSlot[s] = -1;
                continue;
            }
            newSlot[s] = next;
            sequenceIds[next] = sequenceIds[s];
            frameIds[next] = frameIds[s];
            times[next] = times[s];
            inverseNorms[next] = inverseNorms[s];
            removed[next] = false;
            slotByKey.put(key(sequenceIds[next], frameIds[next]), next);
            next++;
        }
        Arrays.fill(removed, next, slots, false);
        slots = next;
        version++;
        return newSlot;
    }

    /**
     * Whether frame {@code slot} may answer a query: it is live, its sequence is in the scope, and when it belongs
     * to the query's sequence it lies outside the exclusion window in both time and frame id.
     */
    boolean eligible(int slot, FrameWords query, IndexConfig config) {
        if (removed[slot] || !config.scope().admits(query.sequenceId(), sequenceIds[slot])) {
            return false;
        }
        if (sequenceIds[slot] != query.sequenceId()) {
            return true;
        }
        return Math.abs(times[slot] - query.timeSeconds()) >= config.exclusionSeconds()
                && Math.abs((long) frameIds[slot] - query.frameId()) >= config.exclusionFrames();
    }

    boolean isRemoved(int slot) {
        return removed[slot];
    }

    int slotCount() {
        return slots;
    }

    int liveCount() {
        return live;
    }

    int sequenceId(int slot) {
        return sequenceIds[slot];
    }

    int frameId(int slot) {
        return frameIds[slot];
    }

    double timeSeconds(int slot) {
        return times[slot];
    }

    float inverseNorm(int slot) {
        return inverseNorms[slot];
    }

    /** Changes whenever slots are renumbered ({@link #compact()}). */
    int version() {
        return version;
    }

    /** Bytes held: the per-slot arrays at their capacity plus about 72 bytes per entry of the key map. */
    long memoryBytes() {
        int capacity = sequenceIds.length;
        return Sizes.array(capacity, 4) * 3 + Sizes.array(capacity, 8) + Sizes.array(capacity, 1)
                + 72L * slotByKey.size() + Sizes.array(Integer.highestOneBit(Math.max(1, slotByKey.size())) * 2L, 4);
    }

    private static long key(int sequenceId, int frameId) {
        return (long) sequenceId << 32 | frameId;
    }
}
