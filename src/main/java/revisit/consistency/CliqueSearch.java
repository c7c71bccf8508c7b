package revisit.consistency;

import java.util.Arrays;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;

/**
 * Branch and bound for the maximum clique of one conflict component (see {@link MaximumClique}). Works on local
 * indices 0..k-1 ordered by decreasing degree in the compatibility graph; adjacency as {@code long[]} bit rows.
 * Not reusable: one instance per component.
 */
final class CliqueSearch {

    private final int k;
    private final int[] global;
    private final long[][] adjacent;
    private final long budget;
    private long nodes;
    private boolean complete = true;
    private int[] best;
    private int bestSize;
    private final int[] current;

    CliqueSearch(List<BitSet> conflicts, int[] component, BitSet seed, long budget) {
        this.k = component.length;
        this.budget = budget;
        this.global = order(conflicts, component);
        int words = (k + 63) >>> 6;
        adjacent = new long[k][words];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                if (a != b && !conflicts.get(global[a]).get(global[b])) {
                    adjacent[a][b >>> 6] |= 1L << b;
                }
            }
        }
        current = new int[k];
        best = new int[k];
        for (int a = 0; a < k; a++) {
            if (seed.get(global[a])) {
                best[bestSize++] = a;
            }
        }
    }

    /** Runs the search; returns the best clique as global vertex indices. */
    BitSet run() {
        long[] all = new long[adjacent.length == 0 ? 0 : adjacent[0].length];
        for (int a = 0; a < k; a++) {
            all[a >>> 6] |= 1L << a;
        }
        expand(0, all);
        BitSet out = new BitSet();
        for (int i = 0; i < bestSize; i++) {
            out.set(global[best[i]]);
        }
        return out;
    }

    boolean complete() {
        return complete;
    }

    long nodes() {
        return nodes;
    }

    private void expand(int size, long[] candidates) {
        if (++nodes > budget) {
            complete = false;
            return;
        }
        int count = bitCount(candidates);
        int[] order = new int[count];
        int[] colour = new int[count];
        colourSort(candidates, order, colour);
        for (int idx = count - 1; idx >= 0 && complete; idx--) {
            if (size + colour[idx] <= bestSize) {
                return;
            }
            int v = order[idx];
            current[size] = v;
            long[] next = new long[candidates.length];
            boolean any = false;
            for (int w = 0; w < next.length; w++) {
                next[w] = candidates[w] & adjacent[v][w];
                any |= next[w] != 0;
            }
            if (any) {
                expand(size + 1, next);
            } else if (size + 1 > bestSize) {
                bestSize = size + 1;
                System.arraycopy(current, 0, best, 0, bestSize);
            }
            candidates[v >>> 6] &= ~(1L << v);
        }
    }

    /** Greedy colouring of the candidates, listed by increasing colour number (colours start at 1). */
    private void colourSort(long[] candidates, int[] order, int[] colour) {
        long[] uncoloured = candidates.clone();
        int filled = 0;
        int c = 0;
        while (filled < order.length) {
            c++;
            long[] available = uncoloured.clone();
            for (int w = 0; w < available.length; w++) {
                while (available[w] != 0) {
                    int v = (w << 6) + Long.numberOfTrailingZeros(available[w]);
                    available[w] &= available[w] - 1;
                    uncoloured[w] &= ~(1L << v);
                    for (int x = 0; x < available.length; x++) {
                        available[x] &= ~adjacent[v][x];
                    }
                    order[filled] = v;
                    colour[filled++] = c;
                }
            }
        }
    }

    private static int bitCount(long[] bits) {
        int n = 0;
        for (long w : bits) {
            n += Long.bitCount(w);
        }
        return n;
    }

    /** Component vertices by decreasing compatibility degree (fewest conflicts first), ties by index. */
    private static int[] order(List<BitSet> conflicts, int[] component) {
        return Arrays.stream(component).boxed()
                .sorted(Comparator.<Integer>comparingInt(v -> conflicts.get(v).cardinality())
                        .thenComparingInt(v -> v))
                .mapToInt(Integer::intValue).toArray();
    }
}
