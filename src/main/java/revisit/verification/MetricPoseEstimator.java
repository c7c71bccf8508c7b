package revisit.verification;

import georegression.struct.se.Se3_F64;
import java.util.Arrays;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.IntUnaryOperator;
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
 * <p>Thread-safe: the camera and configuration are immutable and every call builds its own models and solvers.
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
        DepthPoints b = DepthPoints.withoutDepth(camera, matches.xB(), matches.yB());
        ResectionModel model = new ResectionModel(a, b, camera.fx(), camera.fy(), config.pixelSigmaPx(),
                ChiSquareQuantile.quantile(2, config.inlierProbability()));
        return estimate(model, model::refit, model::residuals, model::matchIndex, matches.count(),
                MetricMethod.DEPTH_IN_A);
    }

    private MetricPoseResult estimate(PoseRansac.Model model, Function<boolean[], Optional<Se3_F64>> refit,
                                      Function<boolean[], PoseLeastSquares.Residuals> residuals,
                                      IntUnaryOperator matchIndex, int matchCount, MetricMethod method) {
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
        Se3_F64 start = refit.apply(mask).orElse(found.get().aFromB());
        int inliers = model.score(start, mask);
        if (inliers < config.minInliers()) {
            return MetricPoseResult.rejected(MetricRejection.NO_CONSENSUS, usable, inliers);
        }
        Optional<PoseLeastSquares.Solution> solution = refineRounds(model, residuals, start, mask);
        inliers = count(mask);
        if (inliers < config.minInliers()) {
            return MetricPoseResult.rejected(MetricRejection.NO_CONSENSUS, usable, inliers);
        }
        if (solution.isEmpty()) {
            return MetricPoseResult.rejected(MetricRejection.DEGENERATE_GEOMETRY, usable, inliers);
        }
        boolean[] inputMask = new boolean[matchCount];
        for (int k = 0; k < mask.length; k++) {
            if (mask[k]) {
                inputMask[matchIndex.applyAsInt(k)] = true;
            }
        }
        int residualCount = residuals.apply(mask).size();
        double varianceFactor = solution.get().cost() / (residualCount - 6);
        return MetricPoseResult.accepted(new MetricPose(solution.get().aFromB(), solution.get().information().data,
                method, inliers, usable, inputMask, varianceFactor));
    }

    /**
     * Refines on the inliers, re-selects inliers at the refined pose, and repeats until the set is stable (at most
     * {@link #MAX_ROUNDS} rounds). The mask is updated in place; the solution's information refers to the final mask.
     */
    private Optional<PoseLeastSquares.Solution> refineRounds(PoseRansac.Model model,
                                                             Function<boolean[], PoseLeastSquares.Residuals> residuals,
                                                             Se3_F64 start, boolean[] mask) {
        Se3_F64 pose = start;
        for (int round = 0; round < MAX_ROUNDS && count(mask) >= config.minInliers(); round++) {
            Optional<PoseLeastSquares.Solution> solution = PoseLeastSquares.refine(residuals.apply(mask), pose,
                    config.maxRefineIterations());
            if (solution.isEmpty()) {
                return solution;
            }
            pose = solution.get().aFromB();
            boolean[] before = mask.clone();
            model.score(pose, mask);
            if (Arrays.equals(before, mask)) {
                return solution;
            }
        }
        if (count(mask) < config.minInliers()) {
            return Optional.empty();
        }
        return PoseLeastSquares.refine(residuals.apply(mask), pose, 0);
    }

    private static int count(boolean[] mask) {
        int n = 0;
        for (boolean b : mask) {
            n += b ? 1 : 0;
        }
        return n;
    }
}
