package revisit.vocabulary;

import java.util.Arrays;
import revisit.features.FrameFeatures;

/**
 * The lookup structure of a vocabulary: one block per inner node, holding what a descent needs at that node. A block
 * is a header long followed by the 256-bit centres of the node's children, one after the other (4 longs each); all
 * blocks have the same length, {@code 1 + 4k} longs for branching k (41 longs, 328 bytes, six 64-byte cache lines
 * for k = 10), so a block is found by multiplying its index. Blocks are numbered breadth-first by their node.
 *
 * <p>The header holds the number of children (bits 32..39), the block's kind (bits 40..41) and a base (bits
 * 0..31) from which the next step follows without reading another array:
 * <ul>
 *   <li>{@link #INNER}: every child has children. Siblings' blocks are consecutive, so child r's block starts at
 *       {@code base + r * stride}.</li>
 *   <li>{@link #LEAVES}: every child is a leaf. Their words are consecutive (depth-first numbering), so child r is
 *       word {@code base + r}.</li>
 *   <li>{@link #MIXED}: child r's next step is {@code links[base + r]}: a block offset, or {@code ~word} for a
 *       leaf. Rare in trained trees (1,520 of 934,345 nodes in the k = 10, L = 6 benchmark tree).</li>
 * </ul>
 * Compared with the previous layout (5 longs per node: centre and a link), a descent step reads 6 cache lines
 * instead of 7 or 8; see docs/VOCABULARY.md for the measurements. The frame lookup in {@link GroupedDescent}
 * descends many descriptors at once on top of this layout.
 *
 * <p>Immutable after construction; all methods are thread-safe.
 */
final class FlatTree {

    static final int INNER = 0;
    static final int LEAVES = 1;
    static final int MIXED = 2;
    /** 64-byte cache line, in longs. */
    private static final int LINE_LONGS = 8;

    private final long[] blocks;
    private final int stride;
    private final int[] links;
    private final int[] firstNode;
    private final long[] rootCentre;

    /**
     * @param childCount children per node, breadth-first
     * @param firstChild first child of each node
     * @param nodeWord   word of each leaf
     * @param centres    packed centre per node, {@link FrameFeatures#STRIDE} longs each
     * @param branching  largest number of children of a node
     */
    FlatTree(int[] childCount, int[] firstChild, int[] nodeWord, long[] centres, int branching) {
        int n = childCount.length;
        stride = 1 + branching * FrameFeatures.STRIDE;
        int[] blockOf = new int[n];
        int blockCount = 0;
        for (int i = 0; i < n; i++) {
            blockOf[i] = childCount[i] > 0 ? blockCount++ : -1;
        }
        blocks = new long[Math.multiplyExact(blockCount, stride)];
        firstNode = new int[blockCount];
        int[] linkBuffer = new int[n];
        int linkCount = 0;
        for (int node = 0; node < n; node++) {
            if (childCount[node] > 0) {
                linkCount = fillBlock(node, childCount, firstChild, nodeWord, centres, blockOf, linkBuffer, linkCount);
            }
        }
        links = Arrays.copyOf(linkBuffer, linkCount);
        rootCentre = Arrays.copyOf(centres, FrameFeatures.STRIDE);
    }

    /** Writes the block of {@code node}; returns the new number of used links. */
    private int fillBlock(int node, int[] childCount, int[] firstChild, int[] nodeWord, long[] centres,
                          int[] blockOf, int[] linkBuffer, int linkCount) {
        int count = childCount[node];
        int first = firstChild[node];
        int offset = blockOf[node] * stride;
        firstNode[blockOf[node]] = first;
        int innerChildren = 0;
        for (int r = 0; r < count; r++) {
            System.arraycopy(centres, (first + r) * FrameFeatures.STRIDE, blocks,
                    offset + 1 + r * FrameFeatures.STRIDE, FrameFeatures.STRIDE);
            innerChildren += childCount[first + r] > 0 ? 1 : 0;
        }
        long kind;
        long base;
        int used = linkCount;
        if (innerChildren == count) {
            kind = INNER;
            base = (long) blockOf[first] * stride;
        } else if (innerChildren == 0) {
            kind = LEAVES;
            base = nodeWord[first];
        } else {
            kind = MIXED;
            base = linkCount;
            for (int r = 0; r < count; r++) {
                int child = first + r;
                linkBuffer[used++] = childCount[child] == 0 ? ~nodeWord[child] : blockOf[child] * stride;
            }
        }
        blocks[offset] = base | ((long) count << 32) | (kind << 40);
        return used;
    }

    /** Copies the centre of {@code node} into {@code out} at slot {@code outIndex}. */
    void centre(int node, long[] out, int outIndex) {
        int to = outIndex * FrameFeatures.STRIDE;
        if (node == 0) {
            System.arraycopy(rootCentre, 0, out, to, FrameFeatures.STRIDE);
            return;
        }
        int found = Arrays.binarySearch(firstNode, node);
        int block = found >= 0 ? found : -found - 2;
        int rank = node - firstNode[block];
        System.arraycopy(blocks, block * stride + 1 + rank * FrameFeatures.STRIDE, out, to, FrameFeatures.STRIDE);
    }

    /** The word of descriptor {@code index} of {@code d}, one descriptor at a time. */
    int word(long[] d, int index) {
        int q = index * FrameFeatures.STRIDE;
        long a0 = d[q];
        long a1 = d[q + 1];
        long a2 = d[q + 2];
        long a3 = d[q + 3];
        int next = 0;
        while (next >= 0) {
            long header = blocks[next];
            next = next(header, nearest(next, header, a0, a1, a2, a3));
        }
        return ~next;
    }

    /** The header of the block at {@code offset}. */
    long header(int offset) {
        return blocks[offset];
    }

    /**
     * Where child {@code rank} of a block leads: the offset of its own block (>= 0), or {@code ~word} for a leaf.
     */
    int next(long header, int rank) {
        int base = (int) header;
        int kind = (int) (header >>> 40);
        if (kind == INNER) {
            return base + rank * stride;
        }
        return kind == LEAVES ? ~(base + rank) : links[base + rank];
    }

    /** Node id of child {@code rank} of the block at {@code offset}. */
    int node(int offset, int rank) {
        return firstNode[offset / stride] + rank;
    }

    /**
     * Reads one long from every cache line of the block at {@code offset} but the header's (read separately), so
     * that its misses are in flight before the centres are compared; returns their sum so the reads cannot be
     * dropped as unused. Longs 8 apart lie in consecutive lines, and the last long covers the last line.
     */
    long touch(int offset) {
        long[] b = blocks;
        int last = offset + stride - 1;
        long sum = b[last];
        for (int p = offset + LINE_LONGS; p < last; p += LINE_LONGS) {
            sum += b[p];
        }
        return sum;
    }

    /**
     * Rank of the child whose centre is nearest to the descriptor {@code a0..a3} (lowest rank on a tie).
     * Branch-free: distance and rank are packed into one key whose minimum picks both.
     */
    int nearest(int offset, long header, long a0, long a1, long a2, long a3) {
        int count = (int) (header >>> 32) & 0xFF;
        if (count == 10) {
            return nearestOfTen(offset + 1, a0, a1, a2, a3);
        }
        long[] b = blocks;
        int bestKey = Integer.MAX_VALUE;
        int end = offset + 1 + count * FrameFeatures.STRIDE;
        for (int p = offset + 1, rank = 0; p < end; p += FrameFeatures.STRIDE, rank++) {
            bestKey = Math.min(bestKey, (distance(b, p, a0, a1, a2, a3) << 6) | rank);
        }
        return bestKey & 63;
    }

    /**
     * {@link #nearest} for a block of ten children (the default branching), unrolled so that the ten distances
     * are independent and the minimum is a tree. Written out in full on purpose: at over 325 bytes of bytecode
     * the JIT compiles it as its own method instead of inlining it into the lane loop of {@link GroupedDescent},
     * which measured 25-30% less CPU per descriptor than the inlined form (scratch runs, docs/VOCABULARY.md).
     */
    private int nearestOfTen(int p, long a0, long a1, long a2, long a3) {
        long[] b = blocks;
        int k0 = (Long.bitCount(a0 ^ b[p]) + Long.bitCount(a1 ^ b[p + 1])
                + Long.bitCount(a2 ^ b[p + 2]) + Long.bitCount(a3 ^ b[p + 3])) << 4;
        int k1 = (Long.bitCount(a0 ^ b[p + 4]) + Long.bitCount(a1 ^ b[p + 5])
                + Long.bitCount(a2 ^ b[p + 6]) + Long.bitCount(a3 ^ b[p + 7])) << 4 | 1;
        int k2 = (Long.bitCount(a0 ^ b[p + 8]) + Long.bitCount(a1 ^ b[p + 9])
                + Long.bitCount(a2 ^ b[p + 10]) + Long.bitCount(a3 ^ b[p + 11])) << 4 | 2;
        int k3 = (Long.bitCount(a0 ^ b[p + 12]) + Long.bitCount(a1 ^ b[p + 13])
                + Long.bitCount(a2 ^ b[p + 14]) + Long.bitCount(a3 ^ b[p + 15])) << 4 | 3;
        int k4 = (Long.bitCount(a0 ^ b[p + 16]) + Long.bitCount(a1 ^ b[p + 17])
                + Long.bitCount(a2 ^ b[p + 18]) + Long.bitCount(a3 ^ b[p + 19])) << 4 | 4;
        int k5 = (Long.bitCount(a0 ^ b[p + 20]) + Long.bitCount(a1 ^ b[p + 21])
                + Long.bitCount(a2 ^ b[p + 22]) + Long.bitCount(a3 ^ b[p + 23])) << 4 | 5;
        int k6 = (Long.bitCount(a0 ^ b[p + 24]) + Long.bitCount(a1 ^ b[p + 25])
                + Long.bitCount(a2 ^ b[p + 26]) + Long.bitCount(a3 ^ b[p + 27])) << 4 | 6;
        int k7 = (Long.bitCount(a0 ^ b[p + 28]) + Long.bitCount(a1 ^ b[p + 29])
                + Long.bitCount(a2 ^ b[p + 30]) + Long.bitCount(a3 ^ b[p + 31])) << 4 | 7;
        int k8 = (Long.bitCount(a0 ^ b[p + 32]) + Long.bitCount(a1 ^ b[p + 33])
                + Long.bitCount(a2 ^ b[p + 34]) + Long.bitCount(a3 ^ b[p + 35])) << 4 | 8;
        int k9 = (Long.bitCount(a0 ^ b[p + 36]) + Long.bitCount(a1 ^ b[p + 37])
                + Long.bitCount(a2 ^ b[p + 38]) + Long.bitCount(a3 ^ b[p + 39])) << 4 | 9;
        int low = Math.min(Math.min(k0, k1), Math.min(k2, k3));
        int high = Math.min(Math.min(k4, k5), Math.min(k6, k7));
        return Math.min(Math.min(low, high), Math.min(k8, k9)) & 15;
    }

    private static int distance(long[] b, int p, long a0, long a1, long a2, long a3) {
        return Long.bitCount(a0 ^ b[p]) + Long.bitCount(a1 ^ b[p + 1])
                + Long.bitCount(a2 ^ b[p + 2]) + Long.bitCount(a3 ^ b[p + 3]);
    }
}
