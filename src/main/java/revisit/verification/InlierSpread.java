package revisit.verification;

/**
 * Rejects inlier sets that do not span two dimensions of the image: points that coincide or lie along one line
 * satisfy every two-view model (H&amp;Z 2004 sec. 11.9 and 4.1.3 on degenerate configurations), so a fit to them
 * proves nothing. The test is on the smaller principal standard deviation of the inlier positions in each image.
 */
final class InlierSpread {

    /**
     * Smallest accepted principal standard deviation, in units of the inlier cut: 5 cuts (10 px by default) is far
     * above the noise of a line of points and far below the spread of any real view overlap (common practice).
     */
    private static final double MIN_SPREAD_CUTS = 5;

    private InlierSpread() {
    }

    /** True when the inliers spread over at least the minimum in both images. */
    static boolean sufficient(PointPairs p, int[] inliers, VerificationConfig config) {
        double min = MIN_SPREAD_CUTS * config.inlierThresholdPx();
        return smallerDeviation(p.xa, p.ya, inliers) >= min && smallerDeviation(p.xb, p.yb, inliers) >= min;
    }

    /** Square root of the smaller eigenvalue of the 2x2 covariance of the selected points, pixels. */
    static double smallerDeviation(double[] x, double[] y, int[] idx) {
        if (idx.length < 2) {
            return 0;
        }
        double mx = 0;
        double my = 0;
        for (int i : idx) {
            mx += x[i];
            my += y[i];
        }
        mx /= idx.length;
        my /= idx.length;
        double sxx = 0;
        double syy = 0;
        double sxy = 0;
        for (int i : idx) {
            double dx = x[i] - mx;
            double dy = y[i] - my;
            sxx += dx * dx;
            syy += dy * dy;
            sxy += dx * dy;
        }
        sxx /= idx.length;
        syy /= idx.length;
        sxy /= idx.length;
        double half = 0.5 * (sxx + syy);
        double root = Math.sqrt(Math.max(0, 0.25 * (sxx - syy) * (sxx - syy) + sxy * sxy));
        return Math.sqrt(Math.max(0, half - root));
    }
}
