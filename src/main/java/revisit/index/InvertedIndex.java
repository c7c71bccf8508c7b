package revisit.index;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * Word -> posting list of (frame slot, feature count), the core of the database.
 *
 * <p>Each posting is one int: slot in the high 24 bits, count in the low 8 (255 means "look the count up in
 * {@link #largeCounts}", which holds the rare counts of 255 or more). List {@code w} is the int array
 * {@code lists[w]}, its used length in element 0 and postings from element 1 in increasing slot order; words never
 * seen have no array. The weight of a posting is recomputed as {@code count * idf_w / Z_frame}
 * ({@link WordVector#weight}), so a posting costs 4 bytes instead of 8 for an id and a float weight.
 */
final class InvertedIndex {

    /** Largest slot a posting can hold. */
    static final int MAX_SLOT = (1 << 24) - 1;
    private static final int COUNT_ESCAPE = 255;

    private final int[][] lists;
    private final Map<Long, Integer> largeCounts = new HashMap<>();
    private long postings;

    InvertedIndex(int wordCount) {
        lists = new int[wordCount][];
    }

    /** Appends the postings of a frame; slots must be added in increasing order. */
    void add(int slot, WordVector vector) {
        int[] words = vector.words();
        int[] counts = vector.counts();
        for (int i = 0; i < words.length; i++) {
            append(words[i], slot, counts[i]);
        }
    }

    void append(int word, int slot, int count) {
        int[] list = lists[word];
        if (list == null) {
            list = new int[4];
        } else if (list[0] + 1 == list.length) {
            list = Arrays.copyOf(list, list.length + (list.length >> 1));
        }
        lists[word] = list;
        list[++list[0]] = slot << 8 | Math.min(count, COUNT_ESCAPE);
        if (count >= COUNT_ESCAPE) {
            largeCounts.put(key(word, slot), count);
        }
        postings++;
    }

    /** Number of postings of word {@code w}. */
    int length(int w) {
        int[] list = lists[w];
        return list == null ? 0 : list[0];
    }

    /** The raw list of word {@code w} (element 0 = length), or null; read only. */
    int[] list(int w) {
        return lists[w];
    }

    int wordCount() {
        return lists.length;
    }

    long postingCount() {
        return postings;
    }

    /** Feature count of a posting entry of word {@code w}. */
    int count(int w, int entry) {
        int c = entry & 0xFF;
        return c == COUNT_ESCAPE ? largeCounts.get(key(w, entry >>> 8)) : c;
    }

    /** Feature count of word {@code w} in frame {@code slot}, found by binary search; 0 if absent. */
    int countIn(int w, int slot) {
        int entry = entryOf(w, slot);
        return entry == 0 ? 0 : count(w, entry);
    }

    /** The posting entry of frame {@code slot} in the list of word {@code w}, or 0 if absent. */
    int entryOf(int w, int slot) {
        int[] list = lists[w];
        if (list == null) {
            return 0;
        }
        int lo = 1;
        int hi = list[0];
        while (lo <= hi) {
            int mid = (lo + hi) >>> 1;
            int s = list[mid] >>> 8;
            if (s < slot) {
                lo = mid + 1;
            } else if (s > slot) {
                hi = mid - 1;
            } else {
                return list[mid];
            }
        }
        return 0;
    }

    /**
     * Drops postings of removed frames and renumbers the rest.
     *
     * @param newSlot new slot of each old slot, -1 for removed frames; must keep the order of surviving slots
     */
    void compact(int[] newSlot) {
        Map<Long, Integer> moved = new HashMap<>();
        postings = 0;
        for (int w = 0; w < lists.length; w++) {
            int[] list = lists[w];
            if (list == null) {
                continue;
            }
            int kept = 0;
            for (int k = 1; k <= list[0]; k++) {
                int target = newSlot[list[k] >>> 8];
                if (target >= 0) {
                    if ((list[k] & 0xFF) == COUNT_ESCAPE) {
                        moved.put(key(w, target), largeCounts.get(key(w, list[k] >>> 8)));
                    }
                    list[++kept] = target << 8 | (list[k] & 0xFF);
                }
            }
            lists[w] = kept == 0 ? null : Arrays.copyOf(list, kept + 1);
            if (kept > 0) {
                lists[w][0] = kept;
            }
            postings += kept;
        }
        largeCounts.clear();
        largeCounts.putAll(moved);
    }

    /** Installs a list read from a file: {@code entries[0..length)} in increasing slot order. */
    void setList(int w, int[] entries, int length) {
        int[] list = new int[length + 1];
        list[0] = length;
        System.arraycopy(entries, 0, list, 1, length);
        postings += length - length(w);
        lists[w] = list;
    }

    void putLargeCount(int w, int slot, int count) {
        largeCounts.put(key(w, slot), count);
    }

    Map<Long, Integer> largeCounts() {
        return largeCounts;
    }

    /** Bytes held: arrays with their headers (16 bytes, 8-byte aligned) and about 64 bytes per large count. */
    long memoryBytes() {
        long bytes = Sizes.array(lists.length, 4);
        for (int[] list : lists) {
            if (list != null) {
                bytes += Sizes.array(list.length, 4);
            }
        }
        return bytes + 64L * largeCounts.size();
    }

    static long key(int word, int slot) {
        return (long) word << 32 | slot;
    }
}
