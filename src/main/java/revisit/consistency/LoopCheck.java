package revisit.consistency;

import georegression.struct.se.Se3_F64;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.Map;
import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import revisit.verification.ChiSquareQuantile;
import revisit.verification.RotationVector;

/**
 * Tests two closures i and j that join the same two stretches of trajectory (documented in docs/CONSISTENCY.md).
 *
 * <p>With {@code C_i = T(a_i, b_i)}, {@code C_j = T(a_j, b_j)}, odometry {@code O1 = T(a_j, a_i)} along the first
 * stretch and {@code O2 = T(b_i, b_j)} along the second, the loop {@code E = C_i O2 C_j^-1 O1} is the identity for
 * two correct closures. Its error {@code e = (log R_E, t_E)} and first-order covariance (see {@link UncertainPose})
 * give {@code d^2 = e^T Sigma_E^-1 e}, compared with the chi-square quantile at the configured level.
 * <ul>
 * <li>Both metric: 6 degrees of freedom.</li>
 * <li>One monocular: the rotation part of E (3 dof; it does not depend on scale) plus the angle between the
 * monocular closure's measured direction and the translation predicted for it from the metric closure and the
 * odometry (2 dof), the angle scaled by its sigma {@code sqrt(sigma_perp^2 / |p|^2 + directionSigma^2)}.</li>
 * <li>Both monocular: as above, with the unknown length s of one closure's translation chosen to minimise the
 * angle statistic over s >= 0 (closed-form best angle plus a logarithmic grid), so 1 dof for the direction.</li>
 * <li>A monocular closure without a direction (zero translation): rotation part only, 3 dof.</li>
 * </ul>
 * Not thread-safe: caches reversed closures and closure covariances by closure id (ids are unique within a check).
 */
final class LoopCheck {

    private static final double TINY_SIGMA = 1e-9;

    private final StretchMotion stretches;
    private final ConsistencyConfig config;
    private final double[] gates = new double[7];
    private final Map<String, ClosureConstraint> reversedById = new HashMap<>();
    private final Map<ClosureConstraint, UncertainPose> metricPoses = new IdentityHashMap<>();

    LoopCheck(StretchMotion stretches, ConsistencyConfig config) {
        this.stretches = stretches;
        this.config = config;
        for (int dof = 1; dof <= 6; dof++) {
            gates[dof] = ChiSquareQuantile.quantile(dof, config.confidenceLevel());
        }
    }

    PairOutcome test(ClosureConstraint i, ClosureConstraint second) {
        Optional<Boolean> reverse = orientation(i, second);
        if (reverse.isEmpty()) {
            return PairOutcome.untested(i.id(), second.id(), UncheckedReason.NO_PARTNER);
        }
        ClosureConstraint j = reverse.get()
                ? reversedById.computeIfAbsent(second.id(), id -> second.reversed()) : second;
        StretchMotion.Stretch first = stretches.between(j.a(), i.a());
        StretchMotion.Stretch other = stretches.between(i.b(), j.b());
        if (first.motion().isEmpty() || other.motion().isEmpty()) {
            UncheckedReason reason = first.motion().isEmpty() ? first.reason() : other.reason();
            return PairOutcome.untested(i.id(), j.id(), reason);
        }
        UncertainPose o1 = first.motion().get();
        UncertainPose o2 = other.motion().get();
        UncertainPose loop = uncertain(i, 1).then(o2).then(uncertain(j, 1).inverse()).then(o1);
        double[] e = error(loop.pose());
        DMatrixRMaj cov = loop.covariance();
        if (i.metric() && j.metric()) {
            return PairOutcome.tested(i.id(), j.id(), mahalanobis(e, cov, 6), 6, gates[6]);
        }
        double rotation = mahalanobis(e, CommonOps_DDRM.extract(cov, 0, 3, 0, 3), 3);
        if (i.hasNoDirection() || j.hasNoDirection()) {
            return PairOutcome.tested(i.id(), j.id(), rotation, 3, gates[3]);
        }
        if (i.metric()) {
            double direction = direction(o1.then(uncertain(i, 1)).then(o2), j);
            return PairOutcome.tested(i.id(), j.id(), rotation + direction, 5, gates[5]);
        }
        if (j.metric()) {
            double direction = direction(o1.inverse().then(uncertain(j, 1)).then(o2.inverse()), i);
            return PairOutcome.tested(i.id(), j.id(), rotation + direction, 5, gates[5]);
        }
        return PairOutcome.tested(i.id(), j.id(), rotation + bestOverScale(i, j, o1, o2), 4, gates[4]);
    }

    /**
     * Whether the second closure must be reversed to run between the same sequences as the first; when both
     * orientations fit (closures within one sequence), the one whose ends are closer in time. Empty when the two
     * closures do not join the same pair of sequences.
     */
    static Optional<Boolean> orientation(ClosureConstraint i, ClosureConstraint j) {
        double forward = gap(i, j.a(), j.b());
        double backward = gap(i, j.b(), j.a());
        if (Double.isInfinite(forward) && Double.isInfinite(backward)) {
            return Optional.empty();
        }
        return Optional.of(backward < forward);
    }

    private static double gap(ClosureConstraint i, FrameRef a, FrameRef b) {
        if (!a.sequence().equals(i.a().sequence()) || !b.sequence().equals(i.b().sequence())) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.abs(a.timeSeconds() - i.a().timeSeconds()) + Math.abs(b.timeSeconds() - i.b().timeSeconds());
    }

    /** Minimum of the direction statistic over the unknown length s >= 0 of closure i's translation. */
    private double bestOverScale(ClosureConstraint i, ClosureConstraint j, UncertainPose o1, UncertainPose o2) {
        Se3_F64 zeroLength = o1.then(uncertain(i, 0)).then(o2).pose();
        double[] w = {zeroLength.T.x, zeroLength.T.y, zeroLength.T.z};
        Se3_F64 ci = i.aFromB();
        Se3_F64 first = o1.pose();
        double[] ui = {ci.T.x, ci.T.y, ci.T.z};
        double[] uPrime = new double[3];
        for (int r = 0; r < 3; r++) {
            uPrime[r] = first.R.get(r, 0) * ui[0] + first.R.get(r, 1) * ui[1] + first.R.get(r, 2) * ui[2];
        }
        Se3_F64 cj = j.aFromB();
        double[] uj = {cj.T.x, cj.T.y, cj.T.z};
        double p = dot(w, uj);
        double q = dot(uPrime, uj);
        double a = dot(w, w);
        double b = dot(w, uPrime);
        double best = Double.POSITIVE_INFINITY;
        double sStar = (p * b - q * a) / (q * b - p);
        if (Double.isFinite(sStar) && sStar > 0) {
            best = direction(o1.then(uncertain(i, sStar)).then(o2), j);
        }
        double scale0 = Math.max(Math.sqrt(a), config.minTranslationSigmaMetres());
        for (int k = -8; k <= 12; k++) {
            double s = scale0 * Math.pow(10, k / 4.0);
            best = Math.min(best, direction(o1.then(uncertain(i, s)).then(o2), j));
        }
        return best;
    }

    /** Squared angle between predicted and measured direction over its variance (2-dof statistic). */
    private double direction(UncertainPose predicted, ClosureConstraint measured) {
        Se3_F64 pose = predicted.pose();
        double[] p = {pose.T.x, pose.T.y, pose.T.z};
        double n = Math.sqrt(dot(p, p));
        if (n < 1e-12) {
            return 0;
        }
        DMatrixRMaj sigmaP = UncertainPose.sandwich(pose.R,
                CommonOps_DDRM.extract(predicted.covariance(), 3, 6, 3, 6));
        double[] ph = {p[0] / n, p[1] / n, p[2] / n};
        double along = 0;
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                along += ph[r] * sigmaP.get(r, c) * ph[c];
            }
        }
        double perpendicular = Math.max(0, (CommonOps_DDRM.trace(sigmaP) - along) / 2) / (n * n);
        Se3_F64 m = measured.aFromB();
        double[] u = {m.T.x, m.T.y, m.T.z};
        double[] cross = {ph[1] * u[2] - ph[2] * u[1], ph[2] * u[0] - ph[0] * u[2], ph[0] * u[1] - ph[1] * u[0]};
        double angle = Math.atan2(Math.sqrt(dot(cross, cross)), dot(ph, u));
        double sigma2 = perpendicular + config.directionSigmaRad() * config.directionSigmaRad();
        return angle * angle / sigma2;
    }

    /**
     * A closure as an uncertain pose. Metric: covariance = information^-1. Monocular: translation = scale times the
     * direction; rotation covariance from the rotation block; translation covariance
     * {@code scale^2 directionSigma^2 (I - u u^T)} across the direction u (in B's frame).
     */
    private UncertainPose uncertain(ClosureConstraint c, double scale) {
        if (c.metric()) {
            return metricPoses.computeIfAbsent(c, m -> new UncertainPose(m.aFromB(),
                    inverse(new DMatrixRMaj(6, 6, true, m.information()))));
        }
        DMatrixRMaj info = new DMatrixRMaj(6, 6, true, c.information());
        Se3_F64 pose = c.aFromB();
        DMatrixRMaj cov = new DMatrixRMaj(6, 6);
        CommonOps_DDRM.insert(inverse(CommonOps_DDRM.extract(info, 0, 3, 0, 3)), cov, 0, 0);
        double[] u = new double[3];
        for (int r = 0; r < 3; r++) {
            u[r] = pose.R.get(0, r) * pose.T.x + pose.R.get(1, r) * pose.T.y + pose.R.get(2, r) * pose.T.z;
        }
        double s2 = scale * scale * config.directionSigmaRad() * config.directionSigmaRad();
        for (int r = 0; r < 3; r++) {
            for (int k = 0; k < 3; k++) {
                double value = s2 * ((r == k ? 1 : 0) - u[r] * u[k]) + (r == k ? TINY_SIGMA * TINY_SIGMA : 0);
                cov.set(3 + r, 3 + k, value);
            }
        }
        pose.T.setTo(scale * pose.T.x, scale * pose.T.y, scale * pose.T.z);
        return new UncertainPose(pose, cov);
    }

    /** (log R, t) of a transform: rotation vector first, then translation. */
    static double[] error(Se3_F64 loop) {
        double[] e = new double[6];
        RotationVector.log(loop.R, e);
        e[3] = loop.T.x;
        e[4] = loop.T.y;
        e[5] = loop.T.z;
        return e;
    }

    /** e[0..n)^T cov^-1 e[0..n). */
    static double mahalanobis(double[] e, DMatrixRMaj cov, int n) {
        LinearSolverDense<DMatrixRMaj> solver = LinearSolverFactory_DDRM.symmPosDef(n);
        if (!solver.setA(cov.copy())) {
            throw new IllegalStateException("loop covariance is not positive definite; check the closures' information");
        }
        DMatrixRMaj rhs = new DMatrixRMaj(n, 1);
        System.arraycopy(e, 0, rhs.data, 0, n);
        DMatrixRMaj x = new DMatrixRMaj(n, 1);
        solver.solve(rhs, x);
        double sum = 0;
        for (int k = 0; k < n; k++) {
            sum += e[k] * x.data[k];
        }
        return sum;
    }

    private static DMatrixRMaj inverse(DMatrixRMaj m) {
        DMatrixRMaj out = new DMatrixRMaj(m.numRows, m.numCols);
        if (!CommonOps_DDRM.invert(m.copy(), out)) {
            throw new IllegalStateException("closure information is singular");
        }
        ClosureConstraint.symmetrise(out);
        return out;
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }
}
