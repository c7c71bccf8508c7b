package revisit.features;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class FeatureConfigTest {

    @Test
    void defaultsAreTheDocumentedValues() {
        FeatureConfig c = FeatureConfig.defaults();
        assertEquals(1000, c.maxFeatures());
        assertEquals(8, c.levels());
        assertEquals(1.2, c.scaleFactor());
        assertEquals(20, c.fastThreshold());
        assertEquals(9, c.fastArc());
        assertEquals(FeatureConfig.MIN_BORDER_PX, c.borderPx());
        assertEquals(FeatureConfig.CornerScore.HARRIS, c.cornerScore());
    }

    @Test
    void withCopiesChangeOnlyTheirField() {
        FeatureConfig c = FeatureConfig.defaults().withMaxFeatures(500).withLevels(4).withGridCellPx(64);
        assertEquals(500, c.maxFeatures());
        assertEquals(4, c.levels());
        assertEquals(64, c.gridCellPx());
        assertEquals(FeatureConfig.defaults().patternSeed(), c.patternSeed());
        assertEquals(FeatureConfig.defaults().withPatternSeed(5).withPatternSeed(FeatureConfig.DEFAULT_PATTERN_SEED),
                FeatureConfig.defaults());
    }

    @Test
    void rejectsOutOfRangeValuesNamingTheSettingAndRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FeatureConfig.defaults().withLevels(0));
        assertTrue(e.getMessage().contains("levels = 0") && e.getMessage().contains("1..16"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withMaxFeatures(0));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withScaleFactor(1.0));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withFastThreshold(255));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withFastArc(8));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withBorderPx(15));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withGridCellPx(4));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withCellCap(0));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withBlurSigma(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> FeatureConfig.defaults().withAngleBins(4));
        assertThrows(NullPointerException.class, () -> FeatureConfig.defaults().withCornerScore(null));
    }
}
