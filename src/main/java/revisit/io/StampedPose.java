package revisit.io;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.se.Se3_F64;
import georegression.struct.so.Quaternion_F64;

/**
 * A camera pose at a time: where the camera centre is in the world and how the camera is turned.
 *
 * <p>Camera axes follow the computer-vision convention (x right, y down, z forward, common practice). The
 * quaternion (qx, qy, qz, qw) is the rotation from camera axes to world axes, so a point {@code Xc} in camera
 * coordinates is {@code Xw = R(q) Xc + p} in the world.
 *
 * @param timeSeconds time stamp, seconds
 * @param x           camera centre x in the world, metres (or the trajectory's unit)
 * @param y           camera centre y
 * @param z           camera centre z
 * @param qx          quaternion vector part x
 * @param qy          quaternion vector part y
 * @param qz          quaternion vector part z
 * @param qw          quaternion scalar part
 */
public record StampedPose(double timeSeconds, double x, double y, double z,
                          double qx, double qy, double qz, double qw) {

    /** Tolerance on |q| - 1 accepted on input before normalising (common practice for text files). */
    static final double UNIT_TOLERANCE = 1e-3;

    public StampedPose {
        for (double v : new double[]{timeSeconds, x, y, z, qx, qy, qz, qw}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("pose values must be finite");
            }
        }
        double n = Math.sqrt(qx * qx + qy * qy + qz * qz + qw * qw);
        if (Math.abs(n - 1) > UNIT_TOLERANCE) {
            throw new IllegalArgumentException("quaternion norm " + n + " is not 1 (tolerance " + UNIT_TOLERANCE + ")");
        }
        qx /= n;
        qy /= n;
        qz /= n;
        qw /= n;
    }

    /** Builds a pose from a camera-to-world transform. */
    public static StampedPose of(double timeSeconds, Se3_F64 cameraToWorld) {
        Quaternion_F64 q = ConvertRotation3D_F64.matrixToQuaternion(cameraToWorld.R, null);
        q.normalize();
        var t = cameraToWorld.T;
        return new StampedPose(timeSeconds, t.x, t.y, t.z, q.x, q.y, q.z, q.w);
    }

    /** The camera-to-world rigid transform (new object). */
    public Se3_F64 cameraToWorld() {
        Se3_F64 se = new Se3_F64();
        ConvertRotation3D_F64.quaternionToMatrix(qw, qx, qy, qz, se.R);
        se.T.setTo(x, y, z);
        return se;
    }

    /** Distance between two camera centres, in the trajectory's unit. */
    public double distanceTo(StampedPose other) {
        double dx = x - other.x;
        double dy = y - other.y;
        double dz = z - other.z;
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    /** Angle of the rotation between two camera orientations, radians in [0, pi]. */
    public double angleTo(StampedPose other) {
        double dot = Math.abs(qx * other.qx + qy * other.qy + qz * other.qz + qw * other.qw);
        return 2 * Math.acos(Math.min(1.0, dot));
    }
}
