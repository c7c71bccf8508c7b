package revisit.verification;

import org.ejml.data.DMatrixRMaj;

/** Small dense helpers for 3x3 covariance matrices stored row-major in double[9]. */
final class Cholesky3 {

    private Cholesky3() {
    }

    /** Lower-triangular L with L L^T = s (s symmetric positive definite); entries above the diagonal set to 0. */
    static void factor(double[] s, double[] l) {
        double l00 = Math.sqrt(s[0]);
        double l10 = s[3] / l00;
        double l20 = s[6] / l00;
        double l11 = Math.sqrt(s[4] - l10 * l10);
        double l21 = (s[7] - l20 * l10) / l11;
        double l22 = Math.sqrt(s[8] - l20 * l20 - l21 * l21);
        l[0] = l00;
        l[1] = 0;
        l[2] = 0;
        l[3] = l10;
        l[4] = l11;
        l[5] = 0;
        l[6] = l20;
        l[7] = l21;
        l[8] = l22;
    }

    /** Replaces x by L^-1 x. */
    static void forwardSolve(double[] l, double[] x) {
        x[0] = x[0] / l[0];
        x[1] = (x[1] - l[3] * x[0]) / l[4];
        x[2] = (x[2] - l[6] * x[0] - l[7] * x[1]) / l[8];
    }

    /** out = R S R^T for the 3x3 block of s starting at offset. */
    static void rotate(DMatrixRMaj r, double[] s, int offset, double[] out) {
        double[] rs = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                rs[3 * i + j] = r.get(i, 0) * s[offset + j] + r.get(i, 1) * s[offset + 3 + j]
                        + r.get(i, 2) * s[offset + 6 + j];
            }
        }
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                out[3 * i + j] = rs[3 * i] * r.get(j, 0) + rs[3 * i + 1] * r.get(j, 1) + rs[3 * i + 2] * r.get(j, 2);
            }
        }
    }
}
