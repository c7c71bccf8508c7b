package revisit.consistency;

/**
 * Settings of the pairwise consistency check ({@link ConsistencyCheck}).
 *
 * @param confidenceLevel              probability of the chi-square gate on a loop's squared Mahalanobis distance;
 *                                     typical 0.95 .. 0.999; default 0.99 (Mangelson et al., ICRA 2018, gate their
 *                                     pairwise test with a chi-square threshold; the level is common practice)
 * @param translationDriftFraction     odometry translation error per metre travelled (1 sigma, per axis), fraction;
 *                                     typical 0.005 .. 0.05; default 0.02 (visual odometry on driving data errs by about
 *                                     1 to 2 % of distance; from memory of the KITTI odometry ranking)
 * @param rotationDriftRadPerMetre     odometry rotation error per metre travelled (1 sigma, per axis), rad/m; typical
 *                                     1e-4 .. 1e-3; default 3e-4 (about 0.02 deg/m; from memory of the same ranking)
 * @param rotationDriftFraction        odometry rotation error per radian turned (1 sigma, per axis), fraction; typical
 *                                     0.01 .. 0.05; default 0.03 (common practice for gyro- or vision-based heading)
 * @param minTranslationSigmaMetres    floor on an odometry stretch's translation sigma (time-stamp and interpolation
 *                                     error), metres; typical 0.01 .. 0.1; default 0.05 (common practice)
 * @param minRotationSigmaRad          floor on an odometry stretch's rotation sigma, radians; typical 0.005 .. 0.05;
 *                                     default 0.01 (about 0.6 deg; common practice)
 * @param maxStretchSeconds            longest odometry stretch used to join two closures, seconds; longer stretches
 *                                     are not tested; typical 10 .. 300; default 60 (common practice: beyond, drift makes
 *                                     the test weak and the first-order propagation unreliable)
 * @param maxStretchRotationSigmaRad   largest rotation sigma of a stretch still tested, radians; typical 0.2 .. 0.5;
 *                                     default 0.35 (about 20 deg, where the first-order model is still fair; common
 *                                     practice)
 * @param adjacencyWindowSeconds       without odometry: largest time gap between the ends of two closures on the
 *                                     same stretch, seconds; typical 0.2 .. 3; default 1.0 (common practice)
 * @param maxSpeedMetresPerSecond      without odometry: assumed top speed that bounds the motion within a time gap,
 *                                     m/s; typical 0.5 (hand-held) .. 20 (car); default 1.5 (walking pace; common practice)
 * @param maxTurnRateRadPerSecond      without odometry: assumed top turn rate, rad/s; typical 0.2 .. 2; default 0.5
 *                                     (about 30 deg/s; common practice)
 * @param directionSigmaRad            monocular closures: sigma of the translation direction, radians; typical
 *                                     0.01 .. 0.1; default 0.035 (about 2 deg, common practice for essential-matrix
 *                                     translation from a few dozen inliers)
 * @param maxExactCliqueVertices       largest conflict component searched exactly by branch and bound; larger ones
 *                                     use the greedy heuristic; typical 100 .. 5000; default 2000 (measured: the
 *                                     1004-closure component of ConsistencyCheckBench, 4 planted false closures, was
 *                                     solved exactly in one branch-and-bound node; the node budget bounds harder cases)
 * @param cliqueNodeBudget             branch-and-bound nodes per component before the best clique so far is returned
 *                                     (then marked not exact); typical 1e5 .. 1e8; default 2,000,000
 * @param inlierCountScale             inlier count at which the geometric part of the confidence reaches 1 - 1/e;
 *                                     typical 10 .. 50; default 20 (common practice, above the 12-inlier minimum of
 *                                     Gálvez-López and Tardós, IEEE T-RO 2012)
 * @param keepUnchecked                whether {@link ConsistencyReport#trusted} keeps closures that could not be
 *                                     tested; default false (a false closure can wreck a map: Sünderhauf and Protzel,
 *                                     IROS 2012)
 */
public record ConsistencyConfig(double confidenceLevel, double translationDriftFraction,
                                double rotationDriftRadPerMetre, double rotationDriftFraction,
                                double minTranslationSigmaMetres, double minRotationSigmaRad,
                                double maxStretchSeconds, double maxStretchRotationSigmaRad,
                                double adjacencyWindowSeconds, double maxSpeedMetresPerSecond,
                                double maxTurnRateRadPerSecond, double directionSigmaRad,
                                int maxExactCliqueVertices, long cliqueNodeBudget, double inlierCountScale,
                                boolean keepUnchecked) {

    public ConsistencyConfig {
        if (!(confidenceLevel > 0 && confidenceLevel < 1)) {
            throw new IllegalArgumentException("confidenceLevel must be in (0, 1), was " + confidenceLevel);
        }
        nonNegative("translationDriftFraction", translationDriftFraction);
        nonNegative("rotationDriftRadPerMetre", rotationDriftRadPerMetre);
        nonNegative("rotationDriftFraction", rotationDriftFraction);
        positive("minTranslationSigmaMetres", minTranslationSigmaMetres);
        positive("minRotationSigmaRad", minRotationSigmaRad);
        positive("maxStretchSeconds", maxStretchSeconds);
        positive("maxStretchRotationSigmaRad", maxStretchRotationSigmaRad);
        positive("adjacencyWindowSeconds", adjacencyWindowSeconds);
        positive("maxSpeedMetresPerSecond", maxSpeedMetresPerSecond);
        positive("maxTurnRateRadPerSecond", maxTurnRateRadPerSecond);
        positive("directionSigmaRad", directionSigmaRad);
        positive("inlierCountScale", inlierCountScale);
        if (maxExactCliqueVertices < 1 || cliqueNodeBudget < 1) {
            throw new IllegalArgumentException("maxExactCliqueVertices and cliqueNodeBudget must be >= 1, were "
                    + maxExactCliqueVertices + ", " + cliqueNodeBudget);
        }
    }

    /** The documented defaults. */
    public static ConsistencyConfig defaults() {
        return new ConsistencyConfig(0.99, 0.02, 3e-4, 0.03, 0.05, 0.01, 60, 0.35, 1.0, 1.5, 0.5, 0.035, 2000,
                2_000_000, 20, false);
    }

    public ConsistencyConfig withConfidenceLevel(double value) {
        return new ConsistencyConfig(value, translationDriftFraction, rotationDriftRadPerMetre, rotationDriftFraction,
                minTranslationSigmaMetres, minRotationSigmaRad, maxStretchSeconds, maxStretchRotationSigmaRad,
                adjacencyWindowSeconds, maxSpeedMetresPerSecond, maxTurnRateRadPerSecond, directionSigmaRad,
                maxExactCliqueVertices, cliqueNodeBudget, inlierCountScale, keepUnchecked);
    }

    /** Odometry drift: translation fraction of distance, rotation per metre and per radian turned. */
    public ConsistencyConfig withDrift(double translationFraction, double rotationRadPerMetre, double rotationFraction) {
        return new ConsistencyConfig(confidenceLevel, translationFraction, rotationRadPerMetre, rotationFraction,
                minTranslationSigmaMetres, minRotationSigmaRad, maxStretchSeconds, maxStretchRotationSigmaRad,
                adjacencyWindowSeconds, maxSpeedMetresPerSecond, maxTurnRateRadPerSecond, directionSigmaRad,
                maxExactCliqueVertices, cliqueNodeBudget, inlierCountScale, keepUnchecked);
    }

    /** Floors on the sigma of any stretch: translation (metres) and rotation (radians). */
    public ConsistencyConfig withMinSigmas(double translationMetres, double rotationRad) {
        return new ConsistencyConfig(confidenceLevel, translationDriftFraction, rotationDriftRadPerMetre,
                rotationDriftFraction, translationMetres, rotationRad, maxStretchSeconds, maxStretchRotationSigmaRad,
                adjacencyWindowSeconds, maxSpeedMetresPerSecond, maxTurnRateRadPerSecond, directionSigmaRad,
                maxExactCliqueVertices, cliqueNodeBudget, inlierCountScale, keepUnchecked);
    }

    public ConsistencyConfig withMaxStretchSeconds(double value) {
        return new ConsistencyConfig(confidenceLevel, translationDriftFraction, rotationDriftRadPerMetre,
                rotationDriftFraction, minTranslationSigmaMetres, minRotationSigmaRad, value,
                maxStretchRotationSigmaRad, adjacencyWindowSeconds, maxSpeedMetresPerSecond, maxTurnRateRadPerSecond,
                directionSigmaRad, maxExactCliqueVertices, cliqueNodeBudget, inlierCountScale, keepUnchecked);
    }

    /** Time-adjacency mode: window (seconds), top speed (m/s) and top turn rate (rad/s). */
    public ConsistencyConfig withAdjacency(double windowSeconds, double speedMetresPerSecond, double turnRateRadPerSecond) {
        return new ConsistencyConfig(confidenceLevel, translationDriftFraction, rotationDriftRadPerMetre,
                rotationDriftFraction, minTranslationSigmaMetres, minRotationSigmaRad, maxStretchSeconds,
                maxStretchRotationSigmaRad, windowSeconds, speedMetresPerSecond, turnRateRadPerSecond,
                directionSigmaRad, maxExactCliqueVertices, cliqueNodeBudget, inlierCountScale, keepUnchecked);
    }

    public ConsistencyConfig withDirectionSigmaRad(double value) {
        return new ConsistencyConfig(confidenceLevel, translationDriftFraction, rotationDriftRadPerMetre,
                rotationDriftFraction, minTranslationSigmaMetres, minRotationSigmaRad, maxStretchSeconds,
                maxStretchRotationSigmaRad, adjacencyWindowSeconds, maxSpeedMetresPerSecond, maxTurnRateRadPerSecond,
                value, maxExactCliqueVertices, cliqueNodeBudget, inlierCountScale, keepUnchecked);
    }

    /** Clique search limits: exact up to this component size, and node budget per component. */
    public ConsistencyConfig withCliqueLimits(int exactVertices, long nodeBudget) {
        return new ConsistencyConfig(confidenceLevel, translationDriftFraction, rotationDriftRadPerMetre,
                rotationDriftFraction, minTranslationSigmaMetres, minRotationSigmaRad, maxStretchSeconds,
                maxStretchRotationSigmaRad, adjacencyWindowSeconds, maxSpeedMetresPerSecond, maxTurnRateRadPerSecond,
                directionSigmaRad, exactVertices, nodeBudget, inlierCountScale, keepUnchecked);
    }

    public ConsistencyConfig withKeepUnchecked(boolean value) {
        return new ConsistencyConfig(confidenceLevel, translationDriftFraction, rotationDriftRadPerMetre,
                rotationDriftFraction, minTranslationSigmaMetres, minRotationSigmaRad, maxStretchSeconds,
                maxStretchRotationSigmaRad, adjacencyWindowSeconds, maxSpeedMetresPerSecond, maxTurnRateRadPerSecond,
                directionSigmaRad, maxExactCliqueVertices, cliqueNodeBudget, inlierCountScale, value);
    }

    private static void positive(String name, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, was " + value);
        }
    }

    private static void nonNegative(String name, double value) {
        if (!(value >= 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be >= 0 and finite, was " + value);
        }
    }
}
