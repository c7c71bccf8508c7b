package revisit.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ScenarioConfigTest {

    @Test
    void presetsHaveTheDocumentedSizes() {
        ScenarioConfig d = ScenarioConfig.defaults();
        assertEquals(1000, d.frameCount());
        assertEquals(500, d.secondSessionFrames());
        assertEquals(640, d.width());
        ScenarioConfig s = ScenarioConfig.small();
        assertEquals(240, s.frameCount());
        assertEquals(320, s.camera().width());
        assertEquals(256, s.camera().fx(), 1e-12);
        assertFalse(s.camera().isDistortionFree());
        assertTrue(s.withDistortion(false).camera().isDistortionFree());
        assertEquals(0, s.withSecondSession(false).secondSessionFrames());
    }

    @Test
    void rejectsOutOfRangeValuesNamingTheField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ScenarioConfig.defaults().withLoopCount(3));
        assertTrue(e.getMessage().contains("loopCount"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ScenarioConfig.defaults().withSize(20, 480));
        assertThrows(IllegalArgumentException.class, () -> ScenarioConfig.defaults().withNuisances(-1, 0, 0, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> ScenarioConfig.defaults().withFrameCount(5));
    }

    @Test
    void tooFewFramesForTheRouteSaysHowManyAreNeeded() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Scenario.build(ScenarioConfig.small().withFrameCount(60)));
        assertTrue(e.getMessage().contains("use at least"), e.getMessage());
    }
}
