package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import revisit.features.FrameFeatures;

class VocabularyTest {

    private static final int QUERIES = 20_000;
    private static VocabularyTrainer.TrainedTree tree;
    private static Vocabulary vocabulary;
    private static Map<TreeNode, Integer> bfsId;
    private static Map<TreeNode, Integer> wordOfLeaf;

    @BeforeAll
    static void trainOnRandomDescriptors() {
        // Uniformly random descriptors (seed 5) give many Hamming ties, which exercises the tie rule too.
        long[] data = SyntheticDescriptors.random(30_000, 5);
        TrainingSet set = SyntheticDescriptors.set(data, 30_000, 300);
        VocabularyConfig config = VocabularyConfig.defaults().withBranching(6).withDepth(4).withThreads(2);
        tree = new VocabularyTrainer(config).buildTree(set, TrainingProgress.NONE);
        vocabulary = TreeFlattener.flatten(tree, set, config, "k", VocabularyTrainerTest.provenance());
        bfsId = new IdentityHashMap<>();
        List<TreeNode> bfs = TreeFlattener.breadthFirst(tree.root());
        for (int i = 0; i < bfs.size(); i++) {
            bfsId.put(bfs.get(i), i);
        }
        wordOfLeaf = new IdentityHashMap<>();
        List<TreeNode> leaves = TreeFlattener.leavesDepthFirst(tree.root());
        for (int w = 0; w < leaves.size(); w++) {
            wordOfLeaf.put(leaves.get(w), w);
        }
    }

    /** Distance by testing every bit: the plainest possible reference. */
    private static int bitByBitDistance(long[] a, int ia, long[] b, int ib) {
        int d = 0;
        for (int bit = 0; bit < FrameFeatures.DESCRIPTOR_BITS; bit++) {
            long x = a[ia * 4 + bit / 64] >>> (bit % 64) & 1L;
            long y = b[ib * 4 + bit / 64] >>> (bit % 64) & 1L;
            d += x != y ? 1 : 0;
        }
        return d;
    }

    /** Reference descent over the trained object tree; returns the path from the root to the leaf. */
    private static TreeNode[] descend(long[] queries, int q) {
        TreeNode[] path = new TreeNode[vocabulary.depth() + 1];
        TreeNode node = tree.root();
        path[0] = node;
        while (!node.isLeaf()) {
            TreeNode best = node.children[0];
            for (TreeNode child : node.children) {
                if (bitByBitDistance(child.centre, 0, queries, q) < bitByBitDistance(best.centre, 0, queries, q)) {
                    best = child;
                }
            }
            node = best;
            path[node.depth] = node;
        }
        return path;
    }

    private static FrameFeatures frame(long[] descriptors, int n) {
        return new FrameFeatures(n, new float[n], new float[n], new float[n], new int[n], new float[n],
                new float[n], descriptors);
    }

    @Test
    void flatLookupFindsTheSameWordAsAReferenceDescent() {
        long[] queries = SyntheticDescriptors.random(QUERIES, 6);
        for (int q = 0; q < QUERIES; q++) {
            TreeNode leaf = deepest(descend(queries, q));
            assertEquals(wordOfLeaf.get(leaf), vocabulary.word(queries, q), "query " + q);
        }
    }

    @Test
    void lookupReportsTheAncestorAtEachLevelLikeTheReferenceDescent() {
        long[] queries = SyntheticDescriptors.random(2000, 7);
        FrameFeatures frame = frame(queries, 2000);
        int[] words = new int[2000];
        int[] nodes = new int[2000];
        for (int level = 0; level <= vocabulary.depth(); level++) {
            vocabulary.lookup(frame, level, words, nodes);
            for (int q = 0; q < 2000; q++) {
                TreeNode[] path = descend(queries, q);
                TreeNode leaf = deepest(path);
                TreeNode ancestor = level <= leaf.depth ? path[level] : leaf;
                assertEquals(wordOfLeaf.get(leaf), words[q], "query " + q);
                assertEquals(bfsId.get(ancestor), nodes[q], "query " + q + " level " + level);
                assertEquals(Math.min(level, leaf.depth), vocabulary.nodeDepth(nodes[q]));
            }
        }
    }

    @Test
    void concurrentLookupsAgreeWithSequentialOnes() throws Exception {
        long[] queries = SyntheticDescriptors.random(5000, 9);
        int[] expected = new int[5000];
        for (int q = 0; q < 5000; q++) {
            expected[q] = vocabulary.word(queries, q);
        }
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<int[]>> results = new ArrayList<>();
            for (int t = 0; t < 4; t++) {
                results.add(pool.submit(() -> {
                    int[] words = new int[5000];
                    int[] nodes = new int[5000];
                    vocabulary.lookup(frame(queries, 5000), 2, words, nodes);
                    return words;
                }));
            }
            for (Future<int[]> r : results) {
                assertArrayEquals(expected, r.get());
            }
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void numbersNodesBreadthFirstWithContiguousChildren() {
        List<TreeNode> bfs = TreeFlattener.breadthFirst(tree.root());
        assertEquals(bfs.size(), vocabulary.nodeCount());
        for (int i = 0; i < bfs.size(); i++) {
            assertArrayEquals(bfs.get(i).centre, vocabulary.centre(i));
            assertEquals(bfs.get(i).children.length, vocabulary.childCount(i));
            for (int c = 1; c < bfs.get(i).children.length; c++) {
                assertEquals(bfsId.get(bfs.get(i).children[c - 1]) + 1, bfsId.get(bfs.get(i).children[c]));
            }
        }
        assertTrue(vocabulary.wordCount() > 1000, "words " + vocabulary.wordCount());
    }

    @Test
    void weightsReturnsACopy() {
        double[] w = vocabulary.weights();
        w[0] = 1e9;
        assertEquals(vocabulary.weights()[0], vocabulary.weight(0));
        assertTrue(vocabulary.weight(0) < 1e9);
    }

    @Test
    void rejectsANodeLevelOutsideTheTreeAndShortOutputArrays() {
        FrameFeatures frame = frame(SyntheticDescriptors.random(3, 8), 3);
        assertThrows(IllegalArgumentException.class, () -> vocabulary.lookup(frame, 5, new int[3], new int[3]));
        assertThrows(IllegalArgumentException.class, () -> vocabulary.lookup(frame, -1, new int[3], new int[3]));
        assertThrows(IllegalArgumentException.class, () -> vocabulary.lookup(frame, 1, new int[2], new int[3]));
    }

    private static TreeNode deepest(TreeNode[] path) {
        TreeNode last = path[0];
        for (TreeNode n : path) {
            last = n != null ? n : last;
        }
        return last;
    }
}
