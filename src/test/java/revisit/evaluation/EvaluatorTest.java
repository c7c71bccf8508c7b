package revisit.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import revisit.io.BadInputException;

class EvaluatorTest {

    private static final String SEQ = "s";

    private static FrameKey f(int frame) {
        return new FrameKey(SEQ, frame);
    }

    private static FrameTimeline timeline(int frames) {
        return FrameTimeline.of(SequenceFrames.uniform(SEQ, frames, 10));
    }

    /**
     * The ranked list of the exercise on ranked retrieval in Manning, Raghavan and Schütze, Introduction to
     * Information Retrieval (2008), chapter 8 (list recalled from memory: 20 results, top first,
     * R R N N N N N N R N R N N N R N N N N R, 8 relevant in total). Relevant results are true detections of
     * positive queries 50..55; non-relevant ones are detections of negative queries 60..73; positive queries 56
     * and 57 are never reported (56 gets no candidate, 57 fails verification). Scores 20 (top) down to 1.
     */
    private static List<QueryOutcome> rankedListOutcomes() {
        String ranked = "RRNNNNNNRNRNNNRNNNNR";
        List<QueryOutcome> out = new ArrayList<>();
        int nextPositive = 50;
        int nextNegative = 60;
        for (int rank = 0; rank < ranked.length(); rank++) {
            double score = 20 - rank;
            if (ranked.charAt(rank) == 'R') {
                int q = nextPositive++;
                out.add(QueryOutcome.of(f(q), f(q - 40), score, StageReached.VERIFIED));
            } else {
                int q = nextNegative++;
                out.add(QueryOutcome.of(f(q), f(q - 40), score, StageReached.VERIFIED));
            }
        }
        out.add(QueryOutcome.noCandidate(f(56)));
        out.add(QueryOutcome.of(f(57), f(17), 30, StageReached.CONSISTENT));
        return out;
    }

    private static RevisitLabels rankedListLabels() {
        LabelBuilder b = new LabelBuilder(timeline(100), ExclusionWindow.none());
        for (int q = 50; q <= 57; q++) {
            b.add(f(q), f(q - 40));
        }
        return b.build();
    }

    @Test
    void matchesHandWorkedTextbookRankedList() {
        EvaluationResult r = Evaluator.evaluate(rankedListOutcomes(), rankedListLabels(), EvaluationConfig.defaults());
        // All 20 reported: TP 6, FP 14, P 8 -> precision 6/20 = 0.3, recall 6/8 = 0.75,
        // F1 = 2 * 0.3 * 0.75 / (0.3 + 0.75) = 0.45 / 1.05 = 0.428571...
        assertEquals(6, r.atThreshold().truePositives());
        assertEquals(14, r.atThreshold().falsePositives());
        assertEquals(8, r.positives());
        assertEquals(0.3, r.atThreshold().precision(), 1e-12);
        assertEquals(0.75, r.atThreshold().recall(), 1e-12);
        assertEquals(0.45 / 1.05, r.atThreshold().f1(), 1e-12);
        // AP (IIR 8.4): relevant at ranks 1, 2, 9, 11, 15, 20; the 2 never found count 0:
        // (1/1 + 2/2 + 3/9 + 4/11 + 5/15 + 6/20) / 8 = (2 + 0.333333 + 0.363636 + 0.333333 + 0.3) / 8 = 0.416288
        assertEquals((1.0 + 1.0 + 3.0 / 9 + 4.0 / 11 + 5.0 / 15 + 6.0 / 20) / 8, r.averagePrecision(), 1e-12);
        assertEquals(0.416288, r.averagePrecision(), 1e-6);
        // Precision stays 1 down to rank 2 (score 19): recall 2/8 = 0.25; rank 3 drops it to 2/3 < 0.95.
        assertEquals(0.25, r.atFullPrecision().recall(), 1e-12);
        assertEquals(19.0, r.atFullPrecision().threshold());
        assertEquals(0.25, r.at95Precision().recall(), 1e-12);
        // Interpolated precision at recall 0.33: max precision at recall >= 0.33 is at rank 11, 4/11.
        assertEquals(4.0 / 11, r.curve().interpolatedPrecision(0.33), 1e-12);
        // Eleven points: r=0,0.1,0.2 -> 1; 0.3,0.4,0.5 -> 4/11; 0.6 -> 5/15; 0.7 -> 6/20; 0.8,0.9,1.0 -> 0
        // (recall never passes 0.75): (3 + 3*4/11 + 1/3 + 0.3) / 11 = 4.724242 / 11 = 0.429477
        assertEquals((3 + 3 * 4.0 / 11 + 1.0 / 3 + 0.3) / 11, r.curve().elevenPointAveragePrecision(), 1e-12);
    }

    @Test
    void countsMissReasonsAtTheAcceptanceThreshold() {
        // Threshold 10 reports ranks 1..11 (scores 20..10): TP 4 (ranks 1, 2, 9, 11), FP 7.
        // Lost positives: ranks 15 and 20 below threshold, query 56 no candidate, query 57 failed verification.
        EvaluationResult r = Evaluator.evaluate(rankedListOutcomes(), rankedListLabels(),
                EvaluationConfig.defaults().withAcceptanceThreshold(10));
        assertEquals(4, r.atThreshold().truePositives());
        assertEquals(7, r.atThreshold().falsePositives());
        assertEquals(2, r.missReasons().get(MissReason.BELOW_THRESHOLD));
        assertEquals(1, r.missReasons().get(MissReason.NO_CANDIDATE));
        assertEquals(1, r.missReasons().get(MissReason.VERIFICATION));
        assertEquals(0, r.missReasons().get(MissReason.TEMPORAL_CHECK));
        assertEquals(0, r.missReasons().get(MissReason.WRONG_MATCH));
        assertEquals(0, r.missReasons().get(MissReason.NOT_QUERIED));
        assertEquals(r.atThreshold().falseNegatives(),
                r.missReasons().values().stream().mapToInt(Integer::intValue).sum());
    }

    @Test
    void countsWrongMatchesAndUnqueriedPositives() {
        LabelBuilder b = new LabelBuilder(timeline(50), ExclusionWindow.none());
        b.add(f(30), f(3));
        b.add(f(31), f(4));
        b.add(f(32), f(5));
        b.add(f(33), f(6));
        List<QueryOutcome> outcomes = List.of(
                QueryOutcome.of(f(30), f(3), 5, StageReached.VERIFIED),
                QueryOutcome.of(f(31), f(20), 5, StageReached.VERIFIED),
                QueryOutcome.of(f(32), f(5), 5, StageReached.PROPOSED));
        EvaluationResult r = Evaluator.evaluate(outcomes, b.build(), EvaluationConfig.defaults());
        assertEquals(1, r.atThreshold().truePositives());
        assertEquals(1, r.atThreshold().falsePositives());
        assertEquals(1, r.missReasons().get(MissReason.WRONG_MATCH));
        assertEquals(1, r.missReasons().get(MissReason.TEMPORAL_CHECK));
        assertEquals(1, r.missReasons().get(MissReason.NOT_QUERIED));
        assertEquals(0.25, r.atThreshold().recall(), 1e-12);
    }

    @Test
    void frameToleranceAcceptsNearbyMatchesInTheSameSequenceOnly() {
        FrameTimeline two = new FrameTimeline(List.of(SequenceFrames.uniform("a", 20, 10),
                SequenceFrames.uniform("b", 20, 10)));
        LabelBuilder b = new LabelBuilder(two, ExclusionWindow.none());
        b.add(new FrameKey("b", 5), new FrameKey("a", 19));
        RevisitLabels labels = b.build();
        FrameKey query = new FrameKey("b", 5);
        assertTrue(labels.isTrueMatch(query, new FrameKey("a", 19), 0));
        assertFalse(labels.isTrueMatch(query, new FrameKey("a", 17), 1));
        assertTrue(labels.isTrueMatch(query, new FrameKey("a", 17), 2));
        // b:0 is one global index after a:19, but another sequence: never within tolerance.
        assertFalse(labels.isTrueMatch(query, new FrameKey("b", 0), 3));
        EvaluationResult r = Evaluator.evaluate(List.of(QueryOutcome.of(query, new FrameKey("a", 18), 1,
                StageReached.VERIFIED)), labels, EvaluationConfig.defaults().withFrameTolerance(1));
        assertEquals(1, r.atThreshold().truePositives());
    }

    @Test
    void refusesOutcomesForFramesTheLabelsDoNotCover() {
        RevisitLabels labels = rankedListLabels();
        BadInputException e = assertThrows(BadInputException.class, () -> Evaluator.evaluate(
                List.of(QueryOutcome.noCandidate(f(100))), labels, EvaluationConfig.defaults()));
        assertTrue(e.getMessage().contains("s:100"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Evaluator.evaluate(
                List.of(QueryOutcome.noCandidate(f(5)), QueryOutcome.noCandidate(f(5))), labels,
                EvaluationConfig.defaults()));
    }
}
