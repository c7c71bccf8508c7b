package revisit.verification;

import java.util.Optional;
import revisit.camera.CameraModel;
import revisit.features.FrameFeatures;

/**
 * Geometric verification of one frame pair: robust fits of an epipolar model (essential with a camera,
 * fundamental without) and a homography, model selection by GRIC between them and, with a camera, a pure
 * rotation; then the relative pose with its information matrix. A pure rotation never yields a translation: its
 * pose has rotation only. Holds solver state: use one instance per thread.
 */
public final class PairVerifier {

    /** Smallest share of the epipolar inliers a winning homography must explain (see fitHomography). */
    private static final double MIN_HOMOGRAPHY_SHARE = 0.8;

    private final VerificationConfig config;
    private final DescriptorMatcher matcher;
    private final ModelFitters fitters = new ModelFitters();
    private final PoseRecovery poses;

    public PairVerifier(VerificationConfig config) {
        this.config = config;
        this.matcher = new DescriptorMatcher(config);
        this.poses = new PoseRecovery(config);
    }

    /** Matches all features (brute force) and verifies. */
    public Verification verify(FrameFeatures a, FrameFeatures b, Optional<CameraModel> camera) {
        return verify(a, b, matcher.matchAll(a, b), camera);
    }

    /** Matches features that share a vocabulary node and verifies. */
    public Verification verify(FrameFeatures a, int[] nodesA, FrameFeatures b, int[] nodesB,
                               Optional<CameraModel> camera) {
        return verify(a, b, matcher.matchWithinNodes(a, nodesA, b, nodesB), camera);
    }

    /**
     * Verifies given putative matches.
     *
     * @param camera the camera of both frames; without it only the uncalibrated models are fitted and no pose
     *               is returned
     */
    public Verification verify(FrameFeatures a, FrameFeatures b, Correspondences matches,
                               Optional<CameraModel> camera) {
        int n = matches.count();
        if (n < config.minInliers()) {
            return Verification.rejected(Outcome.TOO_FEW_MATCHES, n, ModelScores.none(), 0);
        }
        PointPairs p = PointPairs.of(a, b, matches, camera);
        int bar = config.minSupport(n);
        Optional<AdaptiveRansac.Fit> epipolar = fitEpipolar(p, bar);
        if (epipolar.isPresent() && epipolar.get().inlierCount() < bar) {
            return Verification.rejected(Outcome.NO_CONSENSUS, n, ModelScores.none(), epipolar.get().iterations());
        }
        Candidates c = fitCandidates(p, epipolar, bar);
        ModelScores scores = c.scores();
        int iterations = c.iterations();
        Verification result = switch (choose(scores, p.calibrated())) {
            case NONE -> Verification.rejected(Outcome.DEGENERATE, n, scores, iterations);
            case ESSENTIAL -> fromPose(ModelKind.ESSENTIAL, n, c.epipolar().get(),
                    poses.fromEssential(p, c.epipolar().get()), scores, iterations,
                    p.essentialFromFundamental(c.epipolar().get().model()));
            case FUNDAMENTAL -> uncalibrated(ModelKind.FUNDAMENTAL, n, c.epipolar().get(), p::epipolarSq, scores,
                    iterations);
            case HOMOGRAPHY -> p.calibrated()
                    ? fromPose(ModelKind.HOMOGRAPHY, n, c.homography().get(), poses.fromPlane(p, c.homography().get()),
                    scores, iterations, c.homography().get().model())
                    : uncalibrated(ModelKind.HOMOGRAPHY, n, c.homography().get(), p::homographySq, scores, iterations);
            case ROTATION -> c.rotation().get().verification(n, scores, iterations, config);
        };
        if (result.accepted() && result.inlierRatio() < config.minInlierRatio()) {
            return withoutPose(Outcome.TOO_FEW_INLIERS, result);
        }
        return result.accepted() && !InlierSpread.sufficient(p, result.inlierMatches(), config)
                ? withoutPose(Outcome.DEGENERATE, result) : result;
    }

    private static Verification withoutPose(Outcome outcome, Verification v) {
        return new Verification(outcome, v.model(), v.matchCount(), v.inlierMatches(), v.model3x3(),
                Optional.empty(), v.errors(), v.selection(), v.iterations());
    }

    /** The fitted candidate models, their scores and the RANSAC samples drawn. */
    private record Candidates(Optional<AdaptiveRansac.Fit> epipolar, Optional<AdaptiveRansac.Fit> homography,
                              Optional<RotationFit> rotation, ModelScores scores, int iterations) {
    }

    /**
     * Essential (calibrated) or fundamental RANSAC over all matches, drawing no more samples than find a model
     * with {@code bar} inliers with the configured confidence (see {@link AdaptiveRansac}).
     */
    private Optional<AdaptiveRansac.Fit> fitEpipolar(PointPairs p, int bar) {
        double tF = config.inlierThresholdPx() * config.inlierThresholdPx();
        return p.calibrated()
                ? AdaptiveRansac.run(p.count, fitters.essential(p), p::epipolarSq, fitters.essentialRefit(p), tF,
                bar, config)
                : AdaptiveRansac.run(p.count, fitters.fundamental(p, config.fundamentalSolver()), p::epipolarSq,
                fitters.fundamentalRefit(p), tF, bar, config);
    }

    private Candidates fitCandidates(PointPairs p, Optional<AdaptiveRansac.Fit> epipolar, int bar) {
        int n = p.count;
        double tH = config.homographyThresholdPx() * config.homographyThresholdPx();
        Optional<AdaptiveRansac.Fit> homography = fitHomography(p, epipolar, p::homographySq, tH, bar);
        double sigma = config.noiseSigmaPx();
        ModelSelection.Candidate epipolarKind = p.calibrated() ? ModelSelection.Candidate.ESSENTIAL
                : ModelSelection.Candidate.FUNDAMENTAL;
        double epipolarGric = epipolar.map(f -> gric(epipolarKind, f.model(), p::epipolarSq, n, sigma))
                .orElse(Double.NaN);
        double homographyGric = homography.map(h -> gric(ModelSelection.Candidate.HOMOGRAPHY, h.model(),
                p::homographySq, n, sigma)).orElse(Double.NaN);
        Optional<RotationFit> rotation = p.calibrated() && rotationCanWin(epipolarGric, homographyGric, n)
                ? homography.flatMap(h -> RotationFit.of(p, h, config)) : Optional.empty();
        int iterations = epipolar.map(AdaptiveRansac.Fit::iterations).orElse(0)
                + homography.map(AdaptiveRansac.Fit::iterations).orElse(0);
        ModelScores scores = new ModelScores(epipolarGric, homographyGric,
                rotation.map(RotationFit::gric).orElse(Double.NaN));
        return new Candidates(epipolar, homography, rotation, scores, iterations);
    }

    /**
     * Homography RANSAC. Per match, GRIC charges an epipolar inlier about 1 + 3 ln 4 = 5.2, a homography inlier
     * about 2 + 2 ln 4 = 4.8 and a homography outlier 4 + 2 ln 4 = 6.8 (expected chi-square terms plus the
     * dimension penalty), so a homography can only win when it explains more than (6.8 - 5.2) / (6.8 - 4.8), about
     * 80%, of the epipolar inliers. It is therefore sampled from those inliers, with the sample count that finds
     * such a homography with the configured confidence; without an epipolar fit it searches all matches.
     */
    private Optional<AdaptiveRansac.Fit> fitHomography(PointPairs p, Optional<AdaptiveRansac.Fit> epipolar,
                                                       AdaptiveRansac.Residual error, double thresholdSq,
                                                       int bar) {
        if (epipolar.isEmpty()) {
            return AdaptiveRansac.run(p.count, fitters.homography(p), error, fitters.homographyRefit(p),
                    thresholdSq, bar, config);
        }
        int[] pool = PoseRecovery.indices(epipolar.get().inliers());
        long needed = AdaptiveRansac.requiredSamples(MIN_HOMOGRAPHY_SHARE, 4, config.confidence());
        int cap = (int) Math.min(config.maxIterations(), needed);
        return AdaptiveRansac.run(p.count, pool, cap, fitters.homography(p), error, fitters.homographyRefit(p),
                thresholdSq, config);
    }

    /**
     * A rotation is a homography {@code K R K^-1}, so its residuals are no smaller than the best homography's and
     * its GRIC is at least the homography's less the parameter saving {@code (8 - 3) ln(4 n)}; when even that
     * loses to the epipolar model, the rotation fit is skipped.
     */
    static boolean rotationCanWin(double epipolarGric, double homographyGric, int n) {
        if (Double.isNaN(homographyGric)) {
            return false;
        }
        return Double.isNaN(epipolarGric) || homographyGric - 5 * Math.log(4.0 * n) < epipolarGric;
    }

    /** The candidate with the lowest GRIC; NONE when nothing was fitted. */
    static ModelKind choose(ModelScores s, boolean calibrated) {
        ModelKind best = ModelKind.NONE;
        double bestScore = Double.POSITIVE_INFINITY;
        if (s.epipolar() < bestScore) {
            best = calibrated ? ModelKind.ESSENTIAL : ModelKind.FUNDAMENTAL;
            bestScore = s.epipolar();
        }
        if (s.homography() < bestScore) {
            best = ModelKind.HOMOGRAPHY;
            bestScore = s.homography();
        }
        if (s.rotation() < bestScore) {
            best = ModelKind.ROTATION;
        }
        return best;
    }

    private static double gric(ModelSelection.Candidate c, double[] model, AdaptiveRansac.Residual error, int n,
                               double sigma) {
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = error.squared(model, i);
        }
        return ModelSelection.gric(c, e, n, sigma);
    }

    private Verification uncalibrated(ModelKind kind, int n, AdaptiveRansac.Fit fit, AdaptiveRansac.Residual error,
                                      ModelScores scores, int iterations) {
        int[] inliers = PoseRecovery.indices(fit.inliers());
        double[] e = new double[inliers.length];
        for (int k = 0; k < inliers.length; k++) {
            e[k] = Math.sqrt(error.squared(fit.model(), inliers[k]));
        }
        Outcome outcome = inliers.length >= config.minInliers() ? Outcome.ACCEPTED : Outcome.TOO_FEW_INLIERS;
        return new Verification(outcome, kind, n, inliers, fit.model(), Optional.empty(),
                ResidualStats.of(e, e.length), scores, iterations);
    }

    private Verification fromPose(ModelKind kind, int n, AdaptiveRansac.Fit fit, PoseRecovery.Recovered r,
                                  ModelScores scores, int iterations, double[] model) {
        Outcome outcome = fit.inlierCount() < config.minInliers() ? Outcome.TOO_FEW_INLIERS : r.outcome();
        Optional<RelativePose> pose = outcome.accepted() ? r.pose() : Optional.empty();
        double[] refined = kind == ModelKind.ESSENTIAL ? pose.flatMap(x -> x.translationDirection()
                .map(t -> Mat3.mul(Mat3.skew(t), x.rotation()))).orElse(model) : model;
        return new Verification(outcome, kind, n, r.inliers(), refined, pose, r.errors(), scores, iterations);
    }
}
