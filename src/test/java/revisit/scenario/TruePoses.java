package revisit.scenario;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.se.Se3_F64;
import georegression.struct.so.Quaternion_F64;
import java.util.List;
import org.ejml.data.DMatrixRMaj;
import revisit.io.StampedPose;

/** Ground-truth relative poses of a scenario's frames, for tests that judge exported closures. */
public final class TruePoses {

    private final List<List<StampedPose>> sessions;

    /** @param sessions camera-to-world poses per sequence id, one per frame index */
    public TruePoses(List<List<StampedPose>> sessions) {
        this.sessions = List.copyOf(sessions);
    }

    /** The true transform from query-camera to match-camera coordinates (the closures' convention). */
    public Se3_F64 matchFromQuery(int querySequence, int queryFrame, int matchSequence, int matchFrame) {
        Se3_F64 worldFromQuery = se3(sessions.get(querySequence).get(queryFrame));
        Se3_F64 worldFromMatch = se3(sessions.get(matchSequence).get(matchFrame));
        return worldFromQuery.concat(worldFromMatch.invert(null), null);
    }

    /** Angle between an exported rotation (quaternion x, y, z, w) and a true one, degrees. */
    public static double rotationErrorDeg(double[] xyzw, Se3_F64 truth) {
        DMatrixRMaj r = new DMatrixRMaj(3, 3);
        ConvertRotation3D_F64.quaternionToMatrix(new Quaternion_F64(xyzw[3], xyzw[0], xyzw[1], xyzw[2]), r);
        double trace = 0;
        for (int i = 0; i < 3; i++) {
            for (int k = 0; k < 3; k++) {
                trace += r.get(k, i) * truth.R.get(k, i);
            }
        }
        return Math.toDegrees(Math.acos(Math.max(-1, Math.min(1, (trace - 1) / 2))));
    }

    private static Se3_F64 se3(StampedPose p) {
        Se3_F64 out = new Se3_F64();
        ConvertRotation3D_F64.quaternionToMatrix(new Quaternion_F64(p.qw(), p.qx(), p.qy(), p.qz()), out.R);
        out.T.setTo(p.x(), p.y(), p.z());
        return out;
    }
}
