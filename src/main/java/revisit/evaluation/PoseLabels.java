package revisit.evaluation;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import revisit.io.BadInputException;
import revisit.io.StampedPose;

/**
 * Derives revisit labels from ground-truth poses: frame q revisits an earlier frame m when their camera centres
 * lie within {@link PoseLabelConfig#maxDistance()} and their viewing directions within
 * {@link PoseLabelConfig#maxViewAngleDegrees()}, and m is outside the exclusion window of q.
 *
 * <p>One pose per frame, in frame order; all sequences must share one world frame. Neighbours are found through a
 * uniform grid of cells one tolerance wide (each frame looks at the 27 cells around its own), so the cost grows
 * with the number of frames times the number of nearby frames instead of with all pairs.
 */
public final class PoseLabels {

    /** Cells per axis must fit in 21 bits each to pack a cell key into one long. */
    private static final long CELL_LIMIT = 1L << 20;

    private PoseLabels() {
    }

    /** Labels for one sequence with the given id. */
    public static RevisitLabels derive(String sequenceId, List<StampedPose> poses, PoseLabelConfig config) {
        Map<String, List<StampedPose>> one = new LinkedHashMap<>();
        one.put(sequenceId, poses);
        return derive(one, config);
    }

    /**
     * Labels for several sequences scanned in the map's iteration order (pass a LinkedHashMap); frame times are
     * the pose times.
     *
     * @param posesBySequence poses of each sequence, one per frame, times strictly increasing
     * @throws BadInputException when the labels would exceed the pair cap or the trajectory is too large for the
     *                           tolerance
     */
    public static RevisitLabels derive(Map<String, List<StampedPose>> posesBySequence, PoseLabelConfig config) {
        List<SequenceFrames> sequences = new ArrayList<>();
        List<StampedPose> all = new ArrayList<>();
        posesBySequence.forEach((id, poses) -> {
            double[] t = new double[poses.size()];
            for (int i = 0; i < t.length; i++) {
                t[i] = poses.get(i).timeSeconds();
            }
            sequences.add(new SequenceFrames(id, t));
            all.addAll(poses);
        });
        FrameTimeline timeline = new FrameTimeline(sequences);
        LabelBuilder builder = new LabelBuilder(timeline, config.window(), config.maxPairs());
        try {
            collect(all, config, builder);
        } catch (LabelBuilder.LabelLimitException e) {
            throw new BadInputException("ground-truth poses give more than " + config.maxPairs()
                    + " labelled pairs; lower maxDistance or widen the exclusion window (a resting camera gives"
                    + " many pairs)", e);
        }
        return builder.build();
    }

    /** Adds every near pair (m before q); the builder drops and counts those inside the exclusion window. */
    private static void collect(List<StampedPose> poses, PoseLabelConfig config, LabelBuilder builder) {
        int n = poses.size();
        long[] keys = new long[n];
        long[] sortedKeys = new long[n];
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            keys[i] = cellKey(poses.get(i), config.maxDistance(), 0, 0, 0);
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Long.compare(keys[a], keys[b]));
        for (int i = 0; i < n; i++) {
            sortedKeys[i] = keys[order[i]];
        }
        double[][] axes = viewingDirections(poses);
        double cosLimit = Math.cos(Math.toRadians(config.maxViewAngleDegrees()));
        for (int q = 0; q < n; q++) {
            StampedPose pq = poses.get(q);
            for (int d = 0; d < 27; d++) {
                long key = cellKey(pq, config.maxDistance(), d % 3 - 1, d / 3 % 3 - 1, d / 9 - 1);
                int at = lowerBound(sortedKeys, key);
                for (int k = at; k < n && sortedKeys[k] == key; k++) {
                    int m = order[k];
                    if (m < q && pq.distanceTo(poses.get(m)) <= config.maxDistance()
                            && (config.maxViewAngleDegrees() >= 180 || dot(axes[q], axes[m]) >= cosLimit)) {
                        builder.add(q, m);
                    }
                }
            }
        }
    }

    private static long cellKey(StampedPose p, double cell, int dx, int dy, int dz) {
        long cx = (long) Math.floor(p.x() / cell) + dx;
        long cy = (long) Math.floor(p.y() / cell) + dy;
        long cz = (long) Math.floor(p.z() / cell) + dz;
        if (Math.abs(cx) >= CELL_LIMIT || Math.abs(cy) >= CELL_LIMIT || Math.abs(cz) >= CELL_LIMIT) {
            throw new BadInputException("ground-truth position (" + p.x() + ", " + p.y() + ", " + p.z()
                    + ") lies more than 2^20 tolerances from the origin; raise maxDistance or check the units");
        }
        return ((cx + CELL_LIMIT) << 42) | ((cy + CELL_LIMIT) << 21) | (cz + CELL_LIMIT);
    }

    private static int lowerBound(long[] sorted, long key) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < key) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Camera z axis in world coordinates: the third column of R(q) (camera-to-world rotation). */
    static double[][] viewingDirections(List<StampedPose> poses) {
        double[][] out = new double[poses.size()][];
        for (int i = 0; i < out.length; i++) {
            StampedPose p = poses.get(i);
            out[i] = new double[]{2 * (p.qx() * p.qz() + p.qw() * p.qy()), 2 * (p.qy() * p.qz() - p.qw() * p.qx()),
                    1 - 2 * (p.qx() * p.qx() + p.qy() * p.qy())};
        }
        return out;
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }
}
