package revisit.vocabulary;

import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import revisit.features.FrameFeatures;

/**
 * k-means on binary descriptors for one node of the vocabulary tree: greedy k-means++ seeding
 * ({@link KMeansSeeding}), then Lloyd iterations with bit-majority centres until no assignment changes or the
 * iteration limit is reached. A cluster that empties is re-seeded on the member farthest from its centre.
 *
 * <p>The final assignment is always the nearest-centre assignment for the returned centres (ties go to the lower
 * cluster index), so a descent through the tree sends every training descriptor to the child it was assigned to.
 * Large nodes are split into fixed chunks that run as fork/join tasks; all sums are integer sums over fixed
 * chunks, so the result does not depend on the number of threads. Must run inside a {@code ForkJoinPool}.
 */
final class NodeClustering {

    private static final int S = FrameFeatures.STRIDE;

    /**
     * Clusters of one node, empty clusters dropped.
     *
     * @param centres      packed centres of the non-empty clusters, in cluster order
     * @param clusterCount number of non-empty clusters
     * @param cluster      cluster of each member, in member order
     * @param sizes        members per cluster
     */
    record Partition(long[] centres, int clusterCount, int[] cluster, int[] sizes) {
    }

    private record Pass(BitCounter counts, int changed) {
    }

    private final long[] data;
    private final int branching;
    private final int maxIterations;
    private final KMeansSeeding seeding;

    /**
     * @param data          packed descriptors of the whole training set, not modified
     * @param branching     clusters wanted (k)
     * @param maxIterations Lloyd iterations after seeding
     */
    NodeClustering(long[] data, int branching, int maxIterations) {
        this.data = data;
        this.branching = branching;
        this.maxIterations = maxIterations;
        this.seeding = new KMeansSeeding(data, branching);
    }

    /**
     * Clusters the descriptors {@code order[from..to)}.
     *
     * @param order descriptor indices, not modified
     * @param seed  seed of this node's k-means++ draws
     */
    Partition cluster(int[] order, int from, int to, long seed) {
        long[] centres = new long[branching * S];
        int chosen = seeding.seed(order, from, to, centres, new SplittableRandom(seed));
        int[] assign = new int[to - from];
        int[] distance = new int[to - from];
        Arrays.fill(assign, -1);
        Pass pass = assignAndCount(order, from, assign, distance, centres, chosen);
        for (int it = 0; it < maxIterations && pass.changed() > 0; it++) {
            for (int c = 0; c < chosen; c++) {
                pass.counts().majority(c, centres);
            }
            reseedEmpty(order, from, distance, centres, chosen, pass.counts());
            pass = assignAndCount(order, from, assign, distance, centres, chosen);
        }
        return compact(centres, chosen, assign, pass.counts());
    }

    /**
     * Moves the centre of each empty cluster onto the member farthest from its own centre (lowest index on a
     * tie; common practice), so that a poor seeding does not cost a child.
     */
    private void reseedEmpty(int[] order, int from, int[] distance, long[] centres, int chosen, BitCounter counts) {
        boolean[] taken = null;
        for (int c = 0; c < chosen; c++) {
            if (counts.members(c) > 0) {
                continue;
            }
            taken = taken == null ? new boolean[distance.length] : taken;
            int far = -1;
            for (int i = 0; i < distance.length; i++) {
                if (!taken[i] && distance[i] > 0 && (far < 0 || distance[i] > distance[far])) {
                    far = i;
                }
            }
            if (far < 0) {
                return;
            }
            taken[far] = true;
            System.arraycopy(data, order[from + far] * S, centres, c * S, S);
        }
    }

    private Pass assignAndCount(int[] order, int from, int[] assign, int[] distance, long[] centres, int chosen) {
        List<Pass> parts = Chunks.map(assign.length, (lo, hi) -> {
            BitCounter counts = new BitCounter(branching);
            int changed = 0;
            for (int i = lo; i < hi; i++) {
                int index = order[from + i];
                long nearest = nearest(index, centres, chosen);
                int best = (int) nearest;
                distance[i] = (int) (nearest >>> 32);
                if (best != assign[i]) {
                    changed++;
                    assign[i] = best;
                }
                counts.add(best, data, index);
            }
            return new Pass(counts, changed);
        });
        BitCounter total = parts.get(0).counts();
        int changed = parts.get(0).changed();
        for (int p = 1; p < parts.size(); p++) {
            total.addAll(parts.get(p).counts());
            changed += parts.get(p).changed();
        }
        return new Pass(total, changed);
    }

    /** Nearest centre: distance in the high 32 bits, centre index in the low 32 bits. */
    private long nearest(int index, long[] centres, int chosen) {
        int o = index * S;
        long a0 = data[o];
        long a1 = data[o + 1];
        long a2 = data[o + 2];
        long a3 = data[o + 3];
        int best = 0;
        int bestDistance = Integer.MAX_VALUE;
        for (int c = 0; c < chosen; c++) {
            int p = c * S;
            int d = Long.bitCount(a0 ^ centres[p]) + Long.bitCount(a1 ^ centres[p + 1])
                    + Long.bitCount(a2 ^ centres[p + 2]) + Long.bitCount(a3 ^ centres[p + 3]);
            if (d < bestDistance) {
                bestDistance = d;
                best = c;
            }
        }
        return ((long) bestDistance << 32) | best;
    }

    private static Partition compact(long[] centres, int chosen, int[] assign, BitCounter counts) {
        int[] newIndex = new int[chosen];
        int kept = 0;
        for (int c = 0; c < chosen; c++) {
            newIndex[c] = kept;
            if (counts.members(c) > 0) {
                kept++;
            }
        }
        long[] keptCentres = new long[kept * S];
        int[] sizes = new int[kept];
        for (int c = 0; c < chosen; c++) {
            if (counts.members(c) > 0) {
                System.arraycopy(centres, c * S, keptCentres, newIndex[c] * S, S);
                sizes[newIndex[c]] = counts.members(c);
            }
        }
        for (int i = 0; i < assign.length; i++) {
            assign[i] = newIndex[assign[i]];
        }
        return new Partition(keptCentres, kept, assign, sizes);
    }
}
