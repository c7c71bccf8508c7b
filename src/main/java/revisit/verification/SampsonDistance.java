package revisit.verification;

/**
 * First-order geometric (Sampson) distances of a point pair to a two-view relation, in the units of the
 * coordinates (pixels when given pixels).
 *
 * <p>For a relation {@code g(X) = 0} on the joint point {@code X = (xa, ya, xb, yb)} the Sampson distance is
 * {@code d^2 = g^T (J J^T)^-1 g} with {@code J = dg/dX}: the squared distance from X to the first-order
 * approximation of the variety (Sampson 1982; Hartley &amp; Zisserman, Multiple View Geometry, 2nd ed. 2004,
 * sec. 4.2.6 and eq. 11.9). It approximates the squared total displacement of both points that the optimal
 * (gold standard) correction needs, so with isotropic pixel noise sigma in both images it follows
 * sigma^2 chi^2 with one degree of freedom for the epipolar constraint and two for a homography (H&amp;Z Table 4.2).
 *
 * <p>The fundamental matrix maps frame a to frame b: {@code xb^T F xa = 0}. A homography maps a to b:
 * {@code xb ~ H xa}. Matrices are row-major {@code double[9]}.
 */
public final class SampsonDistance {

    private SampsonDistance() {
    }

    /**
     * Signed Sampson distance to the epipolar constraint: {@code e / sqrt(|(F xa)_12|^2 + |(F^T xb)_12|^2)}
     * with {@code e = xb^T F xa}. Its square is the Sampson distance squared.
     *
     * @return signed distance in coordinate units; {@code +-Infinity} or NaN only for a zero gradient, which a
     *         rank-2 F gives at the epipoles
     */
    public static double signedFundamental(double[] f, double xa, double ya, double xb, double yb) {
        double l0 = f[0] * xa + f[1] * ya + f[2];
        double l1 = f[3] * xa + f[4] * ya + f[5];
        double l2 = f[6] * xa + f[7] * ya + f[8];
        double m0 = f[0] * xb + f[3] * yb + f[6];
        double m1 = f[1] * xb + f[4] * yb + f[7];
        double e = xb * l0 + yb * l1 + l2;
        return e / Math.sqrt(l0 * l0 + l1 * l1 + m0 * m0 + m1 * m1);
    }

    /** Squared Sampson distance to the epipolar constraint {@code xb^T F xa = 0}, coordinate units squared. */
    public static double squaredFundamental(double[] f, double xa, double ya, double xb, double yb) {
        double l0 = f[0] * xa + f[1] * ya + f[2];
        double l1 = f[3] * xa + f[4] * ya + f[5];
        double l2 = f[6] * xa + f[7] * ya + f[8];
        double m0 = f[0] * xb + f[3] * yb + f[6];
        double m1 = f[1] * xb + f[4] * yb + f[7];
        double e = xb * l0 + yb * l1 + l2;
        double g = l0 * l0 + l1 * l1 + m0 * m0 + m1 * m1;
        return g > 0 ? e * e / g : Double.POSITIVE_INFINITY;
    }

    /**
     * Squared Sampson distance to the homography {@code xb ~ H xa}, using the two independent rows of the
     * DLT equations (H&amp;Z eq. 4.3 with w' = 1) as the relation.
     *
     * @return squared distance in coordinate units squared; +Infinity when the point maps to infinity
     */
    public static double squaredHomography(double[] h, double xa, double ya, double xb, double yb) {
        double p = h[0] * xa + h[1] * ya + h[2];
        double q = h[3] * xa + h[4] * ya + h[5];
        double w = h[6] * xa + h[7] * ya + h[8];
        double e1 = -q + yb * w;
        double e2 = p - xb * w;
        double j11 = -h[3] + yb * h[6];
        double j12 = -h[4] + yb * h[7];
        double j21 = h[0] - xb * h[6];
        double j22 = h[1] - xb * h[7];
        double a = j11 * j11 + j12 * j12 + w * w;
        double c = j21 * j21 + j22 * j22 + w * w;
        double b = j11 * j21 + j12 * j22;
        double det = a * c - b * b;
        if (!(det > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return (c * e1 * e1 - 2 * b * e1 * e2 + a * e2 * e2) / det;
    }
}
