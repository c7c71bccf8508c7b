package revisit.verification;

import java.util.Arrays;

/** Small dense polynomials in one variable, coefficients in ascending powers. */
final class ZPolynomials {

    private ZPolynomials() {
    }

    /** Value at z (Horner's rule). */
    static double evaluate(double[] c, double z) {
        double v = 0;
        for (int k = c.length - 1; k >= 0; k--) {
            v = v * z + c[k];
        }
        return v;
    }

    /** Value at z of the polynomial of the given degree held in the first degree + 1 entries of c. */
    static double evaluate(double[] c, int degree, double z) {
        double v = 0;
        for (int k = degree; k >= 0; k--) {
            v = v * z + c[k];
        }
        return v;
    }

    /** {@code out += sign * a * b}; out must hold a.length + b.length - 1 coefficients. */
    static void multiplyAdd(double[] a, double[] b, double sign, double[] out) {
        for (int i = 0; i < a.length; i++) {
            double ai = sign * a[i];
            if (ai != 0) {
                for (int j = 0; j < b.length; j++) {
                    out[i + j] += ai * b[j];
                }
            }
        }
    }

    /**
     * Determinant of a 3x3 matrix of polynomials of length L each, by cofactors along the first row.
     *
     * @param out receives 3L - 2 coefficients (overwritten)
     */
    static void determinant3(double[][][] m, double[] out) {
        Arrays.fill(out, 0);
        int len = m[0][0].length;
        double[] minor = new double[2 * len - 1];
        int[][] cols = {{1, 2}, {0, 2}, {0, 1}};
        for (int c = 0; c < 3; c++) {
            Arrays.fill(minor, 0);
            multiplyAdd(m[1][cols[c][0]], m[2][cols[c][1]], 1, minor);
            multiplyAdd(m[1][cols[c][1]], m[2][cols[c][0]], -1, minor);
            multiplyAdd(m[0][c], minor, c == 1 ? -1 : 1, out);
        }
    }
}
