package revisit.consistency;

import georegression.struct.se.Se3_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import revisit.verification.MetricPose;

/**
 * A loop-closure constraint as the consistency check reads it: frame B of one sequence revisits the place of
 * frame A, with the relative pose between the two cameras.
 *
 * <p>Pose convention: {@code aFromB} maps points from B's camera coordinates into A's, {@code X_A = R X_B + t}; t is
 * B's camera centre in A's frame. With {@code metric} true, t is in metres. With {@code metric} false (monocular,
 * scale unknown) t is the unit direction towards B's centre, or zero when the direction is unobservable (e.g. a pure
 * rotation); such a closure is checked on rotation only.
 *
 * <p>Information matrix: 6x6, row-major, order (rotation, translation), on the right perturbation
 * {@code aFromB_true = aFromB Exp(xi)}, {@code xi = (omega [rad], v [m, in B's frame])}, as {@link MetricPose}
 * reports it. Metric constraints need it symmetric positive definite; monocular constraints need only the rotation
 * block to be positive definite (the direction's uncertainty comes from {@link ConsistencyConfig#directionSigmaRad()}).
 *
 * @param id          unique name of the closure within a check
 * @param a           the earlier (or reference) frame
 * @param b           the revisiting frame
 * @param aFromB      relative pose (copied in and out)
 * @param information 6x6 information, row-major, (rotation, translation) (copied)
 * @param metric      true when the translation has metric scale
 * @param inlierCount geometric inliers that support the pose, >= 0
 * @param inlierRatio inliers over tested matches, in [0, 1]
 */
public record ClosureConstraint(String id, FrameRef a, FrameRef b, Se3_F64 aFromB, double[] information,
                                boolean metric, int inlierCount, double inlierRatio) {

    private static final double SYMMETRY_TOLERANCE = 1e-9;
    private static final double UNIT_TOLERANCE = 1e-6;

    public ClosureConstraint {
        if (id == null || id.isBlank() || a == null || b == null || aFromB == null || information == null) {
            throw new IllegalArgumentException("closure id, ends, pose and information must be given");
        }
        if (information.length != 36) {
            throw new IllegalArgumentException("closure " + id + ": information must hold 36 values, held "
                    + information.length);
        }
        if (inlierCount < 0 || !(inlierRatio >= 0 && inlierRatio <= 1)) {
            throw new IllegalArgumentException("closure " + id + ": inlier count must be >= 0 and ratio in [0, 1], were "
                    + inlierCount + ", " + inlierRatio);
        }
        aFromB = aFromB.copy();
        information = information.clone();
        checkPose(id, aFromB, metric);
        checkInformation(id, information, metric);
    }

    /**
     * A metric closure from a depth-based estimate.
     *
     * @param id   unique name
     * @param a    frame A
     * @param b    frame B
     * @param pose estimate from {@link revisit.verification.MetricPoseEstimator}
     */
    public static ClosureConstraint fromMetricPose(String id, FrameRef a, FrameRef b, MetricPose pose) {
        return new ClosureConstraint(id, a, b, pose.aFromB(), pose.information(), true, pose.inlierCount(),
                pose.inlierRatio());
    }

    /**
     * Swaps the two 3x3 diagonal blocks and the off-diagonal blocks of a 6x6 information matrix, converting between
     * the (rotation, translation) order used here and the (translation, rotation) order of pose-graph edge files. It
     * is its own inverse.
     *
     * @param information 6x6 row-major; not modified
     * @return the reordered copy
     */
    public static double[] swapRotationAndTranslation(double[] information) {
        if (information.length != 36) {
            throw new IllegalArgumentException("information must hold 36 values, held " + information.length);
        }
        double[] out = new double[36];
        for (int r = 0; r < 6; r++) {
            for (int c = 0; c < 6; c++) {
                out[6 * ((r + 3) % 6) + (c + 3) % 6] = information[6 * r + c];
            }
        }
        return out;
    }

    /** True for a monocular closure whose direction is unobservable (zero translation). */
    public boolean hasNoDirection() {
        return !metric && aFromB.T.norm() == 0;
    }

    @Override
    public Se3_F64 aFromB() {
        return aFromB.copy();
    }

    @Override
    public double[] information() {
        return information.clone();
    }

    /**
     * The same closure seen from B: ends swapped, pose inverted. A metric information matrix is carried by the
     * adjoint ({@code I' = Ad^-T I Ad^-1}, see {@link UncertainPose}); for a monocular closure, whose translation
     * block is unused, the rotation and translation blocks are each rotated by R and the cross blocks dropped.
     */
    public ClosureConstraint reversed() {
        if (!metric) {
            return new ClosureConstraint(id, b, a, aFromB.invert(null), rotatedBlocks(), false, inlierCount,
                    inlierRatio);
        }
        DMatrixRMaj ad = UncertainPose.adjoint(aFromB);
        DMatrixRMaj adInv = new DMatrixRMaj(6, 6);
        CommonOps_DDRM.invert(ad, adInv);
        DMatrixRMaj info = new DMatrixRMaj(6, 6, true, information);
        DMatrixRMaj tmp = new DMatrixRMaj(6, 6);
        CommonOps_DDRM.multTransA(adInv, info, tmp);
        DMatrixRMaj carried = new DMatrixRMaj(6, 6);
        CommonOps_DDRM.mult(tmp, adInv, carried);
        symmetrise(carried);
        return new ClosureConstraint(id, b, a, aFromB.invert(null), carried.data, metric, inlierCount, inlierRatio);
    }

    private double[] rotatedBlocks() {
        DMatrixRMaj full = new DMatrixRMaj(6, 6, true, information);
        DMatrixRMaj out = new DMatrixRMaj(6, 6);
        for (int block = 0; block < 6; block += 3) {
            DMatrixRMaj rotated = UncertainPose.sandwich(aFromB.R, CommonOps_DDRM.extract(full, block, block + 3,
                    block, block + 3));
            symmetrise(rotated);
            CommonOps_DDRM.insert(rotated, out, block, block);
        }
        return out.data;
    }

    private static void checkPose(String id, Se3_F64 pose, boolean metric) {
        for (double v : pose.R.data) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("closure " + id + ": rotation must be finite");
            }
        }
        double det = CommonOps_DDRM.det(pose.R);
        if (Math.abs(det - 1) > 1e-6) {
            throw new IllegalArgumentException("closure " + id + ": rotation determinant " + det + ", expected 1");
        }
        double norm = pose.T.norm();
        if (!Double.isFinite(norm)) {
            throw new IllegalArgumentException("closure " + id + ": translation must be finite");
        }
        if (!metric && Math.abs(norm - 1) > UNIT_TOLERANCE && norm != 0) {
            throw new IllegalArgumentException("closure " + id + ": monocular translation must be a unit direction (or "
                    + "zero when unobservable), norm was " + norm);
        }
    }

    private static void checkInformation(String id, double[] information, boolean metric) {
        for (int r = 0; r < 6; r++) {
            for (int c = 0; c < 6; c++) {
                double v = information[6 * r + c];
                double w = information[6 * c + r];
                if (!Double.isFinite(v) || Math.abs(v - w) > SYMMETRY_TOLERANCE * Math.max(1, Math.abs(v))) {
                    throw new IllegalArgumentException("closure " + id + ": information must be finite and symmetric");
                }
            }
        }
        DMatrixRMaj full = new DMatrixRMaj(6, 6, true, information);
        DMatrixRMaj checked = metric ? full : CommonOps_DDRM.extract(full, 0, 3, 0, 3);
        if (!LinearSolverFactory_DDRM.chol(checked.numRows).setA(checked.copy())) {
            throw new IllegalArgumentException("closure " + id + ": information " + (metric ? "" : "rotation block ")
                    + "must be positive definite");
        }
    }

    static void symmetrise(DMatrixRMaj m) {
        for (int r = 0; r < m.numRows; r++) {
            for (int c = r + 1; c < m.numCols; c++) {
                double mean = 0.5 * (m.get(r, c) + m.get(c, r));
                m.set(r, c, mean);
                m.set(c, r, mean);
            }
        }
    }
}
