package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import revisit.features.FrameFeatures;
import revisit.index.ScoreNorm;
import revisit.index.WordWeights;
import revisit.io.BadInputException;
import revisit.pipeline.FrameRecord;

/** The report's similarity map rebuilt from a scan's frame records. */
class ScanSimilarityTest {

    private static final WordWeights WEIGHTS = new WordWeights(10, new double[]{1, 1, 1, 1, 1, 1, 1, 1, 1, 1});
    private static final FrameTimeline TIMELINE = FrameTimeline.of(SequenceFrames.uniform("run", 3, 1));

    private static FrameRecord record(int frame, int... words) {
        int n = words.length;
        FrameFeatures f = new FrameFeatures(n, new float[n], new float[n], new float[n], new int[n], new float[n],
                new float[n], new long[n * FrameFeatures.STRIDE]);
        return new FrameRecord(0, frame, frame, "f" + frame, f, words, new int[n]);
    }

    @Test
    void aRepeatedFrameScoresOneAndDisjointFramesScoreZero() {
        List<FrameRecord> records = List.of(record(0, 1, 2, 3), record(1, 4, 5, 6), record(2, 1, 2, 3));
        SimilarityMatrix m = ScanSimilarity.of(records, List.of("run"), TIMELINE, WEIGHTS, ScoreNorm.L1, 10, 10);
        assertEquals(1.0, m.value(2, 0), 1e-6);
        assertEquals(0.0, m.value(1, 0), 1e-6);
        assertEquals(0.0, m.value(2, 1), 1e-6);
        assertFalse(m.isSet(0, 2), "only earlier frames are scored");
    }

    @Test
    void aWordBeyondTheVocabularyNamesTheFix() {
        List<FrameRecord> records = List.of(record(0, 1, 2), record(1, 12));
        BadInputException e = assertThrows(BadInputException.class,
                () -> ScanSimilarity.of(records, List.of("run"), TIMELINE, WEIGHTS, ScoreNorm.L1, 10, 10));
        assertTrue(e.getMessage().contains("pass the vocabulary the scan used"), e.getMessage());
    }
}
