package revisit.consistency;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import java.util.SplittableRandom;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;

class UncertainPoseTest {

    @Test
    void adjointMovesAPerturbationFromRightToLeft() {
        // Defining property T Exp(xi) = Exp(Ad_T xi) T, checked to second order with a small xi.
        Se3_F64 t = TwoLapTrajectory.truePose(7.3);
        double[] xi = {1e-6, -2e-6, 3e-6, 4e-6, 1e-6, -5e-6};
        Se3_F64 right = TwoLapTrajectory.rightPerturbed(t, xi);
        DMatrixRMaj ad = UncertainPose.adjoint(t);
        double[] moved = new double[6];
        for (int r = 0; r < 6; r++) {
            for (int c = 0; c < 6; c++) {
                moved[r] += ad.get(r, c) * xi[c];
            }
        }
        // Exp(moved) T as a left perturbation: rotation exp(w) R, translation exp(w) t + v (first order).
        Se3_F64 left = t.concat(TwoLapTrajectory.rightPerturbed(new Se3_F64(), moved), null);
        DMatrixRMaj d = new DMatrixRMaj(3, 3);
        CommonOps_DDRM.subtract(left.R, right.R, d);
        assertTrue(CommonOps_DDRM.elementMaxAbs(d) < 1e-10);
        assertEquals(0, left.T.distance(right.T), 1e-10);
    }

    @Test
    void propagatedCovarianceOfALoopMatchesSampling() {
        // Monte Carlo: draw the perturbations of three factors, form A B^-1 C, and compare the sample covariance of
        // its right perturbation with the first-order propagation. Seed 77, 20000 samples.
        SplittableRandom random = new SplittableRandom(77);
        UncertainPose a = UncertainPose.isotropic(TwoLapTrajectory.truePose(3), 0.02, 0.05);
        UncertainPose b = UncertainPose.isotropic(TwoLapTrajectory.truePose(11), 0.01, 0.10);
        UncertainPose c = UncertainPose.isotropic(TwoLapTrajectory.truePose(20), 0.03, 0.02);
        UncertainPose product = a.then(b.inverse()).then(c);
        Se3_F64 nominal = product.pose();
        int samples = 20_000;
        DMatrixRMaj sampled = new DMatrixRMaj(6, 6);
        for (int s = 0; s < samples; s++) {
            Se3_F64 pa = TwoLapTrajectory.perturb(a.pose(), 0.02, 0.05, random);
            Se3_F64 pb = TwoLapTrajectory.perturb(b.pose(), 0.01, 0.10, random);
            Se3_F64 pc = TwoLapTrajectory.perturb(c.pose(), 0.03, 0.02, random);
            Se3_F64 value = pc.concat(pb.invert(null), null).concat(pa, null);
            double[] e = LoopCheck.error(value.concat(nominal.invert(null), null));
            for (int r = 0; r < 6; r++) {
                for (int q = 0; q < 6; q++) {
                    sampled.data[6 * r + q] += e[r] * e[q] / samples;
                }
            }
        }
        DMatrixRMaj predicted = product.covariance();
        for (int k = 0; k < 6; k++) {
            double ratio = sampled.get(k, k) / predicted.get(k, k);
            assertTrue(ratio > 0.93 && ratio < 1.07, "diagonal " + k + ": sampled/predicted " + ratio);
        }
        for (int r = 0; r < 6; r++) {
            for (int q = 0; q < r; q++) {
                double scale = Math.sqrt(predicted.get(r, r) * predicted.get(q, q));
                assertEquals(predicted.get(r, q) / scale, sampled.get(r, q) / scale, 0.05, "entry " + r + "," + q);
            }
        }
    }
}
