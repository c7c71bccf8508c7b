package revisit.verification;

import java.util.Arrays;
import java.util.List;

/**
 * Five-point relative orientation: every essential matrix E with {@code xb^T E xa = 0} for five correspondences
 * in normalised coordinates (Nistér, "An efficient solution to the five-point relative pose problem", IEEE PAMI
 * 26(6), 2004). E lies in the four-dimensional null space of the five epipolar equations,
 * {@code E = x X + y Y + z Z + W}; the cubic constraints {@code det E = 0} and {@code 2 E E^T E - tr(E E^T) E = 0}
 * give ten equations in the twenty monomials of degree up to three in x, y, z. Gauss-Jordan elimination of the
 * first ten monomials leaves a 3x3 matrix B(z) acting on (x, y, 1) whose determinant is a degree-10 polynomial in z;
 * its real roots ({@link SturmRoots}) give up to ten solutions.
 *
 * <p>Written here rather than calling BoofCV's solver: BoofCV 1.1.7 builds its equations in four generated methods
 * of 16-18 kB of bytecode each, above HotSpot's 8000-byte limit for JIT compilation, so they run interpreted; in
 * VerificationCpuTime they made a five-point sample cost about 100 us. The equations here come from a small
 * polynomial product table instead. Holds scratch buffers: one instance per thread.
 */
final class FivePointEssential {

    /** Exponents (x, y, z) of the monomials in Nistér's order: the first ten are eliminated. */
    private static final int[][] EXPONENTS = {
            {3, 0, 0}, {0, 3, 0}, {2, 1, 0}, {1, 2, 0}, {2, 0, 1}, {2, 0, 0}, {0, 2, 1}, {0, 2, 0}, {1, 1, 1},
            {1, 1, 0}, {1, 0, 2}, {1, 0, 1}, {1, 0, 0}, {0, 1, 2}, {0, 1, 1}, {0, 1, 0}, {0, 0, 3}, {0, 0, 2},
            {0, 0, 1}, {0, 0, 0}};
    private static final int MONOMIALS = EXPONENTS.length;
    private static final int[] LINEAR = {12, 15, 18, 19};
    private static final int[] QUADRATIC = {5, 7, 9, 11, 12, 14, 15, 17, 18, 19};
    /** Index of the product of two monomials, or -1 above degree three. */
    private static final int[][] PRODUCT = productTable();
    /** Per monomial of degree up to two, the indices of its products with x, y, z and 1 (monomials 12, 15, 18, 19). */
    private static final int[][] TIMES_LINEAR = timesLinear();

    private final double[][] basis = new double[4][9];
    private final double[][] entries = new double[9][MONOMIALS];
    private final double[][] gram = new double[9][MONOMIALS];
    private final double[][] equations = new double[10][MONOMIALS];
    private final double[][][] b = new double[3][3][5];
    private final double[] trace = new double[MONOMIALS];
    private final double[] minor = new double[MONOMIALS];
    private final double[][] numeric = new double[3][3];
    private final SturmRoots roots = new SturmRoots();
    private final double[] determinant = new double[13];
    private final NullSpace9 nullSpace = new NullSpace9();

    /**
     * Adds to {@code out} each essential matrix (row-major, unit Frobenius norm) through the five correspondences.
     *
     * @param xa x of the points in view a, normalised coordinates; likewise ya, xb, yb
     * @return number of matrices added (0 for a degenerate sample)
     */
    int solve(double[] xa, double[] ya, double[] xb, double[] yb, List<double[]> out) {
        if (!nullSpace.of(xa, ya, xb, yb, basis)) {
            return 0;
        }
        buildEquations();
        if (!eliminate()) {
            return 0;
        }
        buildDeterminant();
        int count = roots.solve(determinant, 10);
        double[] z = roots.roots();
        int found = 0;
        for (int r = 0; r < count; r++) {
            found += addSolution(z[r], out) ? 1 : 0;
        }
        return found;
    }

    /** The nine entries of E as linear polynomials, their products, and the ten cubic constraints. */
    private void buildEquations() {
        for (int k = 0; k < 9; k++) {
            Arrays.fill(entries[k], 0);
            entries[k][12] = basis[0][k];
            entries[k][15] = basis[1][k];
            entries[k][18] = basis[2][k];
            entries[k][19] = basis[3][k];
        }
        for (int i = 0; i < 3; i++) {
            for (int j = i; j < 3; j++) {
                double[] g = gram[3 * i + j];
                Arrays.fill(g, 0);
                for (int k = 0; k < 3; k++) {
                    multiplyAdd(entries[3 * i + k], LINEAR, entries[3 * j + k], 1, g);
                }
                gram[3 * j + i] = g;
            }
        }
        for (int m = 0; m < MONOMIALS; m++) {
            trace[m] = gram[0][m] + gram[4][m] + gram[8][m];
        }
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double[] row = equations[3 * i + j];
                Arrays.fill(row, 0);
                for (int k = 0; k < 3; k++) {
                    multiplyAdd(gram[3 * i + k], QUADRATIC, entries[3 * k + j], 2, row);
                }
                multiplyAdd(trace, QUADRATIC, entries[3 * i + j], -1, row);
            }
        }
        double[] det = equations[9];
        Arrays.fill(det, 0);
        cofactorTerm(0, 4, 8, 5, 7, 1, det);
        cofactorTerm(1, 3, 8, 5, 6, -1, det);
        cofactorTerm(2, 3, 7, 4, 6, 1, det);
    }

    /** Adds {@code sign e_a (e_b e_c - e_d e_e)} to {@code out}. */
    private void cofactorTerm(int a, int b1, int c, int d, int e, double sign, double[] out) {
        Arrays.fill(minor, 0);
        multiplyAdd(entries[b1], LINEAR, entries[c], 1, minor);
        multiplyAdd(entries[d], LINEAR, entries[e], -1, minor);
        multiplyAdd(minor, QUADRATIC, entries[a], sign, out);
    }

    /**
     * {@code out += scale * p * linear} for p supported on {@code support} and a linear polynomial. Unrolled over
     * the four linear terms: the loop over LINEAR with a PRODUCT lookup was 19% of a five-point sample in a JFR
     * profile.
     */
    private static void multiplyAdd(double[] p, int[] support, double[] linear, double scale, double[] out) {
        double lx = scale * linear[12];
        double ly = scale * linear[15];
        double lz = scale * linear[18];
        double l1 = scale * linear[19];
        for (int i : support) {
            double pi = p[i];
            int[] to = TIMES_LINEAR[i];
            out[to[0]] += pi * lx;
            out[to[1]] += pi * ly;
            out[to[2]] += pi * lz;
            out[to[3]] += pi * l1;
        }
    }

    /**
     * Elimination of the first ten monomials with partial pivoting, leaving rows 4-9 in reduced form (the only
     * rows {@link #buildDeterminant} reads): forward elimination, then back substitution of those rows alone,
     * about two thirds of the work of a full Gauss-Jordan pass (which was 13% of a five-point sample in a JFR
     * profile). False when singular.
     */
    private boolean eliminate() {
        for (int c = 0; c < 10; c++) {
            int pivot = c;
            for (int r = c + 1; r < 10; r++) {
                if (Math.abs(equations[r][c]) > Math.abs(equations[pivot][c])) {
                    pivot = r;
                }
            }
            if (!(Math.abs(equations[pivot][c]) > 1e-12)) {
                return false;
            }
            double[] tmp = equations[c];
            equations[c] = equations[pivot];
            equations[pivot] = tmp;
            double[] row = equations[c];
            double inv = 1 / row[c];
            for (int m = c; m < MONOMIALS; m++) {
                row[m] *= inv;
            }
            for (int r = c + 1; r < 10; r++) {
                subtract(equations[r], equations[r][c], row, c);
            }
        }
        for (int c = 9; c > 4; c--) {
            for (int r = 4; r < c; r++) {
                subtract(equations[r], equations[r][c], equations[c], 10);
            }
        }
        return true;
    }

    /** {@code target -= f * row} over columns from..19 (the entries of row below from are zero). */
    private static void subtract(double[] target, double f, double[] row, int from) {
        if (f != 0) {
            for (int m = from; m < MONOMIALS; m++) {
                target[m] -= f * row[m];
            }
        }
    }

    /**
     * Rows {@code p - z q} for the pairs (x^2 z, x^2), (y^2 z, y^2), (x y z, x y) cancel the eliminated monomials and
     * leave B(z) (x, y, 1)^T = 0, with cubic columns for x and y and a quartic for 1; det B(z) has degree ten.
     */
    private void buildDeterminant() {
        for (int row = 0; row < 3; row++) {
            double[] p = equations[4 + 2 * row];
            double[] q = equations[5 + 2 * row];
            for (int col = 0; col < 2; col++) {
                int o = 10 + 3 * col;
                double[] c = b[row][col];
                c[0] = p[o + 2];
                c[1] = p[o + 1] - q[o + 2];
                c[2] = p[o] - q[o + 1];
                c[3] = -q[o];
                c[4] = 0;
            }
            double[] c = b[row][2];
            c[0] = p[19];
            c[1] = p[18] - q[19];
            c[2] = p[17] - q[18];
            c[3] = p[16] - q[17];
            c[4] = -q[16];
        }
        ZPolynomials.determinant3(b, determinant);
    }

    /** E for one root z: (x, y, 1) spans the null space of B(z). */
    private boolean addSolution(double z, List<double[]> out) {
        double[][] m = numeric;
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                m[r][c] = ZPolynomials.evaluate(b[r][c], z);
            }
        }
        double[] v = Mat3.cross(m[0], m[1]);
        double[] v2 = Mat3.cross(m[0], m[2]);
        double[] v3 = Mat3.cross(m[1], m[2]);
        v = Mat3.norm(v2) > Mat3.norm(v) ? v2 : v;
        v = Mat3.norm(v3) > Mat3.norm(v) ? v3 : v;
        if (!(Math.abs(v[2]) > 1e-12 * Mat3.norm(v))) {
            return false;
        }
        double x = v[0] / v[2];
        double y = v[1] / v[2];
        double[] e = new double[9];
        double sum = 0;
        for (int k = 0; k < 9; k++) {
            e[k] = x * basis[0][k] + y * basis[1][k] + z * basis[2][k] + basis[3][k];
            sum += e[k] * e[k];
        }
        double inv = 1 / Math.sqrt(sum);
        for (int k = 0; k < 9; k++) {
            e[k] *= inv;
        }
        out.add(e);
        return true;
    }

    private static int[][] timesLinear() {
        int[][] table = new int[MONOMIALS][];
        for (int i : QUADRATIC) {
            table[i] = new int[LINEAR.length];
            for (int j = 0; j < LINEAR.length; j++) {
                table[i][j] = PRODUCT[i][LINEAR[j]];
            }
        }
        return table;
    }

    private static int[][] productTable() {
        int[][] table = new int[MONOMIALS][MONOMIALS];
        for (int i = 0; i < MONOMIALS; i++) {
            for (int j = 0; j < MONOMIALS; j++) {
                table[i][j] = -1;
                for (int k = 0; k < MONOMIALS; k++) {
                    boolean same = true;
                    for (int d = 0; d < 3; d++) {
                        same &= EXPONENTS[i][d] + EXPONENTS[j][d] == EXPONENTS[k][d];
                    }
                    if (same) {
                        table[i][j] = k;
                    }
                }
            }
        }
        return table;
    }
}
