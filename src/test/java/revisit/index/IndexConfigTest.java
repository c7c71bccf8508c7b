package revisit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class IndexConfigTest {

    @Test
    void defaultsFollowThePublishedSettings() {
        IndexConfig c = IndexConfig.defaults();
        assertEquals(ScoreNorm.L1, c.scoreNorm());
        assertEquals(3, c.consistencyQueries());
        assertEquals(0.3, c.minNormalisedScore());
    }

    @Test
    void rejectsOutOfRangeValues() {
        IndexConfig c = IndexConfig.defaults();
        assertThrows(IllegalArgumentException.class, () -> c.withExclusionSeconds(-1));
        assertThrows(IllegalArgumentException.class, () -> c.withExclusionSeconds(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> c.withExclusionFrames(-1));
        assertThrows(IllegalArgumentException.class, () -> c.withMinPredecessorScore(0));
        assertThrows(IllegalArgumentException.class, () -> c.withMaxCandidates(0));
        assertThrows(IllegalArgumentException.class, () -> c.withMaxWordFrameFraction(0));
        assertThrows(IllegalArgumentException.class, () -> c.withMaxWordFrameFraction(1.5));
        assertThrows(IllegalArgumentException.class, () -> c.withConsistencyQueries(-1));
        assertThrows(IllegalArgumentException.class, () -> c.withScoreNorm(null));
    }

    @Test
    void searchRefusesAnotherScoreNormThanTheDatabase() {
        RevisitDatabase db = new RevisitDatabase(new WordWeights(3, new double[]{1, 1, 1}), IndexConfig.defaults());
        assertThrows(IllegalArgumentException.class,
                () -> new RevisitSearch(db, IndexConfig.defaults().withScoreNorm(ScoreNorm.L2)));
    }
}
