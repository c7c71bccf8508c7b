package revisit.index;

/**
 * Keeps the {@code capacity} best (score, slot) pairs seen: a binary min-heap whose root is the worst kept pair.
 * A pair is worse than another when its score is lower, or equal with a higher slot, so results do not depend on
 * the order pairs arrive in.
 */
final class TopFrames {

    private int[] slots = new int[0];
    private double[] scores = new double[0];
    private int size;
    private int capacity;

    void reset(int capacity) {
        if (slots.length < capacity) {
            slots = new int[capacity];
            scores = new double[capacity];
        }
        this.capacity = capacity;
        size = 0;
    }

    /**
     * Lowest score that may still enter: the worst kept score once full (ties enter and are settled by slot),
     * else the smallest positive float, so that zero scores never enter.
     */
    double entryBar() {
        return size < capacity ? Float.MIN_VALUE : scores[0];
    }

    void offer(int slot, double score) {
        if (size < capacity) {
            slots[size] = slot;
            scores[size] = score;
            siftUp(size++);
        } else if (worse(slots[0], scores[0], slot, score)) {
            slots[0] = slot;
            scores[0] = score;
            siftDown(0);
        }
    }

    int size() {
        return size;
    }

    int slot(int i) {
        return slots[i];
    }

    double score(int i) {
        return scores[i];
    }

    /**
     * Empties the heap into {@code outSlots} / {@code outScores} best first (sorted by the same order), in
     * O(n log n).
     */
    void drainBestFirst(int[] outSlots, double[] outScores) {
        for (int i = size - 1; i >= 0; i--) {
            outSlots[i] = slots[0];
            outScores[i] = scores[0];
            size--;
            if (size > 0) {
                slots[0] = slots[size];
                scores[0] = scores[size];
                siftDown(0);
            }
        }
    }

    private static boolean worse(int slotA, double scoreA, int slotB, double scoreB) {
        return scoreA < scoreB || (scoreA == scoreB && slotA > slotB);
    }

    private void siftUp(int i) {
        while (i > 0) {
            int parent = (i - 1) >> 1;
            if (!worse(slots[i], scores[i], slots[parent], scores[parent])) {
                return;
            }
            swap(i, parent);
            i = parent;
        }
    }

    private void siftDown(int i) {
        while (true) {
            int left = 2 * i + 1;
            if (left >= size) {
                return;
            }
            int worst = left;
            if (left + 1 < size && worse(slots[left + 1], scores[left + 1], slots[left], scores[left])) {
                worst = left + 1;
            }
            if (!worse(slots[worst], scores[worst], slots[i], scores[i])) {
                return;
            }
            swap(i, worst);
            i = worst;
        }
    }

    private void swap(int a, int b) {
        int s = slots[a];
        slots[a] = slots[b];
        slots[b] = s;
        double v = scores[a];
        scores[a] = scores[b];
        scores[b] = v;
    }
}
