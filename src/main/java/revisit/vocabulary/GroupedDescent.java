package revisit.vocabulary;

import revisit.features.FrameFeatures;

/**
 * Descends the descriptors of a frame through a {@link FlatTree} in groups of {@link #LANES}, level by level, so
 * that their cache misses overlap instead of following one another.
 *
 * <p>A single descent is a chain of dependent loads: the block read at one level is only known once the previous
 * block's distances are computed, and the deep blocks of a large tree are not in the cache. The processor can only
 * overlap the misses of the next one or two descriptors, because the work of one step (ten distances) fills its
 * reorder window. Here each level runs in two passes over the group: the first picks the nearest child for every
 * descriptor, the second only reads one long from each cache line of every next block. The second pass is short,
 * so all its misses (6 lines for each of the 16 descriptors) are in flight together, and the next first pass finds
 * its blocks in the cache. With the k = 10, L = 6 benchmark tree this halved the CPU time per descriptor
 * (VocabularyLookupBenchmark, docs/VOCABULARY.md).
 *
 * <p>The result is exactly the per-descriptor descent ({@link FlatTree#word}): the passes only reorder work.
 * Stateless apart from arrays local to one call, so thread-safe.
 */
final class GroupedDescent {

    /** Descriptors descended together: 8, 16 and 32 measured alike (scratch runs, docs/VOCABULARY.md). */
    static final int LANES = 16;

    private GroupedDescent() {
    }

    /**
     * Words of descriptors 0..n-1 of {@code d}, and for each the node on its path at depth {@code nodeLevel} (or its
     * leaf when that lies higher).
     *
     * @param wordsOut receives word i at index i; modified
     * @param nodesOut receives node i at index i; modified
     */
    static void lookup(FlatTree tree, long[] d, int n, int nodeLevel, int[] wordsOut, int[] nodesOut) {
        int[] offset = new int[LANES];
        long[] header = new long[LANES];
        long[] ancestor = new long[LANES];
        long rootHeader = tree.header(0);
        for (int group = 0; group < n; group += LANES) {
            int lanes = Math.min(LANES, n - group);
            for (int l = 0; l < lanes; l++) {
                offset[l] = 0;
                header[l] = rootHeader;
                ancestor[l] = -1;
            }
            int active = lanes;
            for (int level = 1; active > 0; level++) {
                active = chooseChildren(tree, d, group, lanes, level <= nodeLevel, offset, header, ancestor,
                        wordsOut, nodesOut);
                touchNextBlocks(tree, group, lanes, offset, header, wordsOut);
            }
        }
    }

    /**
     * One level for every lane still descending: picks the nearest child, records it as the ancestor (block offset
     * and rank; -1 for the root) when {@code atOrAboveNodeLevel}, moves to the child's block or, at a leaf, writes the results and retires the lane
     * (offset -1). Returns the number of lanes still descending.
     */
    private static int chooseChildren(FlatTree tree, long[] d, int group, int lanes, boolean atOrAboveNodeLevel,
                                      int[] offset, long[] header, long[] ancestor, int[] wordsOut, int[] nodesOut) {
        int active = 0;
        for (int l = 0; l < lanes; l++) {
            int o = offset[l];
            if (o < 0) {
                continue;
            }
            int q = (group + l) * FrameFeatures.STRIDE;
            int rank = tree.nearest(o, header[l], d[q], d[q + 1], d[q + 2], d[q + 3]);
            if (atOrAboveNodeLevel) {
                ancestor[l] = ((long) o << 32) | rank;
            }
            int next = tree.next(header[l], rank);
            if (next >= 0) {
                offset[l] = next;
                active++;
            } else {
                offset[l] = -1;
                wordsOut[group + l] = ~next;
                long a = ancestor[l];
                nodesOut[group + l] = a < 0 ? 0 : tree.node((int) (a >>> 32), (int) a);
            }
        }
        return active;
    }

    /**
     * Starts the loads of every lane's next block. The header is kept; the sum of the other touched longs is
     * parked in the lane's word slot, which the lane's final word overwrites, so the JIT cannot drop the reads.
     */
    private static void touchNextBlocks(FlatTree tree, int group, int lanes, int[] offset, long[] header,
                                        int[] wordsOut) {
        for (int l = 0; l < lanes; l++) {
            int o = offset[l];
            if (o >= 0) {
                header[l] = tree.header(o);
                wordsOut[group + l] = (int) tree.touch(o);
            }
        }
    }
}
