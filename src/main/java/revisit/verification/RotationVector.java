package revisit.verification;

import org.ejml.data.DMatrixRMaj;

/**
 * The exponential and logarithm maps of 3D rotations, as rotation vectors (axis times angle, radians).
 *
 * <p>{@code exp(w) = I + sin(a)/a [w]x + (1 - cos(a))/a^2 [w]x^2} with {@code a = |w|} (Rodrigues 1840); the
 * logarithm goes through the unit quaternion, {@code w = 2 atan2(|q_v|, q_w) q_v / |q_v|}, which stays accurate
 * near 0 and near pi where the matrix-trace formula loses digits (common practice).
 */
public final class RotationVector {

    private static final double SMALL_ANGLE = 1e-8;

    private RotationVector() {
    }

    /**
     * Rotation matrix of a rotation vector.
     *
     * @param wx  x component, radians
     * @param wy  y component, radians
     * @param wz  z component, radians
     * @param out 3x3 rotation; modified
     */
    public static void exp(double wx, double wy, double wz, DMatrixRMaj out) {
        double theta2 = wx * wx + wy * wy + wz * wz;
        double theta = Math.sqrt(theta2);
        double a;
        double b;
        if (theta < SMALL_ANGLE) {
            a = 1 - theta2 / 6;
            b = 0.5 - theta2 / 24;
        } else {
            a = Math.sin(theta) / theta;
            b = (1 - Math.cos(theta)) / theta2;
        }
        out.reshape(3, 3);
        out.set(0, 0, 1 - b * (wy * wy + wz * wz));
        out.set(1, 1, 1 - b * (wx * wx + wz * wz));
        out.set(2, 2, 1 - b * (wx * wx + wy * wy));
        out.set(0, 1, -a * wz + b * wx * wy);
        out.set(1, 0, a * wz + b * wx * wy);
        out.set(0, 2, a * wy + b * wx * wz);
        out.set(2, 0, -a * wy + b * wx * wz);
        out.set(1, 2, -a * wx + b * wy * wz);
        out.set(2, 1, a * wx + b * wy * wz);
    }

    /**
     * Rotation vector of a rotation matrix, angle in [0, pi].
     *
     * @param r   3x3 rotation (orthonormal, det +1); not modified
     * @param out receives (wx, wy, wz), radians; modified
     */
    public static void log(DMatrixRMaj r, double[] out) {
        double[] q = quaternion(r);
        double w = q[0];
        if (w < 0) {
            for (int k = 0; k < 4; k++) {
                q[k] = -q[k];
            }
            w = q[0];
        }
        double sinHalf = Math.sqrt(q[1] * q[1] + q[2] * q[2] + q[3] * q[3]);
        double scale = sinHalf < SMALL_ANGLE ? 2 / w : 2 * Math.atan2(sinHalf, w) / sinHalf;
        out[0] = scale * q[1];
        out[1] = scale * q[2];
        out[2] = scale * q[3];
    }

    /** Angle of a rotation matrix, radians in [0, pi]. */
    public static double angle(DMatrixRMaj r) {
        double[] w = new double[3];
        log(r, w);
        return Math.sqrt(w[0] * w[0] + w[1] * w[1] + w[2] * w[2]);
    }

    /** Unit quaternion (w, x, y, z) of a rotation matrix by the largest-pivot method (common practice). */
    static double[] quaternion(DMatrixRMaj r) {
        double m00 = r.get(0, 0);
        double m11 = r.get(1, 1);
        double m22 = r.get(2, 2);
        double trace = m00 + m11 + m22;
        double[] q = new double[4];
        if (trace > 0) {
            double s = 2 * Math.sqrt(1 + trace);
            q[0] = s / 4;
            q[1] = (r.get(2, 1) - r.get(1, 2)) / s;
            q[2] = (r.get(0, 2) - r.get(2, 0)) / s;
            q[3] = (r.get(1, 0) - r.get(0, 1)) / s;
        } else if (m00 > m11 && m00 > m22) {
            double s = 2 * Math.sqrt(1 + m00 - m11 - m22);
            q[0] = (r.get(2, 1) - r.get(1, 2)) / s;
            q[1] = s / 4;
            q[2] = (r.get(0, 1) + r.get(1, 0)) / s;
            q[3] = (r.get(0, 2) + r.get(2, 0)) / s;
        } else if (m11 > m22) {
            double s = 2 * Math.sqrt(1 + m11 - m00 - m22);
            q[0] = (r.get(0, 2) - r.get(2, 0)) / s;
            q[1] = (r.get(0, 1) + r.get(1, 0)) / s;
            q[2] = s / 4;
            q[3] = (r.get(1, 2) + r.get(2, 1)) / s;
        } else {
            double s = 2 * Math.sqrt(1 + m22 - m00 - m11);
            q[0] = (r.get(1, 0) - r.get(0, 1)) / s;
            q[1] = (r.get(0, 2) + r.get(2, 0)) / s;
            q[2] = (r.get(1, 2) + r.get(2, 1)) / s;
            q[3] = s / 4;
        }
        double n = Math.sqrt(q[0] * q[0] + q[1] * q[1] + q[2] * q[2] + q[3] * q[3]);
        for (int k = 0; k < 4; k++) {
            q[k] /= n;
        }
        return q;
    }
}
