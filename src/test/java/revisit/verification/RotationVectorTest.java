package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.geometry.ConvertRotation3D_F64;
import georegression.struct.so.Rodrigues_F64;
import java.util.SplittableRandom;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;

class RotationVectorTest {

    @Test
    void expMatchesGeoregressionRodrigues() {
        // Reference library run in the test: georegression ConvertRotation3D_F64.rodriguesToMatrix.
        SplittableRandom random = new SplittableRandom(21);
        for (int trial = 0; trial < 50; trial++) {
            double[] w = randomVector(random, random.nextDouble() * Math.PI);
            DMatrixRMaj ours = new DMatrixRMaj(3, 3);
            RotationVector.exp(w[0], w[1], w[2], ours);
            double angle = Math.sqrt(w[0] * w[0] + w[1] * w[1] + w[2] * w[2]);
            DMatrixRMaj reference = ConvertRotation3D_F64.rodriguesToMatrix(
                    new Rodrigues_F64(angle, w[0] / angle, w[1] / angle, w[2] / angle), null);
            DMatrixRMaj d = new DMatrixRMaj(3, 3);
            CommonOps_DDRM.subtract(ours, reference, d);
            assertTrue(CommonOps_DDRM.elementMaxAbs(d) < 1e-14);
        }
    }

    @Test
    void logInvertsExpFromTinyAnglesToNearlyHalfATurn() {
        SplittableRandom random = new SplittableRandom(22);
        for (double angle : new double[]{1e-12, 1e-7, 1e-3, 0.5, 2.0, 3.0, Math.PI - 1e-6}) {
            double[] w = randomVector(random, angle);
            DMatrixRMaj r = new DMatrixRMaj(3, 3);
            RotationVector.exp(w[0], w[1], w[2], r);
            double[] back = new double[3];
            RotationVector.log(r, back);
            for (int k = 0; k < 3; k++) {
                assertEquals(w[k], back[k], 1e-9 * Math.max(1, angle), "angle " + angle);
            }
            assertEquals(angle, RotationVector.angle(r), 1e-9);
        }
    }

    private static double[] randomVector(SplittableRandom random, double length) {
        double[] v = {random.nextDouble() - 0.5, random.nextDouble() - 0.5, random.nextDouble() - 0.5};
        double n = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        return new double[]{length * v[0] / n, length * v[1] / n, length * v[2] / n};
    }
}
