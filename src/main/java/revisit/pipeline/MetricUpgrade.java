package revisit.pipeline;

import georegression.struct.se.Se3_F64;
import java.util.Locale;
import java.util.Optional;
import revisit.camera.CameraModel;
import revisit.features.FrameFeatures;
import revisit.io.BadInputException;
import revisit.verification.Correspondences;
import revisit.verification.DepthImage;
import revisit.verification.MatchedPixels;
import revisit.verification.MetricPose;
import revisit.verification.MetricPoseConfig;
import revisit.verification.MetricPoseEstimator;
import revisit.verification.MetricPoseResult;
import revisit.verification.RelativePose;
import revisit.verification.Verification;

/**
 * Gives an accepted two-view verification metric scale from depth images: the inlier matches are back-projected
 * with the depth of both frames and aligned in 3D ({@link MetricPoseEstimator#alignWithDepthInBoth}, Umeyama 1991
 * and refinement), or, with depth for the matched frame only, resected ({@link MetricPoseEstimator#resectWithDepthInA},
 * perspective-n-point). When the depth estimate succeeds it replaces the two-view pose: it measures the translation
 * length and does not suffer the two-view ambiguities of planes and short baselines (on the invented yard the
 * homography-decomposed two-view rotations of near revisits were off by 5-10 degrees where the depth poses were
 * within a fraction of a degree, docs/SCAN.md). A large difference between the two is noted in the closure's reason.
 *
 * <p>Thread-safe when the depth source is.
 */
final class MetricUpgrade {

    /** Rotation difference between the two-view and the depth pose above which the closure notes it, degrees
     * (a few times the two-view rotation error on real rings, docs/VERIFICATION.md). */
    static final double NOTED_ROTATION_DISAGREEMENT_DEG = 5.0;

    private final DepthFrames depth;
    private final MetricPoseEstimator estimator;

    MetricUpgrade(DepthFrames depth, CameraModel camera, MetricPoseConfig config) {
        this.depth = depth;
        this.estimator = new MetricPoseEstimator(camera, config);
    }

    /** The verification with a metric pose when depth allows one, else unchanged with a note saying why. */
    CheckedPair upgrade(FrameRecord query, FrameRecord match, Correspondences matches, Verification v) {
        if (!v.accepted() || v.pose().isEmpty()) {
            return CheckedPair.of(v);
        }
        Optional<DepthImage> depthMatch;
        Optional<DepthImage> depthQuery;
        try {
            depthMatch = depth.depthOf(match.sequence(), match.frame());
            depthQuery = depth.depthOf(query.sequence(), query.frame());
        } catch (BadInputException e) {
            return new CheckedPair(v, "no metric pose: " + e.getMessage());
        }
        if (depthMatch.isEmpty()) {
            return new CheckedPair(v, "no metric pose: no depth image for " + match.name());
        }
        MatchedPixels pixels = inlierPixels(match.features(), query.features(), matches, v.inlierMatches());
        MetricPoseResult result = depthQuery.isPresent()
                ? estimator.alignWithDepthInBoth(pixels, depthMatch.get(), depthQuery.get())
                : estimator.resectWithDepthInA(pixels, depthMatch.get());
        if (result.pose().isEmpty()) {
            return new CheckedPair(v, "no metric pose: " + result.rejection().name().toLowerCase(Locale.ROOT));
        }
        RelativePose metric = toRelativePose(result.pose().get());
        double disagreement = rotationDifferenceDeg(v.pose().get().rotation(), metric.rotation());
        String note = disagreement > NOTED_ROTATION_DISAGREEMENT_DEG ? String.format(Locale.ROOT,
                "metric pose from depth; the two-view rotation differed by %.1f deg", disagreement) : "";
        return new CheckedPair(new Verification(v.outcome(), v.model(), v.matchCount(), v.inlierMatches(),
                v.model3x3(), Optional.of(metric), v.errors(), v.selection(), v.iterations()), note);
    }

    /** Frame A of the estimator is the matched frame, B the query, so aFromB maps query into match coordinates. */
    private static MatchedPixels inlierPixels(FrameFeatures match, FrameFeatures query, Correspondences matches,
                                              int[] inliers) {
        int n = inliers.length;
        float[] xA = new float[n];
        float[] yA = new float[n];
        float[] xB = new float[n];
        float[] yB = new float[n];
        for (int k = 0; k < n; k++) {
            int i = inliers[k];
            int featureQuery = matches.indexA()[i];
            int featureMatch = matches.indexB()[i];
            xA[k] = match.x()[featureMatch];
            yA[k] = match.y()[featureMatch];
            xB[k] = query.x()[featureQuery];
            yB[k] = query.y()[featureQuery];
        }
        return new MatchedPixels(xA, yA, xB, yB);
    }

    /**
     * The metric pose in {@link RelativePose}'s convention. {@link MetricPose} perturbs on the right,
     * {@code R exp(omega), t + R v} with order (omega, v); {@link RelativePose} on the left, {@code exp(dtheta) R,
     * t + dt}, order (dt, dtheta). To first order {@code (dt, dtheta) = J (v, omega)} with {@code J = diag(R, R)},
     * so the information becomes {@code J I J^T} (J is orthogonal): the inverse of the export conversion
     * {@link ClosureFactory#toLocalPerturbation}, which is that conversion with {@code R^T}.
     */
    static RelativePose toRelativePose(MetricPose pose) {
        Se3_F64 se3 = pose.aFromB();
        double[] r = se3.R.data.clone();
        double[] t = {se3.T.x, se3.T.y, se3.T.z};
        double norm = Math.sqrt(t[0] * t[0] + t[1] * t[1] + t[2] * t[2]);
        Optional<double[]> direction = norm > 0
                ? Optional.of(new double[]{t[0] / norm, t[1] / norm, t[2] / norm}) : Optional.empty();
        double[] info = pose.information();
        double[] reordered = new double[36];
        for (int a = 0; a < 6; a++) {
            for (int b = 0; b < 6; b++) {
                reordered[a * 6 + b] = info[((a + 3) % 6) * 6 + (b + 3) % 6];
            }
        }
        double[] rT = {r[0], r[3], r[6], r[1], r[4], r[7], r[2], r[5], r[8]};
        double[] rotated = ClosureFactory.toLocalPerturbation(reordered, rT);
        return new RelativePose(r, direction, Optional.of(t), rotated, false);
    }

    /** Angle of R1^T R2, degrees. */
    static double rotationDifferenceDeg(double[] r1, double[] r2) {
        double trace = 0;
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                trace += r1[k * 3 + i] * r2[k * 3 + i];
            }
        }
        return Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, (trace - 1) / 2))));
    }
}
