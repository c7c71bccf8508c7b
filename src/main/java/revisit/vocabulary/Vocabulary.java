package revisit.vocabulary;

import revisit.features.FrameFeatures;

/**
 * A trained visual vocabulary: a tree of binary descriptor centres whose leaves are the words, with an idf weight
 * per word (Nistér and Stewénius, "Scalable Recognition with a Vocabulary Tree", CVPR 2006).
 *
 * <p>Nodes are numbered breadth-first from the root (0), the children of a node contiguous; for lookups the tree is
 * stored flat ({@link FlatTree}), one block of child centres per inner node in one {@code long[]}, and a frame's
 * descriptors descend it in interleaved groups ({@link GroupedDescent}). A descriptor descends from
 * the root, at each node to the child whose centre is nearest in Hamming distance (the lowest-numbered child on a
 * tie), until it reaches a leaf; that leaf's word is the descriptor's word. Words are numbered by a depth-first
 * walk visiting children in order, so the words below any node form a contiguous range.
 *
 * <p>Immutable and thread-safe: lookups keep no state.
 */
public final class Vocabulary {

    private final int branching;
    private final int depth;
    private final String descriptorKind;
    private final int[] childCount;
    private final int[] nodeWord;
    private final int[] wordNode;
    private final byte[] nodeDepth;
    private final FlatTree tree;
    private final double[] weights;
    private final int[] occupancy;
    private final Provenance provenance;

    /**
     * @param childCount children per node, breadth-first; owned by the vocabulary
     * @param centres    packed centre per node (the root's is unused); owned by the vocabulary
     * @param weights    idf weight per word, finite and >= 0; owned by the vocabulary
     * @param occupancy  training descriptors per word, >= 0; owned by the vocabulary
     * @throws IllegalArgumentException when the arrays do not describe a valid tree
     */
    Vocabulary(int branching, int depth, String descriptorKind, int[] childCount, long[] centres, double[] weights,
               int[] occupancy, Provenance provenance) {
        TreeShape shape = TreeShape.of(childCount, branching, depth);
        if (centres.length != (long) childCount.length * FrameFeatures.STRIDE) {
            throw new IllegalArgumentException("expected " + childCount.length + " centres, got "
                    + centres.length / FrameFeatures.STRIDE);
        }
        if (weights.length != shape.wordCount() || occupancy.length != shape.wordCount()) {
            throw new IllegalArgumentException("the tree has " + shape.wordCount() + " words but there are "
                    + weights.length + " weights and " + occupancy.length + " occupancy counts");
        }
        for (int w = 0; w < weights.length; w++) {
            if (!(weights[w] >= 0 && weights[w] < Double.POSITIVE_INFINITY) || occupancy[w] < 0) {
                throw new IllegalArgumentException("word " + w + " has weight " + weights[w] + " and occupancy "
                        + occupancy[w] + ", expected a finite weight >= 0 and occupancy >= 0");
            }
        }
        this.branching = branching;
        this.depth = depth;
        this.descriptorKind = descriptorKind;
        this.childCount = childCount;
        this.nodeWord = shape.nodeWord();
        this.wordNode = new int[shape.wordCount()];
        for (int node = 0; node < childCount.length; node++) {
            if (childCount[node] == 0) {
                wordNode[nodeWord[node]] = node;
            }
        }
        this.nodeDepth = shape.nodeDepth();
        this.tree = new FlatTree(childCount, shape.firstChild(), nodeWord, centres, branching);
        this.weights = weights;
        this.occupancy = occupancy;
        this.provenance = provenance;
    }

    /** Number of words (leaves). */
    public int wordCount() {
        return weights.length;
    }

    /** Number of nodes, root and leaves included. */
    public int nodeCount() {
        return childCount.length;
    }

    /** Largest number of children per node (k). */
    public int branching() {
        return branching;
    }

    /** Depth limit of the tree (L); leaves lie at depth 1..L. */
    public int depth() {
        return depth;
    }

    /** The descriptor kind the vocabulary was trained on. */
    public String descriptorKind() {
        return descriptorKind;
    }

    /** How the vocabulary was trained. */
    public Provenance provenance() {
        return provenance;
    }

    /** idf weight of {@code word}, {@code ln(N / N_i)} (see {@link IdfWeights}). */
    public double weight(int word) {
        return weights[word];
    }

    /** Copy of all word weights, indexed by word. */
    public double[] weights() {
        return weights.clone();
    }

    /** Training descriptors that fell into {@code word}. */
    public int occupancy(int word) {
        return occupancy[word];
    }

    /** Depth of {@code node} (root 0). */
    public int nodeDepth(int node) {
        return nodeDepth[node];
    }

    /** The leaf node of {@code word}. */
    public int wordNode(int word) {
        return wordNode[word];
    }

    /** Number of children of {@code node} (0 for a leaf). */
    public int childCount(int node) {
        return childCount[node];
    }

    /**
     * The word of one descriptor.
     *
     * @param descriptors  packed descriptors, {@link FrameFeatures#STRIDE} longs each; not modified
     * @param featureIndex which descriptor
     * @return word id, 0..wordCount()-1
     */
    public int word(long[] descriptors, int featureIndex) {
        return tree.word(descriptors, featureIndex);
    }

    /**
     * Words of all features of a frame, and for each the node it passed at depth {@code nodeLevel} (root 0).
     * A descriptor whose leaf lies above {@code nodeLevel} reports the leaf itself.
     *
     * @param features  the frame's features; not modified
     * @param nodeLevel depth of the reported node, 0..depth()
     * @param wordsOut  receives the word of feature i at index i; length >= features.count(); modified
     * @param nodesOut  receives the node of feature i at index i; length >= features.count(); modified
     */
    public void lookup(FrameFeatures features, int nodeLevel, int[] wordsOut, int[] nodesOut) {
        if (nodeLevel < 0 || nodeLevel > depth) {
            throw new IllegalArgumentException("node level must be 0.." + depth + ", was " + nodeLevel);
        }
        int n = features.count();
        if (wordsOut.length < n || nodesOut.length < n) {
            throw new IllegalArgumentException("output arrays shorter than the " + n + " features");
        }
        GroupedDescent.lookup(tree, features.descriptors(), n, nodeLevel, wordsOut, nodesOut);
    }

    /** Copy of the centre of {@code node} (4 longs). */
    public long[] centre(int node) {
        long[] out = new long[FrameFeatures.STRIDE];
        tree.centre(node, out, 0);
        return out;
    }

    int[] childCounts() {
        return childCount;
    }

    /** All centres, {@link FrameFeatures#STRIDE} longs per node (a new array). */
    long[] centres() {
        long[] out = new long[childCount.length * FrameFeatures.STRIDE];
        for (int node = 0; node < childCount.length; node++) {
            tree.centre(node, out, node);
        }
        return out;
    }

    int[] occupancies() {
        return occupancy;
    }

    double[] weightArray() {
        return weights;
    }
}
