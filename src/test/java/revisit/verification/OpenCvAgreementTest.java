package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The same matches given to OpenCV's {@code Calib3d.findEssentialMat} (RANSAC, 0.999, 1 px) and
 * {@code recoverPose} (reference library, Java bindings in test scope): the rotations must agree within 1 degree.
 */
class OpenCvAgreementTest {

    @Test
    void rotationAgreesWithOpenCvOnTheSameMatches() {
        PairVerifier verifier = new PairVerifier(VerificationConfig.defaults());
        for (long seed = 1; seed <= 5; seed++) {
            SyntheticPair s = SyntheticPair.of(seed, 300, new double[]{0.1, -0.15, 0.05}, new double[]{-1, 0.2, 0.3},
                    1.0, 0.3, SyntheticPair.Scene.GENERAL, SyntheticPair.CAMERA);
            double[] ours = verifier.verify(s.a, s.b, s.matches, Optional.of(SyntheticPair.CAMERA)).pose()
                    .orElseThrow().rotation();
            double[] theirs = OpenCvReference.rotation(s.a, s.b, s.matches, SyntheticPair.CAMERA);
            double diff = Math.toDegrees(Mat3.angle(Mat3.mul(ours, Mat3.transpose(theirs))));
            assertTrue(diff <= 1.0, "seed " + seed + ": rotations differ by " + diff + " deg");
        }
    }
}
