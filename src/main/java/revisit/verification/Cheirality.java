package revisit.verification;

/**
 * Which side of both cameras a matched point lies on under a pose {@code X_b = R X_a + t}: the depths
 * {@code (la, lb)} of {@code lb x_b = la R x_a + t} are solved in least squares (mid-point triangulation,
 * H&amp;Z 2004 sec. 12.1) and a point is in front when both are positive (the cheirality condition, H&amp;Z ch. 21).
 * Rays closer to parallel than {@code minSinParallax} carry no depth sign (distant points or noise) and are
 * reported as undecided.
 */
final class Cheirality {

    static final int FRONT = 1;
    static final int BEHIND = -1;
    static final int UNDECIDED = 0;

    private Cheirality() {
    }

    /** Side of the point with normalised rays {@code rayA}, {@code rayB} under pose (r, t). */
    static int side(double[] r, double[] t, double[] rayA, double[] rayB, double minSinParallax) {
        double[] a = Mat3.mulVec(r, rayA);
        double aa = Mat3.dot(a, a);
        double bb = Mat3.dot(rayB, rayB);
        double ab = Mat3.dot(a, rayB);
        double det = aa * bb - ab * ab;
        if (det <= minSinParallax * minSinParallax * aa * bb) {
            return UNDECIDED;
        }
        double at = Mat3.dot(a, t);
        double bt = Mat3.dot(rayB, t);
        double la = (ab * bt - at * bb) / det;
        double lb = (aa * bt - ab * at) / det;
        return la > 0 && lb > 0 ? FRONT : BEHIND;
    }

    /** Points in front minus points behind, over the first {@code count} indices. */
    static int net(PointPairs p, int[] idx, int count, double[] r, double[] t, double minSinParallax) {
        int net = 0;
        for (int n = 0; n < count; n++) {
            net += side(r, t, p.rayA(idx[n]), p.rayB(idx[n]), minSinParallax);
        }
        return net;
    }

    /** Smallest parallax sine that decides a depth sign: two noise sigmas over the focal length. */
    static double minSinParallax(PointPairs p, VerificationConfig config) {
        return 2 * config.noiseSigmaPx() / p.focalPx();
    }
}
