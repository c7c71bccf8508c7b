package revisit.verification;

/**
 * Small dense 3x3 and 3-vector operations on row-major {@code double[9]} / {@code double[3]} arrays, used in the
 * hot loops of model scoring and refinement where EJML's general matrices would allocate.
 */
final class Mat3 {

    private Mat3() {
    }

    static double[] identity() {
        return new double[]{1, 0, 0, 0, 1, 0, 0, 0, 1};
    }

    /** Returns {@code a * b}. */
    static double[] mul(double[] a, double[] b) {
        double[] c = new double[9];
        for (int r = 0; r < 3; r++) {
            for (int k = 0; k < 3; k++) {
                c[r * 3 + k] = a[r * 3] * b[k] + a[r * 3 + 1] * b[3 + k] + a[r * 3 + 2] * b[6 + k];
            }
        }
        return c;
    }

    /** Returns {@code a^T}. */
    static double[] transpose(double[] a) {
        return new double[]{a[0], a[3], a[6], a[1], a[4], a[7], a[2], a[5], a[8]};
    }

    /** Returns {@code m v}. */
    static double[] mulVec(double[] m, double[] v) {
        return new double[]{m[0] * v[0] + m[1] * v[1] + m[2] * v[2], m[3] * v[0] + m[4] * v[1] + m[5] * v[2],
                m[6] * v[0] + m[7] * v[1] + m[8] * v[2]};
    }

    /** Skew-symmetric matrix {@code [v]x} with {@code [v]x w = v x w}. */
    static double[] skew(double[] v) {
        return new double[]{0, -v[2], v[1], v[2], 0, -v[0], -v[1], v[0], 0};
    }

    static double[] cross(double[] a, double[] b) {
        return new double[]{a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }

    static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    /** Sum of products of all nine entries of two 3x3 matrices. */
    static double dot9(double[] a, double[] b) {
        double s = 0;
        for (int k = 0; k < 9; k++) {
            s += a[k] * b[k];
        }
        return s;
    }

    static double norm(double[] v) {
        return Math.sqrt(dot(v, v));
    }

    /** Returns {@code v / |v|}. */
    static double[] unit(double[] v) {
        double n = norm(v);
        return new double[]{v[0] / n, v[1] / n, v[2] / n};
    }

    /**
     * Rotation matrix of the rotation vector {@code w} (axis times angle, radians) by Rodrigues' formula.
     */
    static double[] exp(double[] w) {
        double theta = norm(w);
        double[] k = skew(w);
        double[] k2 = mul(k, k);
        double a;
        double b;
        if (theta < 1e-8) {
            a = 1 - theta * theta / 6;
            b = 0.5 - theta * theta / 24;
        } else {
            a = Math.sin(theta) / theta;
            b = (1 - Math.cos(theta)) / (theta * theta);
        }
        double[] r = identity();
        for (int i = 0; i < 9; i++) {
            r[i] += a * k[i] + b * k2[i];
        }
        return r;
    }

    /** Angle of the rotation matrix {@code r}, radians in [0, pi]. */
    static double angle(double[] r) {
        double c = (r[0] + r[4] + r[8] - 1) / 2;
        return Math.acos(Math.max(-1, Math.min(1, c)));
    }

    /** Inverse of a general 3x3 matrix, or an empty array when it is singular. */
    static double[] inverse(double[] m) {
        double c0 = m[4] * m[8] - m[5] * m[7];
        double c1 = m[5] * m[6] - m[3] * m[8];
        double c2 = m[3] * m[7] - m[4] * m[6];
        double det = m[0] * c0 + m[1] * c1 + m[2] * c2;
        if (det == 0 || !Double.isFinite(det)) {
            return new double[0];
        }
        double inv = 1 / det;
        return new double[]{c0 * inv, (m[2] * m[7] - m[1] * m[8]) * inv, (m[1] * m[5] - m[2] * m[4]) * inv,
                c1 * inv, (m[0] * m[8] - m[2] * m[6]) * inv, (m[2] * m[3] - m[0] * m[5]) * inv,
                c2 * inv, (m[1] * m[6] - m[0] * m[7]) * inv, (m[0] * m[4] - m[1] * m[3]) * inv};
    }

    /** Two unit vectors that complete the unit vector {@code t} to a right-handed orthonormal basis. */
    static double[][] tangentBasis(double[] t) {
        double[] helper = Math.abs(t[0]) < 0.9 ? new double[]{1, 0, 0} : new double[]{0, 1, 0};
        double[] b1 = unit(cross(t, helper));
        double[] b2 = cross(t, b1);
        return new double[][]{b1, b2};
    }
}
