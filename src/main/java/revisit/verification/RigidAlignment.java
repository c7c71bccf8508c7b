package revisit.verification;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.se.Se3_F64;
import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.SingularOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;

/**
 * Closed-form least-squares rigid alignment of two corresponding 3D point sets: the rotation R and translation t
 * minimising {@code sum_i |d_i - (R s_i + t)|^2}.
 *
 * <p>Both solutions first remove the centroids, so {@code t = mean(d) - R mean(s)}, and build the cross-covariance
 * of the centred points.
 * <ul>
 * <li>{@link #umeyama}: Umeyama, "Least-squares estimation of transformation parameters between two point
 * patterns", IEEE TPAMI 13(4), 1991. With {@code C = sum (d - mean d)(s - mean s)^T = U D V^T},
 * {@code R = U S V^T} where {@code S = diag(1, 1, sign(det U det V))} keeps R a proper rotation.</li>
 * <li>{@link #horn}: Horn, "Closed-form solution of absolute orientation using unit quaternions", JOSA A 4(4),
 * 1987. With {@code S_ab = sum (s - mean s)_a (d - mean d)_b}, the unit quaternion of R is the eigenvector of the
 * largest eigenvalue of the symmetric 4x4 matrix N built from the S_ab (Horn's eq. for N, section 4).</li>
 * </ul>
 * Point sets whose centred spread has rank below 2 (all points on a line, or coincident) do not fix the rotation;
 * both methods then return an empty Optional. Points are packed {@code x0, y0, z0, x1, ...}.
 *
 * <p>Not thread-safe: holds reusable decompositions. Use one instance per thread.
 */
public final class RigidAlignment {

    /** Relative size of the second singular value (or eigenvalue gap) below which the fit is degenerate. */
    private static final double DEGENERATE = 1e-10;

    private final SingularValueDecomposition_F64<DMatrixRMaj> svd = DecompositionFactory_DDRM.svd(3, 3, true, true, false);
    private final EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(4, true, true);
    private final double[] meanS = new double[3];
    private final double[] meanD = new double[3];
    private final DMatrixRMaj cross = new DMatrixRMaj(3, 3);

    /** Aligns all points; see {@link #umeyama(double[], double[], int[], int)}. */
    public Optional<Se3_F64> umeyama(double[] source, double[] target) {
        return umeyama(source, target, allIndices(source, target), source.length / 3);
    }

    /** Aligns all points; see {@link #horn(double[], double[], int[], int)}. */
    public Optional<Se3_F64> horn(double[] source, double[] target) {
        return horn(source, target, allIndices(source, target), source.length / 3);
    }

    /**
     * Umeyama's SVD solution.
     *
     * @param source  packed source points s_i; not modified
     * @param target  packed target points d_i; not modified
     * @param indices which points to use (first {@code count} entries); not modified
     * @param count   number of points used, >= 3
     * @return the transform with {@code d = R s + t}, or empty when the points do not fix a rotation
     */
    public Optional<Se3_F64> umeyama(double[] source, double[] target, int[] indices, int count) {
        if (count < 3 || !crossCovariance(source, target, indices, count)) {
            return Optional.empty();
        }
        DMatrixRMaj targetBySource = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.transpose(cross, targetBySource);
        if (!svd.decompose(targetBySource)) {
            return Optional.empty();
        }
        DMatrixRMaj u = svd.getU(null, false);
        DMatrixRMaj v = svd.getV(null, false);
        DMatrixRMaj w = svd.getW(null);
        SingularOps_DDRM.descendingOrder(u, false, w, v, false);
        if (w.get(1, 1) <= DEGENERATE * w.get(0, 0)) {
            return Optional.empty();
        }
        double sign = Math.signum(CommonOps_DDRM.det(u) * CommonOps_DDRM.det(v));
        for (int row = 0; row < 3; row++) {
            u.set(row, 2, u.get(row, 2) * sign);
        }
        Se3_F64 result = new Se3_F64();
        CommonOps_DDRM.multTransB(u, v, result.R);
        return Optional.of(withTranslation(result));
    }

    /**
     * Horn's unit-quaternion solution.
     *
     * @param source  packed source points s_i; not modified
     * @param target  packed target points d_i; not modified
     * @param indices which points to use (first {@code count} entries); not modified
     * @param count   number of points used, >= 3
     * @return the transform with {@code d = R s + t}, or empty when the points do not fix a rotation
     */
    public Optional<Se3_F64> horn(double[] source, double[] target, int[] indices, int count) {
        if (count < 3 || !crossCovariance(source, target, indices, count)) {
            return Optional.empty();
        }
        if (!eig.decompose(hornMatrix())) {
            return Optional.empty();
        }
        int best = -1;
        double largest = Double.NEGATIVE_INFINITY;
        double second = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < eig.getNumberOfEigenvalues(); k++) {
            double value = eig.getEigenvalue(k).real;
            if (value > largest) {
                second = largest;
                largest = value;
                best = k;
            } else if (value > second) {
                second = value;
            }
        }
        double scale = Math.abs(largest) + Math.abs(second);
        if (best < 0 || largest - second <= DEGENERATE * scale) {
            return Optional.empty();
        }
        DMatrixRMaj q = eig.getEigenVector(best);
        double norm = Math.sqrt(q.get(0) * q.get(0) + q.get(1) * q.get(1) + q.get(2) * q.get(2) + q.get(3) * q.get(3));
        Se3_F64 result = new Se3_F64();
        ConvertRotation3D_F64.quaternionToMatrix(q.get(0) / norm, q.get(1) / norm, q.get(2) / norm, q.get(3) / norm,
                result.R);
        return Optional.of(withTranslation(result));
    }

    /** Horn's N: the quaternion q maximising q^T N q is the rotation from source to target. */
    private DMatrixRMaj hornMatrix() {
        double sxx = cross.get(0, 0);
        double sxy = cross.get(0, 1);
        double sxz = cross.get(0, 2);
        double syx = cross.get(1, 0);
        double syy = cross.get(1, 1);
        double syz = cross.get(1, 2);
        double szx = cross.get(2, 0);
        double szy = cross.get(2, 1);
        double szz = cross.get(2, 2);
        return new DMatrixRMaj(4, 4, true,
                sxx + syy + szz, syz - szy, szx - sxz, sxy - syx,
                syz - szy, sxx - syy - szz, sxy + syx, szx + sxz,
                szx - sxz, sxy + syx, -sxx + syy - szz, syz + szy,
                sxy - syx, szx + sxz, syz + szy, -sxx - syy + szz);
    }

    /** Centroids and cross = sum (s - mean s)(d - mean d)^T; false if any coordinate is not finite. */
    private boolean crossCovariance(double[] source, double[] target, int[] indices, int count) {
        for (int a = 0; a < 3; a++) {
            meanS[a] = 0;
            meanD[a] = 0;
        }
        for (int k = 0; k < count; k++) {
            int i = 3 * indices[k];
            for (int a = 0; a < 3; a++) {
                meanS[a] += source[i + a] / count;
                meanD[a] += target[i + a] / count;
            }
        }
        cross.zero();
        for (int k = 0; k < count; k++) {
            int i = 3 * indices[k];
            for (int a = 0; a < 3; a++) {
                double s = source[i + a] - meanS[a];
                for (int b = 0; b < 3; b++) {
                    cross.data[3 * a + b] += s * (target[i + b] - meanD[b]);
                }
            }
        }
        for (double value : cross.data) {
            if (!Double.isFinite(value)) {
                return false;
            }
        }
        return true;
    }

    private Se3_F64 withTranslation(Se3_F64 result) {
        var r = result.R;
        result.T.setTo(
                meanD[0] - (r.get(0, 0) * meanS[0] + r.get(0, 1) * meanS[1] + r.get(0, 2) * meanS[2]),
                meanD[1] - (r.get(1, 0) * meanS[0] + r.get(1, 1) * meanS[1] + r.get(1, 2) * meanS[2]),
                meanD[2] - (r.get(2, 0) * meanS[0] + r.get(2, 1) * meanS[1] + r.get(2, 2) * meanS[2]));
        return result;
    }

    private static int[] allIndices(double[] source, double[] target) {
        if (source.length != target.length || source.length % 3 != 0) {
            throw new IllegalArgumentException("point arrays must hold the same number of packed xyz triples, were "
                    + source.length + " and " + target.length + " values");
        }
        int[] indices = new int[source.length / 3];
        for (int i = 0; i < indices.length; i++) {
            indices[i] = i;
        }
        return indices;
    }
}
