package revisit.verification;

import java.util.Optional;

/**
 * The pure-rotation model of a calibrated pair: seeded with the inliers of the homography fit, the rotation that
 * aligns their rays (Kabsch) is refined by Levenberg-Marquardt on the transfer error, the matches are classified
 * again under {@code K R K^-1} with the homography cut, and refined once more on that set.
 */
final class RotationFit {

    private final double[] rotation;
    private final int[] inliers;
    private final double[] homography;
    private final LevenbergMarquardt.Solution solution;
    private final double gric;
    private final double[] inlierErrorsPx;

    private RotationFit(double[] rotation, int[] inliers, double[] homography, LevenbergMarquardt.Solution solution,
                        double gric, double[] inlierErrorsPx) {
        this.rotation = rotation;
        this.inliers = inliers;
        this.homography = homography;
        this.solution = solution;
        this.gric = gric;
        this.inlierErrorsPx = inlierErrorsPx;
    }

    /** Fits the rotation; empty when the homography has fewer than three inliers or the SVD fails. */
    static Optional<RotationFit> of(PointPairs p, AdaptiveRansac.Fit homographyFit, VerificationConfig config) {
        int[] seed = PoseRecovery.indices(homographyFit.inliers());
        if (seed.length < 3) {
            return Optional.empty();
        }
        Optional<double[]> start = new RotationProblem(p, seed).alignRays();
        if (start.isEmpty()) {
            return Optional.empty();
        }
        double[] r = LevenbergMarquardt.minimize(new RotationProblem(p, seed), start.get(),
                config.refineIterations()).state();
        double thresholdSq = config.homographyThresholdPx() * config.homographyThresholdPx();
        double[] squared = squaredErrors(p, new RotationProblem(p, seed).homography(r));
        int[] inliers = within(squared, thresholdSq);
        if (inliers.length < 3) {
            return Optional.empty();
        }
        RotationProblem problem = new RotationProblem(p, inliers);
        LevenbergMarquardt.Solution sol = LevenbergMarquardt.minimize(problem, r, config.refineIterations());
        double[] h = problem.homography(sol.state());
        squared = squaredErrors(p, h);
        double gric = ModelSelection.gric(ModelSelection.Candidate.ROTATION, squared, p.count, config.noiseSigmaPx());
        double[] errors = new double[inliers.length];
        for (int k = 0; k < inliers.length; k++) {
            errors[k] = Math.sqrt(squared[inliers[k]]);
        }
        return Optional.of(new RotationFit(sol.state(), inliers, h, sol, gric, errors));
    }

    double gric() {
        return gric;
    }

    /** The verdict when the rotation model was chosen: rotation only, translation not observable. */
    Verification verification(int matchCount, ModelScores scores, int iterations, VerificationConfig config) {
        ResidualStats stats = ResidualStats.of(inlierErrorsPx, inlierErrorsPx.length);
        if (inliers.length < config.minInliers()) {
            return new Verification(Outcome.TOO_FEW_INLIERS, ModelKind.ROTATION, matchCount, inliers, homography,
                    Optional.empty(), stats, scores, iterations);
        }
        double[] info = InformationMatrix.ofRotation(solution.jacobian(), solution.residuals());
        RelativePose pose = new RelativePose(rotation, Optional.empty(), Optional.empty(), info, false);
        return new Verification(Outcome.ACCEPTED, ModelKind.ROTATION, matchCount, inliers, rotation.clone(),
                Optional.of(pose), stats, scores, iterations);
    }

    private static double[] squaredErrors(PointPairs p, double[] h) {
        double[] e = new double[p.count];
        for (int i = 0; i < p.count; i++) {
            e[i] = p.homographySq(h, i);
        }
        return e;
    }

    private static int[] within(double[] squared, double thresholdSq) {
        boolean[] mask = new boolean[squared.length];
        for (int i = 0; i < squared.length; i++) {
            mask[i] = squared[i] <= thresholdSq;
        }
        return PoseRecovery.indices(mask);
    }
}
