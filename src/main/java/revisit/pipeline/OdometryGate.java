package revisit.pipeline;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.se.Se3_F64;
import georegression.struct.so.Quaternion_F64;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import revisit.consistency.ConsistencyConfig;
import revisit.consistency.OdometryTrack;
import revisit.io.StampedPose;

/**
 * Tests one closure within a sequence against that sequence's odometry: the rotation the closure measures must
 * agree with the rotation odometry accumulated between the two frames, within the odometry's drift model
 * ({@link ConsistencyConfig}: floor, per metre travelled, per radian turned; 3 sigma, common practice). A look-alike
 * place elsewhere (the yard's twin kiosks) is usually passed with another heading, so its closure contradicts
 * odometry even when a burst of such closures agrees with itself, which the pairwise check cannot see.
 */
final class OdometryGate {

    private static final double SIGMAS = 3.0;

    private final Map<String, OdometryTrack> tracks;
    private final ConsistencyConfig config;

    OdometryGate(Map<String, List<StampedPose>> odometry, ConsistencyConfig config) {
        this.tracks = new java.util.HashMap<>();
        odometry.forEach((name, poses) -> tracks.put(name, new OdometryTrack(poses)));
        this.config = config;
    }

    /** Empty when the closure passes or cannot be tested; otherwise the reason it contradicts odometry. */
    Optional<String> contradiction(Closure c, List<String> names) {
        if (c.querySequence() != c.matchSequence()) {
            return Optional.empty();
        }
        OdometryTrack track = tracks.get(names.get(c.querySequence()));
        if (track == null || !track.covers(c.queryTime()) || !track.covers(c.matchTime())) {
            return Optional.empty();
        }
        Optional<Se3_F64> wq = track.poseAt(c.queryTime());
        Optional<Se3_F64> wm = track.poseAt(c.matchTime());
        if (wq.isEmpty() || wm.isEmpty()) {
            return Optional.empty();
        }
        DMatrixRMaj predicted = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.multTransA(wm.get().R, wq.get().R, predicted); // query camera -> matched camera
        double[] q = c.quaternion();
        DMatrixRMaj measured = ConvertRotation3D_F64.quaternionToMatrix(new Quaternion_F64(q[3], q[0], q[1], q[2]),
                null);
        DMatrixRMaj diff = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.multTransA(predicted, measured, diff);
        double cos = (diff.get(0, 0) + diff.get(1, 1) + diff.get(2, 2) - 1) / 2;
        double angle = Math.acos(Math.max(-1, Math.min(1, cos)));
        double metres = track.distanceBetween(c.matchTime(), c.queryTime());
        double turned = track.turnBetween(c.matchTime(), c.queryTime());
        double sigma = Math.sqrt(sq(config.minRotationSigmaRad()) + sq(config.rotationDriftRadPerMetre() * metres)
                + sq(config.rotationDriftFraction() * turned));
        if (angle <= SIGMAS * sigma) {
            return Optional.empty();
        }
        return Optional.of(String.format(java.util.Locale.ROOT,
                "rotation contradicts odometry by %.1f deg (allowed %.1f deg)", Math.toDegrees(angle),
                Math.toDegrees(SIGMAS * sigma)));
    }

    private static double sq(double v) {
        return v * v;
    }
}
