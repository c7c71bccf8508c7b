package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class VocabularyConfigTest {

    @Test
    void defaultsAreTenWayFiveLevels() {
        VocabularyConfig c = VocabularyConfig.defaults();
        assertEquals(10, c.branching());
        assertEquals(5, c.depth());
        assertEquals(6, c.withDepth(6).depth());
        assertEquals(12, c.withBranching(12).branching());
        assertEquals(3, c.withMaxIterations(3).maxIterations());
        assertEquals(9, c.withSeed(9).seed());
        assertEquals(1, c.withThreads(1).threads());
    }

    @Test
    void rejectsParametersOutsideTheirRanges() {
        VocabularyConfig c = VocabularyConfig.defaults();
        assertThrows(IllegalArgumentException.class, () -> c.withBranching(1));
        assertThrows(IllegalArgumentException.class, () -> c.withBranching(65));
        assertThrows(IllegalArgumentException.class, () -> c.withDepth(0));
        assertThrows(IllegalArgumentException.class, () -> c.withDepth(11));
        assertThrows(IllegalArgumentException.class, () -> c.withBranching(64).withDepth(5));
        assertThrows(IllegalArgumentException.class, () -> c.withMaxIterations(0));
        assertThrows(IllegalArgumentException.class, () -> c.withThreads(0));
    }
}
