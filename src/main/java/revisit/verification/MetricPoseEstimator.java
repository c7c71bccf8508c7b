package revisit.verification;

import georegression.struct.se.Se3_F64;
import java.util.Optional;
import java.util.function.Function;
import revisit.camera.CameraModel;

/**
 * Metric relative pose between two frames from matched features with depth, with an information matrix.
 *
 * <p>Steps: back-project the matches with depth ({@link DepthPoints}); RANSAC over minimal samples of three
 * correspondences ({@link PoseRansac}); least-squares refit to the consensus; Levenberg-Marquardt on whitened
 * residuals ({@link PoseLeastSquares}); re-select inliers at the refined pose and refine again until the inlier set
 * stops changing (at most three rounds). Inliers are gated by the chi-square quantile of the residual's degrees of
 * freedom at {@link MetricPoseConfig#inlierProbability()}.
 * <ul>
 * <li>{@link #alignWithDepthInBoth}: 3D-3D ({@link AlignmentModel}, Umeyama 1991 for samples and refit).</li>
 * <li>{@link #resectWithDepthInA}: 3D-2D ({@link ResectionModel}, BoofCV P3P and EPnP).</li>
 * </ul>
 * The result follows the convention of {@link MetricPose}. Both frames are taken with the same camera.
 *
 * <p>Not thread-safe (reusable solvers inside the models are created per call, but use one instance per thread).
 */
public final class MetricPoseEstimator {

    private static final int MAX_ROUNDS = 3;

    private final CameraModel camera;
    private final MetricPoseConfig config;

    /**
     * @param camera camera of both frames
     * @param config settings
     */
    public MetricPoseEstimator(CameraModel camera, MetricPoseConfig config) {
        this.camera = camera;
        this.config = config;
    }

    /**
     * Estimates aFromB from depth in both frames (RGB-D or stereo).
     *
     * @param matches matched pixels; not modified
     * @param depthA  depth image of frame A
     * @param depthB  depth image of frame B
     * @return the pose, or the reason there is none
     */
    public MetricPoseResult alignWithDepthInBoth(MatchedPixels matches, DepthImage depthA, DepthImage depthB) {
        DepthPoints a = DepthPoints.backProject(camera, depthA, matches.xA(), matches.yA(), config);
        DepthPoints b = DepthPoints.backProject(camera, depthB, matches.xB(), matches.yB(), config);
        AlignmentModel model = new AlignmentModel(a, b, ChiSquareQuantile.quantile(3, config.inlierProbability()));
        return estimate(model, model::refit, model::residuals, model::matchIndex, matches.count(),
                MetricMethod.DEPTH_IN_BOTH);
    }

    /**
     * Estimates aFromB from depth in frame A and pixels in frame B (perspective-n-point).
     *
     * @param matches matched pixels; not modified
     * @param depthA  depth image of frame A
     * @return the pose, or the reason there is none
     */
    public MetricPoseResult resectWithDepthInA(MatchedPixels matches, DepthImage depthA) {
        DepthPoints a = DepthPoints.backProject(camera, depthA, matches.xA(), matches.yA(), config);
        DepthPoints b = DepthPoints.backProject(camera, null, matches.xB(), matches.yB(), config);
        ResectionModel model = new ResectionModel(a, b, camera.fx(), camera.fy(), config.pixelSigmaPx(),
                ChiSquareQuantile.quantile(2, config.inlierProbability()));
        return estimate(model, model::refit, model::residuals, model::matchIndex, matches.count(),
                MetricMethod.DEPTH_IN_A);
    }

    private MetricPoseResult estimate(PoseRansac.Model model, Function<boolean[], Optional<Se3_F64>> refit,
                                      Function<boolean[], PoseLeastSquares.Residuals> residuals,
                                      java.util.function.IntUnaryOperator matchIndex, int matchCount,
                                      MetricMethod method) {
        int usable = model.size();
        if (usable < config.minInliers()) {
            return MetricPoseResult.rejected(MetricRejection.TOO_FEW_POINTS_WITH_DEPTH, usable, 0);
        }
        Optional<PoseRansac.Outcome> found = PoseRansac.run(model, config.ransacConfidence(), config.maxIterations(),
                config.seed());
        if (found.isEmpty() || found.get().inliers() < config.minInliers()) {
            return MetricPoseResult.rejected(MetricRejection.NO_CONSENSUS, usable,
                    found.map(PoseRansac.Outcome::inliers).orElse(0));
        }
        boolean[] mask = found.get().mask();
        Se3_F64 pose = refit.apply(mask).orElse(found.get().aFromB());
        int inliers = rescore(model, pose, mask);
        Optional<PoseLeastSquares.Solution> solution = Optional.empty();
        for (int round = 0; round < MAX_ROUNDS && inliers >= config.minInliers(); round++) {
            solution = PoseLeastSquares.refine(residuals.apply(mask), pose, config.maxRefineIterations());
            if (solution.isEmpty()) {
                break;
            }
            pose = solution.get().aFromB();
            boolean[] before = mask.clone();
            inliers = rescore(model, pose, mask);
            if (java.util.Arrays.equals(before, mask)) {
                break;
            }
            solution = Optional.empty();
        }
        if (inliers < config.minInliers()) {
            return MetricPoseResult.rejected(MetricRejection.NO_CONSENSUS, usable, inliers);
        }
        if (solution.isEmpty()) {
            solution = PoseLeastSquares.refine(residuals.apply(mask), pose, 0);
        }
        if (solution.isEmpty()) {
            return MetricPoseResult.rejected(MetricRejection.DEGENERATE_GEOMETRY, usable, inliers);
        }
        return MetricPoseResult.accepted(pose(solution.get(), mask, matchIndex, matchCount, usable, inliers,
                residuals.apply(mask).size(), method));
    }

    private static int rescore(PoseRansac.Model model, Se3_F64 pose, boolean[] mask) {
        return model.score(pose, mask);
    }

    private static MetricPose pose(PoseLeastSquares.Solution solution, boolean[] mask,
                                   java.util.function.IntUnaryOperator matchIndex, int matchCount, int usable,
                                   int inliers, int residualCount, MetricMethod method) {
        boolean[] inputMask = new boolean[matchCount];
        for (int k = 0; k < mask.length; k++) {
            if (mask[k]) {
                inputMask[matchIndex.applyAsInt(k)] = true;
            }
        }
        double varianceFactor = residualCount > 6 ? solution.cost() / (residualCount - 6) : Double.NaN;
        return new MetricPose(solution.aFromB(), solution.information().data, method, inliers, usable, inputMask,
                varianceFactor);
    }
}
