package revisit.verification;

import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;

/**
 * Random sample consensus over rigid poses (Fischler and Bolles, CACM 24(6), 1981) with the adaptive iteration count
 * {@code N = log(1 - confidence) / log(1 - w^s)} for inlier ratio w and sample size s, updated whenever a better
 * hypothesis is found (common practice). The random generator is created from the seed on every call, so a call
 * is reproducible and independent of earlier calls.
 */
final class PoseRansac {

    /** A correspondence set that can propose and score poses. */
    interface Model {
        /** Number of correspondences. */
        int size();

        /** Correspondences in a minimal sample. */
        int sampleSize();

        /** Adds the poses fitted to the sampled correspondences (none when degenerate). */
        void hypotheses(int[] sample, List<Se3_F64> out);

        /** Marks the inliers of a pose in mask (length size()) and returns their number. */
        int score(Se3_F64 aFromB, boolean[] mask);
    }

    /** Best hypothesis and its inliers. */
    record Outcome(Se3_F64 aFromB, boolean[] mask, int inliers) {
    }

    private PoseRansac() {
    }

    static Optional<Outcome> run(Model model, double confidence, int maxIterations, long seed) {
        int n = model.size();
        int s = model.sampleSize();
        if (n < s) {
            return Optional.empty();
        }
        SplittableRandom random = new SplittableRandom(seed);
        int[] sample = new int[s];
        boolean[] mask = new boolean[n];
        List<Se3_F64> candidates = new ArrayList<>();
        Outcome best = null;
        long needed = maxIterations;
        for (int iter = 0; iter < Math.min(needed, maxIterations); iter++) {
            drawDistinct(random, n, sample);
            candidates.clear();
            model.hypotheses(sample, candidates);
            for (Se3_F64 pose : candidates) {
                int inliers = model.score(pose, mask);
                if (best == null || inliers > best.inliers()) {
                    best = new Outcome(pose.copy(), mask.clone(), inliers);
                    needed = iterationsNeeded((double) inliers / n, s, confidence);
                }
            }
        }
        return Optional.ofNullable(best);
    }

    static long iterationsNeeded(double inlierRatio, int sampleSize, double confidence) {
        double allInliers = Math.pow(inlierRatio, sampleSize);
        if (allInliers >= 1) {
            return 1;
        }
        if (allInliers <= 0) {
            return Long.MAX_VALUE;
        }
        return (long) Math.ceil(Math.log(1 - confidence) / Math.log(1 - allInliers));
    }

    private static void drawDistinct(SplittableRandom random, int n, int[] sample) {
        for (int k = 0; k < sample.length; k++) {
            int candidate;
            boolean repeated;
            do {
                candidate = random.nextInt(n);
                repeated = false;
                for (int j = 0; j < k; j++) {
                    repeated |= sample[j] == candidate;
                }
            } while (repeated);
            sample[k] = candidate;
        }
    }
}
