package revisit.vocabulary;

import revisit.features.FrameFeatures;

/**
 * A node of the vocabulary tree while it is trained: its centre, its depth and the range of the training order
 * it owns. Flattened into a {@link Vocabulary} once training ends.
 */
final class TreeNode {

    private static final TreeNode[] NONE = new TreeNode[0];

    final long[] centre;
    final int depth;
    final int from;
    final int to;
    TreeNode[] children = NONE;

    /**
     * @param centre packed centre ({@link FrameFeatures#STRIDE} longs), owned by the node
     * @param depth  0 at the root
     * @param from   first index into the training order
     * @param to     one past the last index into the training order
     */
    TreeNode(long[] centre, int depth, int from, int to) {
        this.centre = centre;
        this.depth = depth;
        this.from = from;
        this.to = to;
    }

    boolean isLeaf() {
        return children.length == 0;
    }
}
