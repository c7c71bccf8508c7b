package revisit.verification;

import java.util.Optional;

/**
 * Outcome of a metric pose estimate: the pose, or the reason there is none.
 *
 * @param pose        the pose when one was accepted
 * @param rejection   {@link MetricRejection#NONE} exactly when a pose is present
 * @param usableCount matches with valid depth
 * @param bestInliers largest inlier count seen (also on rejection)
 */
public record MetricPoseResult(Optional<MetricPose> pose, MetricRejection rejection, int usableCount, int bestInliers) {

    public MetricPoseResult {
        if (pose.isPresent() != (rejection == MetricRejection.NONE)) {
            throw new IllegalArgumentException("a pose goes with rejection NONE and only then, was " + rejection);
        }
    }

    static MetricPoseResult accepted(MetricPose pose) {
        return new MetricPoseResult(Optional.of(pose), MetricRejection.NONE, pose.usableCount(), pose.inlierCount());
    }

    static MetricPoseResult rejected(MetricRejection reason, int usableCount, int bestInliers) {
        return new MetricPoseResult(Optional.empty(), reason, usableCount, bestInliers);
    }
}
