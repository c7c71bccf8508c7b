package revisit.index;

import java.util.Arrays;

/**
 * The direct index entry of one frame: its features grouped by vocabulary tree node, so that matching two frames
 * compares only features that share a node.
 *
 * @param nodes    distinct node ids, increasing; do not modify
 * @param offsets  features of {@code nodes[i]} are {@code features[offsets[i] .. offsets[i + 1])}; length
 *                 {@code nodes.length + 1}; do not modify
 * @param features feature indices (positions in the frame's feature list), increasing within each node; do not
 *                 modify
 */
public record NodeFeatures(int[] nodes, int[] offsets, int[] features) {

    public NodeFeatures {
        if (offsets.length != nodes.length + 1 || offsets[nodes.length] != features.length) {
            throw new IllegalArgumentException("offsets must have nodes + 1 entries ending at the feature count");
        }
    }

    /** Number of distinct nodes. */
    public int nodeCount() {
        return nodes.length;
    }

    /** Feature indices under {@code node}, increasing; empty if the frame has none there. */
    public int[] featuresOf(int node) {
        int i = Arrays.binarySearch(nodes, node);
        return i < 0 ? new int[0] : Arrays.copyOfRange(features, offsets[i], offsets[i + 1]);
    }
}
