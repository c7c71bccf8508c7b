package revisit.vocabulary;

import java.util.SplittableRandom;
import revisit.features.FrameFeatures;

/**
 * Greedy k-means++ seeding on binary descriptors with squared Hamming distances. k-means++ (Arthur and
 * Vassilvitskii, "k-means++: The Advantages of Careful Seeding", SODA 2007) draws each new centre with probability
 * proportional to its squared distance to the nearest centre chosen so far; the greedy variant that the same
 * paper suggests draws {@code 2 + ln k} candidates per step and keeps the one that lowers the total squared
 * distance most. Measured on 100 seeds of the synthetic 8-cluster case of VocabularyTrainerTest (one level,
 * k = 8): plain k-means++ without empty-cluster re-seeding failed to recover the 8 centres 35 times, greedy
 * seeding 1 time, greedy seeding with the re-seeding of {@link NodeClustering} 0 times (docs/VOCABULARY.md).
 *
 * <p>Stops early when every remaining descriptor coincides with a centre, so fewer than {@code k} centres come
 * back when there are fewer than {@code k} distinct descriptors.
 */
final class KMeansSeeding {

    private static final int S = FrameFeatures.STRIDE;

    private final long[] data;
    private final int branching;
    private final int trials;

    /**
     * @param data      packed descriptors, not modified
     * @param branching centres wanted (k)
     */
    KMeansSeeding(long[] data, int branching) {
        this.data = data;
        this.branching = branching;
        this.trials = 2 + (int) Math.log(branching);
    }

    /**
     * Chooses up to {@code k} centres among {@code order[from..to)}.
     *
     * @param centres receives the centres, {@code k * STRIDE} longs; modified
     * @return number of centres chosen, 1..k
     */
    int seed(int[] order, int from, int to, long[] centres, SplittableRandom rnd) {
        int n = to - from;
        int[] d2 = new int[n];
        System.arraycopy(data, order[from + rnd.nextInt(n)] * S, centres, 0, S);
        potential(order, from, d2, centres, 0, true);
        long[] cumulative = new long[n];
        int chosen = 1;
        while (chosen < branching) {
            long total = 0;
            for (int i = 0; i < n; i++) {
                total += d2[i];
                cumulative[i] = total;
            }
            if (total == 0) {
                break;
            }
            int best = -1;
            long bestPotential = Long.MAX_VALUE;
            for (int t = 0; t < trials; t++) {
                int candidate = draw(cumulative, rnd.nextLong(total));
                System.arraycopy(data, order[from + candidate] * S, centres, chosen * S, S);
                long p = potential(order, from, d2, centres, chosen, false);
                if (p < bestPotential) {
                    bestPotential = p;
                    best = candidate;
                }
            }
            System.arraycopy(data, order[from + best] * S, centres, chosen * S, S);
            update(order, from, d2, centres, chosen);
            chosen++;
        }
        return chosen;
    }

    /** First index whose cumulative weight exceeds {@code r} (binary search). */
    private static int draw(long[] cumulative, long r) {
        int lo = 0;
        int hi = cumulative.length - 1;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (cumulative[mid] > r) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        return lo;
    }

    /**
     * Total squared distance to the nearest centre if centre {@code c} were added; with {@code first} set, fills
     * {@code d2} with the squared distances to centre {@code c} instead.
     */
    private long potential(int[] order, int from, int[] d2, long[] centres, int c, boolean first) {
        long sum = 0;
        for (long part : Chunks.map(d2.length, (lo, hi) -> {
            long s = 0;
            for (int i = lo; i < hi; i++) {
                int sq = squaredDistance(order[from + i], centres, c);
                if (first) {
                    d2[i] = sq;
                }
                s += Math.min(sq, d2[i]);
            }
            return s;
        })) {
            sum += part;
        }
        return sum;
    }

    private void update(int[] order, int from, int[] d2, long[] centres, int c) {
        Chunks.map(d2.length, (lo, hi) -> {
            for (int i = lo; i < hi; i++) {
                d2[i] = Math.min(d2[i], squaredDistance(order[from + i], centres, c));
            }
            return Boolean.TRUE;
        });
    }

    private int squaredDistance(int index, long[] centres, int c) {
        int o = index * S;
        int p = c * S;
        int d = Long.bitCount(data[o] ^ centres[p]) + Long.bitCount(data[o + 1] ^ centres[p + 1])
                + Long.bitCount(data[o + 2] ^ centres[p + 2]) + Long.bitCount(data[o + 3] ^ centres[p + 3]);
        return d * d;
    }
}
