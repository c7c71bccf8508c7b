package revisit.vocabulary;

import revisit.features.FrameFeatures;

/**
 * The lookup structure of a vocabulary: one {@code long[]} with {@link #NODE_LONGS} longs per node, the node's
 * 256-bit centre followed by a link word. The link holds the number of children in its high 32 bits and, in its
 * low 32 bits, the first child's node id (inner node) or the word id (leaf). Nodes are numbered breadth-first,
 * so the children of a node are one contiguous block, and the links needed after choosing a child sit in the
 * block just read: one descent step touches one block of memory. (A layout with the links in separate arrays
 * touched three places per step; VocabularyLookupBenchmark measured the difference, see docs/VOCABULARY.md.)
 *
 * <p>Immutable after construction; all methods are thread-safe.
 */
final class FlatTree {

    /** Longs per node: 4 for the centre, 1 for the link. */
    static final int NODE_LONGS = FrameFeatures.STRIDE + 1;

    private final long[] nodes;

    /**
     * @param childCount children per node, breadth-first
     * @param firstChild first child of each node
     * @param nodeWord   word of each leaf
     * @param centres    packed centre per node, {@link FrameFeatures#STRIDE} longs each
     */
    FlatTree(int[] childCount, int[] firstChild, int[] nodeWord, long[] centres) {
        int n = childCount.length;
        nodes = new long[n * NODE_LONGS];
        for (int i = 0; i < n; i++) {
            System.arraycopy(centres, i * FrameFeatures.STRIDE, nodes, i * NODE_LONGS, FrameFeatures.STRIDE);
            int low = childCount[i] == 0 ? nodeWord[i] : firstChild[i];
            nodes[i * NODE_LONGS + FrameFeatures.STRIDE] = ((long) childCount[i] << 32) | (low & 0xFFFFFFFFL);
        }
    }

    /** Copies the centre of {@code node} into {@code out} at slot {@code outIndex}. */
    void centre(int node, long[] out, int outIndex) {
        System.arraycopy(nodes, node * NODE_LONGS, out, outIndex * FrameFeatures.STRIDE, FrameFeatures.STRIDE);
    }

    /** The word of descriptor {@code index} of {@code d}. */
    int word(long[] d, int index) {
        int o = index * FrameFeatures.STRIDE;
        long a0 = d[o];
        long a1 = d[o + 1];
        long a2 = d[o + 2];
        long a3 = d[o + 3];
        long link = nodes[FrameFeatures.STRIDE];
        while ((link >>> 32) != 0) {
            link = nodes[nearestChild(link, a0, a1, a2, a3) * NODE_LONGS + FrameFeatures.STRIDE];
        }
        return (int) link;
    }

    /**
     * Descends with descriptor {@code index} of {@code d}; returns the leaf's word and stores in
     * {@code nodesOut[index]} the deepest node on the path at depth {@code nodeLevel} or above.
     */
    int descend(long[] d, int index, int nodeLevel, int[] nodesOut) {
        int o = index * FrameFeatures.STRIDE;
        long a0 = d[o];
        long a1 = d[o + 1];
        long a2 = d[o + 2];
        long a3 = d[o + 3];
        long link = nodes[FrameFeatures.STRIDE];
        int ancestor = 0;
        int level = 0;
        while ((link >>> 32) != 0) {
            int child = nearestChild(link, a0, a1, a2, a3);
            if (++level <= nodeLevel) {
                ancestor = child;
            }
            link = nodes[child * NODE_LONGS + FrameFeatures.STRIDE];
        }
        nodesOut[index] = ancestor;
        return (int) link;
    }

    /**
     * The child (lowest id on a tie) whose centre is nearest; {@code link} is the parent's link. Branch-free: the
     * distance and the child's rank (< 64, see {@link VocabularyConfig#MAX_BRANCHING}) are packed into one key
     * whose minimum picks both, so the unpredictable "is this child nearer" branch becomes a conditional move.
     */
    private int nearestChild(long link, long a0, long a1, long a2, long a3) {
        int first = (int) link;
        int start = first * NODE_LONGS;
        int end = start + (int) (link >>> 32) * NODE_LONGS;
        long[] n = nodes;
        int bestKey = Integer.MAX_VALUE;
        for (int p = start, rank = 0; p < end; p += NODE_LONGS, rank++) {
            int dist = Long.bitCount(a0 ^ n[p]) + Long.bitCount(a1 ^ n[p + 1])
                    + Long.bitCount(a2 ^ n[p + 2]) + Long.bitCount(a3 ^ n[p + 3]);
            bestKey = Math.min(bestKey, (dist << 6) | rank);
        }
        return first + (bestKey & 63);
    }
}
