package revisit.consistency;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import georegression.struct.se.Se3_F64;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

class ClosureConstraintTest {

    private static final FrameRef A = new FrameRef("s", 1, 0.1);
    private static final FrameRef B = new FrameRef("s", 90, 9.0);

    private static Se3_F64 pose(double tx, double ty, double tz) {
        Se3_F64 p = new Se3_F64();
        p.T.setTo(tx, ty, tz);
        return p;
    }

    @Test
    void acceptsAMetricClosureWithPositiveDefiniteInformation() {
        ClosureConstraint c = new ClosureConstraint("c", A, B, pose(1, 2, 3), TwoLapTrajectory.information(0.01, 0.05),
                true, 40, 0.5);
        assertEquals(3, c.aFromB().T.z, 0);
    }

    @Test
    void refusesAMonocularTranslationThatIsNotAUnitDirection() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new ClosureConstraint("m", A, B,
                pose(1, 2, 3), TwoLapTrajectory.information(0.01, 0.05), false, 40, 0.5));
        assertTrue(e.getMessage().contains("unit direction"), e.getMessage());
    }

    @Test
    void acceptsAMonocularClosureWhoseTranslationBlockIsSingular() {
        double[] info = TwoLapTrajectory.information(0.01, 0.05);
        info[21] = 0;
        info[28] = 0;
        info[35] = 0;
        ClosureConstraint m = new ClosureConstraint("m", A, B, pose(0, 0.6, 0.8), info, false, 40, 0.5);
        // Seen from B (identity rotation), A lies in the opposite direction.
        Se3_F64 back = m.reversed().aFromB();
        assertEquals(-0.6, back.T.y, 1e-12);
        assertEquals(-0.8, back.T.z, 1e-12);
    }

    @Test
    void refusesInformationThatIsAsymmetricOrIndefinite() {
        double[] asymmetric = TwoLapTrajectory.information(0.01, 0.05);
        asymmetric[1] = 3;
        assertThrows(IllegalArgumentException.class,
                () -> new ClosureConstraint("c", A, B, pose(1, 0, 0), asymmetric, true, 40, 0.5));
        double[] indefinite = TwoLapTrajectory.information(0.01, 0.05);
        indefinite[35] = -1;
        assertThrows(IllegalArgumentException.class,
                () -> new ClosureConstraint("c", A, B, pose(1, 0, 0), indefinite, true, 40, 0.5));
    }

    @Test
    void refusesBadCountsAndEnds() {
        double[] info = TwoLapTrajectory.information(0.01, 0.05);
        assertThrows(IllegalArgumentException.class, () -> new ClosureConstraint("c", A, B, pose(1, 0, 0), info, true,
                -1, 0.5));
        assertThrows(IllegalArgumentException.class, () -> new ClosureConstraint("c", A, B, pose(1, 0, 0), info, true,
                10, 1.5));
        assertThrows(IllegalArgumentException.class, () -> new FrameRef(" ", 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new FrameRef("s", -1, 0));
    }

    @Test
    void swappingBlocksTwiceGivesTheOriginalAndMovesRotationLast() {
        double[] info = new double[36];
        for (int k = 0; k < 36; k++) {
            info[k] = k;
        }
        double[] swapped = ClosureConstraint.swapRotationAndTranslation(info);
        assertEquals(info[0], swapped[3 * 6 + 3], 0);
        assertEquals(info[6 * 1 + 4], swapped[6 * 4 + 1], 0);
        assertEquals(info[6 * 5 + 5], swapped[6 * 2 + 2], 0);
        assertEquals(Arrays.toString(info),
                Arrays.toString(ClosureConstraint.swapRotationAndTranslation(swapped)));
    }

    @Test
    void acceptsAMonocularClosureWithoutDirection() {
        ClosureConstraint m = new ClosureConstraint("m", A, B, pose(0, 0, 0), TwoLapTrajectory.information(0.01, 0.05),
                false, 40, 0.5);
        assertTrue(m.hasNoDirection());
    }

    @Test
    void configRefusesOutOfRangeValues() {
        assertThrows(IllegalArgumentException.class, () -> ConsistencyConfig.defaults().withConfidenceLevel(1.0));
        assertThrows(IllegalArgumentException.class, () -> ConsistencyConfig.defaults().withDrift(-0.1, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> ConsistencyConfig.defaults().withCliqueLimits(0, 10));
        assertEquals(0.99, ConsistencyConfig.defaults().confidenceLevel());
    }
}
