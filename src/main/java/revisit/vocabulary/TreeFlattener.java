package revisit.vocabulary;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import revisit.features.FrameFeatures;

/**
 * Turns a trained {@link TreeNode} tree into the flat arrays of a {@link Vocabulary}: nodes numbered breadth-first
 * (so the children of a node are contiguous), words numbered by a depth-first walk that visits children in order
 * (so the words below any node form one contiguous range), and idf weights from the training images.
 */
final class TreeFlattener {

    private TreeFlattener() {
    }

    static Vocabulary flatten(VocabularyTrainer.TrainedTree tree, TrainingSet set, VocabularyConfig config,
                              String descriptorKind, Provenance provenance) {
        List<TreeNode> bfs = breadthFirst(tree.root());
        int[] childCount = new int[bfs.size()];
        long[] centres = new long[bfs.size() * FrameFeatures.STRIDE];
        for (int i = 0; i < bfs.size(); i++) {
            childCount[i] = bfs.get(i).children.length;
            System.arraycopy(bfs.get(i).centre, 0, centres, i * FrameFeatures.STRIDE, FrameFeatures.STRIDE);
        }
        List<TreeNode> leaves = leavesDepthFirst(tree.root());
        int[] occupancy = new int[leaves.size()];
        int[] imagesPerWord = new int[leaves.size()];
        int[] imageOf = set.imageOfDescriptor();
        int[] lastWordSeen = new int[set.imageCount()];
        Arrays.fill(lastWordSeen, -1);
        for (int w = 0; w < leaves.size(); w++) {
            TreeNode leaf = leaves.get(w);
            occupancy[w] = leaf.to - leaf.from;
            for (int i = leaf.from; i < leaf.to; i++) {
                int image = imageOf[tree.order()[i]];
                if (lastWordSeen[image] != w) {
                    lastWordSeen[image] = w;
                    imagesPerWord[w]++;
                }
            }
        }
        double[] weights = IdfWeights.of(set.imageCount(), imagesPerWord);
        return new Vocabulary(config.branching(), config.depth(), descriptorKind, childCount, centres, weights,
                occupancy, provenance);
    }

    static List<TreeNode> breadthFirst(TreeNode root) {
        List<TreeNode> out = new ArrayList<>();
        ArrayDeque<TreeNode> queue = new ArrayDeque<>();
        queue.add(root);
        while (!queue.isEmpty()) {
            TreeNode node = queue.poll();
            out.add(node);
            queue.addAll(List.of(node.children));
        }
        return out;
    }

    static List<TreeNode> leavesDepthFirst(TreeNode root) {
        List<TreeNode> out = new ArrayList<>();
        ArrayDeque<TreeNode> stack = new ArrayDeque<>();
        stack.push(root);
        while (!stack.isEmpty()) {
            TreeNode node = stack.pop();
            if (node.isLeaf()) {
                out.add(node);
            }
            for (int c = node.children.length - 1; c >= 0; c--) {
                stack.push(node.children[c]);
            }
        }
        return out;
    }
}
