package revisit.vocabulary;

/**
 * The shape of a flat vocabulary tree, derived from the number of children of each node listed breadth-first,
 * and checked to be a tree: node 0 is the root, the children of node {@code i} are the nodes
 * {@code firstChild[i] .. firstChild[i] + childCount[i] - 1}, every other node has exactly one parent listed
 * before it, and no leaf lies deeper than the depth limit.
 *
 * @param firstChild first child of each node (for leaves: where their children would start)
 * @param nodeWord   word of each leaf, numbered by a depth-first walk visiting children in order; 0 for inner
 *                   nodes (never read for them)
 * @param nodeDepth  depth of each node, root 0
 * @param wordCount  number of leaves
 */
record TreeShape(int[] firstChild, int[] nodeWord, byte[] nodeDepth, int wordCount) {

    /**
     * Derives and checks the shape.
     *
     * @param childCount children per node, breadth-first order; not modified
     * @param branching  largest allowed number of children
     * @param depth      largest allowed leaf depth
     * @throws IllegalArgumentException naming the first inconsistency
     */
    static TreeShape of(int[] childCount, int branching, int depth) {
        int n = childCount.length;
        if (n < 3 || childCount[0] < 2) {
            throw new IllegalArgumentException("the root must have at least 2 children (" + n + " nodes)");
        }
        int[] firstChild = new int[n];
        byte[] nodeDepth = new byte[n];
        long next = 1;
        for (int i = 0; i < n; i++) {
            int c = childCount[i];
            if (c < 0 || c > branching) {
                throw new IllegalArgumentException("node " + i + " has " + c + " children, expected 0.." + branching);
            }
            firstChild[i] = (int) Math.min(next, n);
            if (c > 0 && next <= i) {
                throw new IllegalArgumentException("node " + i + " lists children before itself");
            }
            if (c > 0 && nodeDepth[i] >= depth) {
                throw new IllegalArgumentException("node " + i + " at depth " + nodeDepth[i]
                        + " has children, but the depth limit is " + depth);
            }
            for (long j = next; j < next + c && j < n; j++) {
                nodeDepth[(int) j] = (byte) (nodeDepth[i] + 1);
            }
            next += c;
        }
        if (next != n) {
            throw new IllegalArgumentException("children add up to " + (next - 1) + " nodes below the root, but "
                    + "there are " + (n - 1));
        }
        int[] nodeWord = new int[n];
        int words = numberWords(childCount, firstChild, nodeWord);
        return new TreeShape(firstChild, nodeWord, nodeDepth, words);
    }

    private static int numberWords(int[] childCount, int[] firstChild, int[] nodeWord) {
        int[] stack = new int[childCount.length];
        int top = 0;
        stack[top++] = 0;
        int words = 0;
        while (top > 0) {
            int node = stack[--top];
            if (childCount[node] == 0) {
                nodeWord[node] = words++;
            }
            for (int c = childCount[node] - 1; c >= 0; c--) {
                stack[top++] = firstChild[node] + c;
            }
        }
        return words;
    }
}
