package revisit.vocabulary;

import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;
import java.util.concurrent.RecursiveAction;
import revisit.features.FrameFeatures;

/**
 * Trains a vocabulary tree by hierarchical k-means on binary descriptors (Nistér and Stewénius, "Scalable
 * Recognition with a Vocabulary Tree", CVPR 2006): the descriptors are split into {@code branching} clusters
 * ({@link NodeClustering}), each cluster again, down to {@code depth} levels. A node becomes a leaf (a word) at
 * the last level or when its descriptors are all identical. Words are then weighted by idf ({@link IdfWeights}).
 *
 * <p>Deterministic: each node draws from its own random stream derived from the seed and its path from the
 * root, and parallel work is split into fixed chunks, so any thread count gives the same vocabulary.
 */
public final class VocabularyTrainer {

    /** Nodes with fewer descriptors than this train their whole subtree in one task. */
    private static final int SUBTREE_TASK_MIN = 4096;

    private final VocabularyConfig config;

    /** @param config training parameters */
    public VocabularyTrainer(VocabularyConfig config) {
        this.config = config;
    }

    /**
     * Trains a vocabulary.
     *
     * @param set      training descriptors grouped by image, at least two of them distinct; not modified
     * @param origin   what the training set is, stored as provenance
     * @param progress told as nodes finish
     * @return the trained vocabulary
     */
    public Vocabulary train(TrainingSet set, TrainingOrigin origin, TrainingProgress progress) {
        TrainedTree tree = buildTree(set, progress);
        Provenance provenance = new Provenance(origin.sources(), origin.command(),
                origin.created().truncatedTo(ChronoUnit.SECONDS).toString(), config.seed(), config.maxIterations(),
                set.imageCount(), set.count());
        return TreeFlattener.flatten(tree, set, config, origin.descriptorKind(), provenance);
    }

    /**
     * The trained tree and the order of the training descriptors (each node owns a contiguous range of it).
     *
     * @param root  root node
     * @param order training descriptor indices, grouped by node
     */
    record TrainedTree(TreeNode root, int[] order) {
    }

    /** Builds the tree without flattening it (tests compare the flat lookup against it). */
    TrainedTree buildTree(TrainingSet set, TrainingProgress progress) {
        int n = set.count();
        if (n < 2) {
            throw new IllegalArgumentException("training needs at least 2 descriptors, got " + n
                    + "; train on more or richer images");
        }
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        TreeNode root = new TreeNode(new long[FrameFeatures.STRIDE], 0, 0, n);
        NodeClustering clustering = new NodeClustering(set.descriptors(), config.branching(),
                config.maxIterations());
        Progress counter = new Progress(progress, (long) n * config.depth());
        ForkJoinPool pool = new ForkJoinPool(config.threads());
        try {
            pool.invoke(new NodeTask(root, order, clustering, counter, mix(config.seed())));
        } finally {
            pool.shutdown();
        }
        if (root.isLeaf()) {
            throw new IllegalArgumentException("all " + n + " training descriptors are identical; train on more "
                    + "or richer images");
        }
        return new TrainedTree(root, order);
    }

    /** SplitMix64 finaliser (Steele, Lea and Flood, OOPSLA 2014): decorrelates seeds of neighbouring nodes. */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    private static final class Progress {
        private final TrainingProgress sink;
        private final long total;
        private long done;

        Progress(TrainingProgress sink, long total) {
            this.sink = sink;
            this.total = total;
        }

        synchronized void add(long units) {
            done += units;
            sink.advanced(done, total);
        }
    }

    private final class NodeTask extends RecursiveAction {
        private final TreeNode node;
        private final int[] order;
        private final NodeClustering clustering;
        private final Progress progress;
        private final long seed;

        NodeTask(TreeNode node, int[] order, NodeClustering clustering, Progress progress, long seed) {
            this.node = node;
            this.order = order;
            this.clustering = clustering;
            this.progress = progress;
            this.seed = seed;
        }

        @Override
        protected void compute() {
            int n = node.to - node.from;
            if (node.depth == config.depth()) {
                return;
            }
            NodeClustering.Partition part = clustering.cluster(order, node.from, node.to, seed);
            if (part.clusterCount() < 2) {
                progress.add((long) n * (config.depth() - node.depth));
                return;
            }
            node.children = split(part);
            progress.add(n);
            List<NodeTask> tasks = new ArrayList<>(node.children.length);
            for (int c = 0; c < node.children.length; c++) {
                tasks.add(new NodeTask(node.children[c], order, clustering, progress,
                        mix(seed ^ ((c + 1) * 0x9E3779B97F4A7C15L))));
            }
            if (n >= SUBTREE_TASK_MIN) {
                ForkJoinTask.invokeAll(tasks);
            } else {
                tasks.forEach(NodeTask::compute);
            }
        }

        /** Reorders the node's range by cluster (stable counting sort) and makes one child per cluster. */
        private TreeNode[] split(NodeClustering.Partition part) {
            int k = part.clusterCount();
            int[] start = new int[k + 1];
            for (int c = 0; c < k; c++) {
                start[c + 1] = start[c] + part.sizes()[c];
            }
            int[] next = start.clone();
            int[] sorted = new int[node.to - node.from];
            int[] cluster = part.cluster();
            for (int i = 0; i < cluster.length; i++) {
                sorted[next[cluster[i]]++] = order[node.from + i];
            }
            System.arraycopy(sorted, 0, order, node.from, sorted.length);
            TreeNode[] children = new TreeNode[k];
            for (int c = 0; c < k; c++) {
                long[] centre = new long[FrameFeatures.STRIDE];
                System.arraycopy(part.centres(), c * FrameFeatures.STRIDE, centre, 0, FrameFeatures.STRIDE);
                children[c] = new TreeNode(centre, node.depth + 1, node.from + start[c], node.from + start[c + 1]);
            }
            return children;
        }
    }
}
