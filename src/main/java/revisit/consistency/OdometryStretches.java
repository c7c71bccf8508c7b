package revisit.consistency;

import georegression.struct.se.Se3_F64;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Stretch motion from odometry: {@code T_from^-1 T_to} of the interpolated camera-to-world poses, with an isotropic
 * covariance from the drift model: translation sigma {@code max(floor, driftFraction * distance)}, rotation sigma
 * {@code max(floor, rotationPerMetre * distance + rotationFraction * angleTurned)}, both per axis. Stretches longer
 * than {@link ConsistencyConfig#maxStretchSeconds()} or with a rotation sigma above
 * {@link ConsistencyConfig#maxStretchRotationSigmaRad()} are refused. Not thread-safe: caches the interpolated pose
 * of every frame it has seen (poses are copied out by {@link Se3_F64#concat}, never handed out).
 */
final class OdometryStretches implements StretchMotion {

    private final Map<String, OdometryTrack> tracks;
    private final ConsistencyConfig config;
    private final Map<FrameRef, Optional<Se3_F64>> poses = new HashMap<>();

    OdometryStretches(Map<String, OdometryTrack> tracks, ConsistencyConfig config) {
        this.tracks = Map.copyOf(tracks);
        this.config = config;
    }

    @Override
    public Stretch between(FrameRef from, FrameRef to) {
        OdometryTrack track = tracks.get(from.sequence());
        if (track == null) {
            return Stretch.missing(UncheckedReason.NO_ODOMETRY_FOR_SEQUENCE);
        }
        Optional<Se3_F64> start = poses.computeIfAbsent(from, f -> track.poseAt(f.timeSeconds()));
        Optional<Se3_F64> end = poses.computeIfAbsent(to, f -> track.poseAt(f.timeSeconds()));
        if (start.isEmpty() || end.isEmpty()) {
            return Stretch.missing(UncheckedReason.OUTSIDE_ODOMETRY);
        }
        if (Math.abs(to.timeSeconds() - from.timeSeconds()) > config.maxStretchSeconds()) {
            return Stretch.missing(UncheckedReason.PARTNERS_TOO_FAR);
        }
        double distance = track.distanceBetween(from.timeSeconds(), to.timeSeconds());
        double turn = track.turnBetween(from.timeSeconds(), to.timeSeconds());
        double rotationSigma = Math.max(config.minRotationSigmaRad(),
                config.rotationDriftRadPerMetre() * distance + config.rotationDriftFraction() * turn);
        if (rotationSigma > config.maxStretchRotationSigmaRad()) {
            return Stretch.missing(UncheckedReason.ODOMETRY_TOO_UNCERTAIN);
        }
        double translationSigma = Math.max(config.minTranslationSigmaMetres(),
                config.translationDriftFraction() * distance);
        Se3_F64 relative = end.get().concat(start.get().invert(null), null);
        return Stretch.of(UncertainPose.isotropic(relative, rotationSigma, translationSigma));
    }
}
