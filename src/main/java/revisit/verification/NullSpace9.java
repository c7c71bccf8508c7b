package revisit.verification;

import java.util.Arrays;

/**
 * Orthonormal basis of the null space of the five epipolar equations {@code xb^T E xa = 0} in the nine entries of
 * E (row-major): Gauss-Jordan elimination with complete pivoting gives one null vector per free column, and
 * modified Gram-Schmidt makes them orthonormal (Golub &amp; Van Loan, Matrix Computations, 4th ed. 2013, sec. 3.4
 * and 5.2.8). Holds scratch buffers: one instance per thread.
 */
final class NullSpace9 {

    private final double[][] rows = new double[5][9];
    private final int[] column = new int[9];

    /**
     * Fills {@code basis[0..3]} with an orthonormal basis of the null space.
     *
     * @return false when the five equations have rank below five (a degenerate sample)
     */
    boolean of(double[] xa, double[] ya, double[] xb, double[] yb, double[][] basis) {
        double scale = 0;
        for (int i = 0; i < 5; i++) {
            double[] r = rows[i];
            r[0] = xb[i] * xa[i];
            r[1] = xb[i] * ya[i];
            r[2] = xb[i];
            r[3] = yb[i] * xa[i];
            r[4] = yb[i] * ya[i];
            r[5] = yb[i];
            r[6] = xa[i];
            r[7] = ya[i];
            r[8] = 1;
            for (double v : r) {
                scale = Math.max(scale, Math.abs(v));
            }
        }
        for (int c = 0; c < 9; c++) {
            column[c] = c;
        }
        for (int k = 0; k < 5; k++) {
            if (!pivot(k, 1e-10 * scale)) {
                return false;
            }
        }
        for (int f = 0; f < 4; f++) {
            double[] v = basis[f];
            Arrays.fill(v, 0);
            v[column[5 + f]] = 1;
            for (int k = 0; k < 5; k++) {
                v[column[k]] = -rows[k][5 + f];
            }
        }
        orthonormalise(basis);
        return true;
    }

    /** Moves the largest remaining entry to (k, k), scales its row to 1 and clears its column elsewhere. */
    private boolean pivot(int k, double tiny) {
        int pr = k;
        int pc = k;
        for (int r = k; r < 5; r++) {
            for (int c = k; c < 9; c++) {
                if (Math.abs(rows[r][c]) > Math.abs(rows[pr][pc])) {
                    pr = r;
                    pc = c;
                }
            }
        }
        if (!(Math.abs(rows[pr][pc]) > tiny)) {
            return false;
        }
        double[] tmp = rows[k];
        rows[k] = rows[pr];
        rows[pr] = tmp;
        if (pc != k) {
            for (double[] r : rows) {
                double t = r[k];
                r[k] = r[pc];
                r[pc] = t;
            }
            int t = column[k];
            column[k] = column[pc];
            column[pc] = t;
        }
        double[] row = rows[k];
        double inv = 1 / row[k];
        for (int c = k; c < 9; c++) {
            row[c] *= inv;
        }
        for (int r = 0; r < 5; r++) {
            double f = rows[r][k];
            if (r != k && f != 0) {
                for (int c = k; c < 9; c++) {
                    rows[r][c] -= f * row[c];
                }
            }
        }
        return true;
    }

    private static void orthonormalise(double[][] basis) {
        for (int i = 0; i < 4; i++) {
            double[] v = basis[i];
            for (int j = 0; j < i; j++) {
                double d = Mat3.dot9(v, basis[j]);
                for (int k = 0; k < 9; k++) {
                    v[k] -= d * basis[j][k];
                }
            }
            double inv = 1 / Math.sqrt(Mat3.dot9(v, v));
            for (int k = 0; k < 9; k++) {
                v[k] *= inv;
            }
        }
    }
}
