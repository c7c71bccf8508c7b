package revisit.verification;

import java.util.Arrays;
import revisit.features.FrameFeatures;

/**
 * Nearest-neighbour matching of binary descriptors by Hamming distance, with the ratio test (Lowe, IJCV 2004)
 * and a mutual (cross) check: feature i of a and j of b are matched when j is the nearest of i, i is the nearest
 * of j, the distance is at most {@code maxHammingBits} and {@code best < ratio * secondBest} on the a side.
 *
 * <p>The fast path compares only features that fall under the same vocabulary node (the caller's node id per
 * feature, e.g. the node at some level above the leaves), which restricts the search the way direct-index
 * matching does (Galvez-Lopez &amp; Tardos, IEEE T-RO 2012, sec. V). When a node holds a single candidate the
 * ratio test has no second neighbour and is passed; the distance cut still applies. The brute-force path treats
 * all features as one node. Results are ordered by the index in a; stateless and thread-safe.
 */
public final class DescriptorMatcher {

    private final double ratio;
    private final int maxHammingBits;

    /** @param config supplies {@code ratio} and {@code maxHammingBits} */
    public DescriptorMatcher(VerificationConfig config) {
        this.ratio = config.ratio();
        this.maxHammingBits = config.maxHammingBits();
    }

    /** Matches every feature of a against every feature of b. */
    public Correspondences matchAll(FrameFeatures a, FrameFeatures b) {
        return match(a, new int[a.count()], b, new int[b.count()]);
    }

    /**
     * Matches only features that share a vocabulary node.
     *
     * @param nodesA node id per feature of a (at least {@code a.count()} entries)
     * @param nodesB node id per feature of b (at least {@code b.count()} entries)
     */
    public Correspondences matchWithinNodes(FrameFeatures a, int[] nodesA, FrameFeatures b, int[] nodesB) {
        if (nodesA.length < a.count() || nodesB.length < b.count()) {
            throw new IllegalArgumentException("node arrays shorter than feature counts: " + nodesA.length + " < "
                    + a.count() + " or " + nodesB.length + " < " + b.count());
        }
        return match(a, nodesA, b, nodesB);
    }

    private Correspondences match(FrameFeatures a, int[] nodesA, FrameFeatures b, int[] nodesB) {
        long[] keysA = sortedKeys(nodesA, a.count());
        long[] keysB = sortedKeys(nodesB, b.count());
        Nearest best = new Nearest(a.count(), b.count());
        int ia = 0;
        int ib = 0;
        while (ia < keysA.length && ib < keysB.length) {
            int nodeA = (int) (keysA[ia] >> 32);
            int nodeB = (int) (keysB[ib] >> 32);
            int endA = groupEnd(keysA, ia);
            int endB = groupEnd(keysB, ib);
            if (nodeA == nodeB) {
                matchGroup(a.descriptors(), keysA, ia, endA, b.descriptors(), keysB, ib, endB, best);
            }
            if (nodeA <= nodeB) {
                ia = endA;
            }
            if (nodeB <= nodeA) {
                ib = endB;
            }
        }
        return accept(best.ofA, best.distA, best.secondA, best.ofB);
    }

    /** Nearest neighbours found so far: per a feature its best b, distance and second distance; per b its best a. */
    private static final class Nearest {
        final int[] ofA;
        final int[] distA;
        final int[] secondA;
        final int[] ofB;
        final int[] distB;

        Nearest(int countA, int countB) {
            ofA = new int[countA];
            distA = new int[countA];
            secondA = new int[countA];
            ofB = new int[countB];
            distB = new int[countB];
            Arrays.fill(ofA, -1);
            Arrays.fill(ofB, -1);
            Arrays.fill(distB, Integer.MAX_VALUE);
        }
    }

    /** Compares every a feature of keysA[ia, endA) with every b feature of keysB[ib, endB). */
    private static void matchGroup(long[] da, long[] keysA, int ia, int endA, long[] db, long[] keysB, int ib,
                                   int endB, Nearest n) {
        for (int p = ia; p < endA; p++) {
            int i = (int) keysA[p];
            int base = i * FrameFeatures.STRIDE;
            long a0 = da[base];
            long a1 = da[base + 1];
            long a2 = da[base + 2];
            long a3 = da[base + 3];
            int best = Integer.MAX_VALUE;
            int second = Integer.MAX_VALUE;
            int bestJ = -1;
            for (int q = ib; q < endB; q++) {
                int j = (int) keysB[q];
                int jb = j * FrameFeatures.STRIDE;
                int d = Long.bitCount(a0 ^ db[jb]) + Long.bitCount(a1 ^ db[jb + 1])
                        + Long.bitCount(a2 ^ db[jb + 2]) + Long.bitCount(a3 ^ db[jb + 3]);
                if (d < best) {
                    second = best;
                    best = d;
                    bestJ = j;
                } else if (d < second) {
                    second = d;
                }
                if (d < n.distB[j]) {
                    n.distB[j] = d;
                    n.ofB[j] = i;
                }
            }
            n.ofA[i] = bestJ;
            n.distA[i] = best;
            n.secondA[i] = second;
        }
    }

    private Correspondences accept(int[] bestOfA, int[] bestDistA, int[] secondDistA, int[] bestOfB) {
        int n = 0;
        int[] ia = new int[bestOfA.length];
        int[] ib = new int[bestOfA.length];
        int[] dist = new int[bestOfA.length];
        for (int i = 0; i < bestOfA.length; i++) {
            int j = bestOfA[i];
            if (j < 0 || bestOfB[j] != i || bestDistA[i] > maxHammingBits) {
                continue;
            }
            boolean hasSecond = secondDistA[i] != Integer.MAX_VALUE;
            if (hasSecond && !(bestDistA[i] < ratio * secondDistA[i])) {
                continue;
            }
            ia[n] = i;
            ib[n] = j;
            dist[n] = bestDistA[i];
            n++;
        }
        return new Correspondences(n, Arrays.copyOf(ia, n), Arrays.copyOf(ib, n), Arrays.copyOf(dist, n));
    }

    /** Keys {@code node << 32 | index}, sorted: features grouped by node, by index within a node. */
    private static long[] sortedKeys(int[] nodes, int count) {
        long[] keys = new long[count];
        for (int i = 0; i < count; i++) {
            keys[i] = ((long) nodes[i] << 32) | i;
        }
        Arrays.sort(keys);
        return keys;
    }

    private static int groupEnd(long[] keys, int start) {
        long node = keys[start] >> 32;
        int end = start + 1;
        while (end < keys.length && keys[end] >> 32 == node) {
            end++;
        }
        return end;
    }
}
