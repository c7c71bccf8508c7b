package revisit.pipeline;

import java.util.Arrays;

/**
 * One loop closure as exported: "frame {@code query} revisits frame {@code match}", with the relative pose that
 * maps points from the query camera's coordinates into the matched camera's coordinates
 * ({@code X_match = R X_query + t}, i.e. the pose of the query camera seen from the matched camera).
 *
 * @param querySequence   sequence id of the later frame (0-based, in the order sequences were given)
 * @param queryFrame      frame index within its sequence
 * @param queryTime       timestamp, seconds
 * @param queryName       file name or video position of the frame
 * @param matchSequence   sequence id of the earlier frame
 * @param matchFrame      frame index within its sequence
 * @param matchTime       timestamp, seconds
 * @param matchName       file name or video position
 * @param score           raw similarity score of the retrieval, 0..1
 * @param normalisedScore score divided by the query's similarity to its predecessor
 * @param inliers         RANSAC inliers of the accepted model
 * @param inlierRatio     inliers / tentative matches
 * @param model           geometric model that won (essential, fundamental, homography, metric-3d)
 * @param quaternion      rotation (qx, qy, qz, qw), query camera to matched camera
 * @param translation     translation (x, y, z): metres when {@code metric}, otherwise a unit direction
 *                        (all zero when unobservable, e.g. pure rotation)
 * @param metric          true when the translation has a metric scale (depth or stereo was given)
 * @param information     6x6 information matrix, row-major, order (tx, ty, tz, rx, ry, rz)
 * @param status          state of the closure after checks (see {@link ClosureStatus})
 * @param reason          why a candidate was rejected or flagged; empty for a plain accepted closure
 * @param confidence      0..1, how much to trust the closure (documented in docs/FORMAT-closures.md)
 */
public record Closure(int querySequence, int queryFrame, double queryTime, String queryName,
                      int matchSequence, int matchFrame, double matchTime, String matchName,
                      double score, double normalisedScore, int inliers, double inlierRatio, String model,
                      double[] quaternion, double[] translation, boolean metric, double[] information,
                      ClosureStatus status, String reason, double confidence) {

    public Closure {
        if (quaternion.length != 4 || translation.length != 3 || information.length != 36) {
            throw new IllegalArgumentException("closure pose arrays must have 4, 3 and 36 entries");
        }
    }

    /** Copy with a new status, reason and confidence (used by the consistency check). */
    public Closure withStatus(ClosureStatus newStatus, String newReason, double newConfidence) {
        return new Closure(querySequence, queryFrame, queryTime, queryName, matchSequence, matchFrame, matchTime,
                matchName, score, normalisedScore, inliers, inlierRatio, model, quaternion, translation, metric,
                information, newStatus, newReason, newConfidence);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Closure c && querySequence == c.querySequence && queryFrame == c.queryFrame
                && matchSequence == c.matchSequence && matchFrame == c.matchFrame && inliers == c.inliers
                && Double.compare(score, c.score) == 0 && model.equals(c.model) && status == c.status
                && Arrays.equals(quaternion, c.quaternion) && Arrays.equals(translation, c.translation)
                && Arrays.equals(information, c.information) && reason.equals(c.reason);
    }

    @Override
    public int hashCode() {
        return ((querySequence * 31 + queryFrame) * 31 + matchSequence) * 31 + matchFrame;
    }

    @Override
    public String toString() {
        return "Closure[" + querySequence + ":" + queryFrame + " -> " + matchSequence + ":" + matchFrame + ", "
                + model + ", " + inliers + " inliers, " + status + "]";
    }
}
