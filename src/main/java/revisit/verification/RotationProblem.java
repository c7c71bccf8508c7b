package revisit.verification;

import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.SingularOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;

/**
 * Pure-rotation refinement: residuals are the image transfer errors (two per inlier, detection-level pixels) of
 * {@code x_b ~ K R K^-1 x_a}, the infinite homography of H&amp;Z 2004 sec. 8.4.5. State is R row-major; the step
 * is dtheta with {@code R <- exp([dtheta]x) R}.
 */
final class RotationProblem implements LevenbergMarquardt.Problem {

    private final PointPairs points;
    private final int[] inliers;

    RotationProblem(PointPairs points, int[] inliers) {
        this.points = points;
        this.inliers = inliers;
    }

    /** The homography of undistorted pixels induced by rotation {@code r}: {@code K R K^-1}. */
    double[] homography(double[] r) {
        return Mat3.mul(points.k, Mat3.mul(r, points.kInverse));
    }

    @Override
    public int parameterCount() {
        return 3;
    }

    @Override
    public int residualCount() {
        return 2 * inliers.length;
    }

    @Override
    public void residuals(double[] state, double[] out) {
        double[] h = homography(state);
        for (int n = 0; n < inliers.length; n++) {
            int i = inliers[n];
            double xa = points.xa[i];
            double ya = points.ya[i];
            double w = h[6] * xa + h[7] * ya + h[8];
            double sw = Math.sqrt(points.weight[i]);
            out[2 * n] = sw * ((h[0] * xa + h[1] * ya + h[2]) / w - points.xb[i]);
            out[2 * n + 1] = sw * ((h[3] * xa + h[4] * ya + h[5]) / w - points.yb[i]);
        }
    }

    @Override
    public double[] retract(double[] state, double[] delta) {
        return Mat3.mul(Mat3.exp(delta), state);
    }

    /**
     * Rotation that best aligns the rays of the given inliers, {@code argmin sum |b_i - R a_i|^2} over unit rays
     * (Kabsch, Acta Cryst. A32, 1976), by SVD of {@code sum b_i a_i^T}; empty if the SVD fails.
     */
    Optional<double[]> alignRays() {
        DMatrixRMaj m = new DMatrixRMaj(3, 3);
        for (int i : inliers) {
            double[] a = Mat3.unit(points.rayA(i));
            double[] b = Mat3.unit(points.rayB(i));
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    m.add(r, c, b[r] * a[c]);
                }
            }
        }
        SingularValueDecomposition_F64<DMatrixRMaj> svd = DecompositionFactory_DDRM.svd(3, 3, true, true, false);
        if (!svd.decompose(m)) {
            return Optional.empty();
        }
        DMatrixRMaj u = svd.getU(null, false);
        DMatrixRMaj v = svd.getV(null, false);
        DMatrixRMaj w = svd.getW(null);
        SingularOps_DDRM.descendingOrder(u, false, w, v, false);
        DMatrixRMaj r = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.multTransB(u, v, r);
        if (CommonOps_DDRM.det(r) < 0) {
            for (int k = 0; k < 3; k++) {
                v.set(k, 2, -v.get(k, 2));
            }
            CommonOps_DDRM.multTransB(u, v, r);
        }
        return Optional.of(r.data.clone());
    }
}
