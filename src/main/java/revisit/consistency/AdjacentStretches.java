package revisit.consistency;

import georegression.struct.se.Se3_F64;

/**
 * Stretch motion without odometry: two frames of the same sequence within
 * {@link ConsistencyConfig#adjacencyWindowSeconds()} are taken to have nearly the same pose, the identity with
 * sigmas {@code max(floor, topSpeed * gap)} and {@code max(floor, topTurnRate * gap)} per axis. Frames farther apart
 * are refused, so closures on different parts of a sequence are not tested against each other in this mode.
 */
final class AdjacentStretches implements StretchMotion {

    private final ConsistencyConfig config;

    AdjacentStretches(ConsistencyConfig config) {
        this.config = config;
    }

    @Override
    public Stretch between(FrameRef from, FrameRef to) {
        double gap = Math.abs(to.timeSeconds() - from.timeSeconds());
        if (gap > config.adjacencyWindowSeconds()) {
            return Stretch.missing(UncheckedReason.PARTNERS_TOO_FAR);
        }
        double rotationSigma = Math.max(config.minRotationSigmaRad(), config.maxTurnRateRadPerSecond() * gap);
        double translationSigma = Math.max(config.minTranslationSigmaMetres(), config.maxSpeedMetresPerSecond() * gap);
        return Stretch.of(UncertainPose.isotropic(new Se3_F64(), rotationSigma, translationSigma));
    }
}
