package revisit.verification;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class VerificationConfigTest {

    @Test
    void defaultsAreThePublishedValues() {
        VerificationConfig c = VerificationConfig.defaults();
        assertEquals(0.8, c.ratio());
        // stricter than the 12 of Galvez-Lopez & Tardos, IEEE T-RO 2012: measured on the dino ring (docs/SCAN.md)
        assertEquals(20, c.minInliers());
        assertEquals(2.0, c.inlierThresholdPx());
        assertEquals(1.0, c.noiseSigmaPx() * Math.sqrt(3.84) / 2.0, 1e-12);
        assertEquals(2.0 * Math.sqrt(5.99 / 3.84), c.homographyThresholdPx(), 1e-12);
    }

    @Test
    void copiesChangeOneField() {
        VerificationConfig c = VerificationConfig.defaults().withSeed(7).withMinInlierRatio(0.2);
        assertEquals(7, c.seed());
        assertEquals(0.2, c.minInlierRatio());
        assertEquals(VerificationConfig.defaults().confidence(), c.confidence());
    }

    @Test
    void minSupportIsTheStricterOfCountAndShare() {
        VerificationConfig c = VerificationConfig.defaults().withMinInliers(20).withMinInlierRatio(0.3);
        assertEquals(30, c.minSupport(100), "30% of 100 beats 20");
        assertEquals(20, c.minSupport(40), "20 beats 30% of 40 = 12");
        assertEquals(31, c.minSupport(101), "31 / 101 is the first share >= 0.3");
        assertEquals(30, c.withMinInliers(8).minSupport(100));
        assertEquals(8, c.withMinInliers(8).withMinInlierRatio(0).minSupport(100));
    }

    @Test
    void rejectsOutOfRangeValues() {
        VerificationConfig d = VerificationConfig.defaults();
        assertThrows(IllegalArgumentException.class, () -> d.withRatio(1.5));
        assertThrows(IllegalArgumentException.class, () -> d.withMinInliers(7));
        assertThrows(IllegalArgumentException.class, () -> d.withMinInlierRatio(1.0));
        assertThrows(IllegalArgumentException.class, () -> d.withInlierThresholdPx(0));
        assertThrows(IllegalArgumentException.class, () -> d.withConfidence(1.0));
        assertThrows(IllegalArgumentException.class, () -> d.withMaxIterations(0));
        assertThrows(IllegalArgumentException.class, () -> d.withMaxHammingBits(257));
        assertThrows(IllegalArgumentException.class, () -> d.withFundamentalSolver(null));
    }
}
