package revisit.verification;

/**
 * Geometric robust information criterion, GRIC (Torr, "Geometric motion segmentation and model selection",
 * Phil. Trans. R. Soc. A 356, 1998; Torr, Fitzgibbon &amp; Zisserman, IJCV 32(1), 1999, on degeneracy):
 *
 * <pre>GRIC = sum_i min(e_i^2 / sigma^2, lambda3 (r - d)) + lambda1 d n + lambda2 k</pre>
 *
 * with r = 4 (dimension of a point pair), d the dimension of the model's manifold (3 for an epipolar model, 2
 * for a homography or rotation), k its parameter count (essential 5, fundamental 7, homography 8, rotation 3),
 * n the number of matches, lambda1 = ln r, lambda2 = ln(r n) and lambda3 = 2 (the values of those papers). The
 * model with the lower value explains the matches with the better trade of fit against complexity: a pure
 * rotation or a plane makes the epipolar model degenerate, and there the homography or rotation wins.
 */
final class ModelSelection {

    /** Manifold dimension and parameter count of a candidate model. */
    enum Candidate {
        ESSENTIAL(3, 5), FUNDAMENTAL(3, 7), HOMOGRAPHY(2, 8), ROTATION(2, 3);

        final int dimension;
        final int parameters;

        Candidate(int dimension, int parameters) {
            this.dimension = dimension;
            this.parameters = parameters;
        }
    }

    private static final int DATA_DIMENSION = 4;
    private static final double LAMBDA3 = 2;

    private ModelSelection() {
    }

    /**
     * GRIC of a model.
     *
     * @param squaredErrorsPx squared Sampson distances of all matches, pixels squared
     * @param n               number of matches
     * @param sigmaPx         pixel noise standard deviation, pixels
     */
    static double gric(Candidate model, double[] squaredErrorsPx, int n, double sigmaPx) {
        double cap = LAMBDA3 * (DATA_DIMENSION - model.dimension);
        double inv = 1 / (sigmaPx * sigmaPx);
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double e = squaredErrorsPx[i] * inv;
            sum += Double.isNaN(e) ? cap : Math.min(e, cap);
        }
        double lambda1 = Math.log(DATA_DIMENSION);
        double lambda2 = Math.log((double) DATA_DIMENSION * n);
        return sum + lambda1 * model.dimension * n + lambda2 * model.parameters;
    }
}
