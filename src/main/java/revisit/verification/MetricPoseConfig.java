package revisit.verification;

/**
 * Settings of the metric relative-pose estimate from features with depth ({@link MetricPoseEstimator}).
 *
 * @param pixelSigmaPx          standard deviation of a feature position, pixels; typical 0.5 .. 2; default 1.0
 *                              (common practice for FAST corners at level 0)
 * @param depthSigmaAtOneMetre  standard deviation of a depth reading at 1 m, metres; it grows with the square of the
 *                              depth, as for structured-light and stereo sensors; typical 0.001 .. 0.01; default
 *                              0.0016 (Khoshelham and Oude Elberink, Sensors 12(2), 2012: random depth error rising
 *                              quadratically to about 4 cm at 5 m; from memory)
 * @param minDepthMetres        nearest depth used, metres; typical 0.1 .. 0.5; default 0.2 (common practice for RGB-D)
 * @param maxDepthMetres        farthest depth used, metres; typical 4 .. 40; default 10 (beyond, depth noise of the
 *                              sensor above grows past 16 cm)
 * @param sampling              how depth is read at a feature position; default bilinear
 * @param maxRelativeDepthJump  largest relative depth difference among the four pixels blended by bilinear sampling;
 *                              typical 0.02 .. 0.1; default 0.05 (common practice)
 * @param inlierProbability     probability mass of the noise model that counts as inlier, used for the chi-square
 *                              gate on each correspondence; typical 0.95 .. 0.999; default 0.99 (common practice)
 * @param ransacConfidence      wanted probability of drawing at least one outlier-free sample, for the adaptive
 *                              iteration count; typical 0.99 .. 0.9999; default 0.999 (common practice)
 * @param maxIterations         hard cap on RANSAC iterations; typical 200 .. 5000; default 1000
 * @param minInliers            fewest inliers for an accepted pose; typical 8 .. 30; default 12 (Gálvez-López and
 *                              Tardós, IEEE T-RO 2012, minimum RANSAC inliers)
 * @param maxRefineIterations   Levenberg-Marquardt iterations; typical 10 .. 50; default 20 (common practice)
 * @param seed                  random seed of the sampling; fixed default for reproducible runs
 */
public record MetricPoseConfig(double pixelSigmaPx, double depthSigmaAtOneMetre, double minDepthMetres,
                               double maxDepthMetres, DepthSampling sampling, double maxRelativeDepthJump,
                               double inlierProbability, double ransacConfidence, int maxIterations, int minInliers,
                               int maxRefineIterations, long seed) {

    public MetricPoseConfig {
        positive("pixelSigmaPx", pixelSigmaPx);
        positive("depthSigmaAtOneMetre", depthSigmaAtOneMetre);
        positive("minDepthMetres", minDepthMetres);
        positive("maxRelativeDepthJump", maxRelativeDepthJump);
        if (!(maxDepthMetres > minDepthMetres) || !Double.isFinite(maxDepthMetres)) {
            throw new IllegalArgumentException("maxDepthMetres must be finite and above minDepthMetres "
                    + minDepthMetres + ", was " + maxDepthMetres);
        }
        if (sampling == null) {
            throw new IllegalArgumentException("sampling must be given (NEAREST or BILINEAR)");
        }
        probability("inlierProbability", inlierProbability);
        probability("ransacConfidence", ransacConfidence);
        if (maxIterations < 1 || minInliers < 4 || maxRefineIterations < 0) {
            throw new IllegalArgumentException("need maxIterations >= 1, minInliers >= 4, maxRefineIterations >= 0; were "
                    + maxIterations + ", " + minInliers + ", " + maxRefineIterations);
        }
    }

    /** The documented defaults. */
    public static MetricPoseConfig defaults() {
        return new MetricPoseConfig(1.0, 0.0016, 0.2, 10.0, DepthSampling.BILINEAR, 0.05, 0.99, 0.999, 1000, 12, 20,
                0x5EED_0DE7L);
    }

    public MetricPoseConfig withPixelSigmaPx(double value) {
        return new MetricPoseConfig(value, depthSigmaAtOneMetre, minDepthMetres, maxDepthMetres, sampling,
                maxRelativeDepthJump, inlierProbability, ransacConfidence, maxIterations, minInliers,
                maxRefineIterations, seed);
    }

    public MetricPoseConfig withDepthSigmaAtOneMetre(double value) {
        return new MetricPoseConfig(pixelSigmaPx, value, minDepthMetres, maxDepthMetres, sampling,
                maxRelativeDepthJump, inlierProbability, ransacConfidence, maxIterations, minInliers,
                maxRefineIterations, seed);
    }

    public MetricPoseConfig withDepthRange(double minMetres, double maxMetres) {
        return new MetricPoseConfig(pixelSigmaPx, depthSigmaAtOneMetre, minMetres, maxMetres, sampling,
                maxRelativeDepthJump, inlierProbability, ransacConfidence, maxIterations, minInliers,
                maxRefineIterations, seed);
    }

    public MetricPoseConfig withSampling(DepthSampling value) {
        return new MetricPoseConfig(pixelSigmaPx, depthSigmaAtOneMetre, minDepthMetres, maxDepthMetres, value,
                maxRelativeDepthJump, inlierProbability, ransacConfidence, maxIterations, minInliers,
                maxRefineIterations, seed);
    }

    public MetricPoseConfig withMinInliers(int value) {
        return new MetricPoseConfig(pixelSigmaPx, depthSigmaAtOneMetre, minDepthMetres, maxDepthMetres, sampling,
                maxRelativeDepthJump, inlierProbability, ransacConfidence, maxIterations, value,
                maxRefineIterations, seed);
    }

    public MetricPoseConfig withMaxIterations(int value) {
        return new MetricPoseConfig(pixelSigmaPx, depthSigmaAtOneMetre, minDepthMetres, maxDepthMetres, sampling,
                maxRelativeDepthJump, inlierProbability, ransacConfidence, value, minInliers,
                maxRefineIterations, seed);
    }

    public MetricPoseConfig withSeed(long value) {
        return new MetricPoseConfig(pixelSigmaPx, depthSigmaAtOneMetre, minDepthMetres, maxDepthMetres, sampling,
                maxRelativeDepthJump, inlierProbability, ransacConfidence, maxIterations, minInliers,
                maxRefineIterations, value);
    }

    private static void positive(String name, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, was " + value);
        }
    }

    private static void probability(String name, double value) {
        if (!(value > 0 && value < 1)) {
            throw new IllegalArgumentException(name + " must be in (0, 1), was " + value);
        }
    }
}
