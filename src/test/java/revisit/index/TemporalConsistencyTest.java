package revisit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;

class TemporalConsistencyTest {

    private static MatchGroup group(int sequence, double start, double end) {
        Candidate best = new Candidate(sequence, (int) start, start, 0.5, 1.0);
        return new MatchGroup(sequence, (int) start, (int) end, start, end, 1.0, 1, best);
    }

    @Test
    void confirmsAfterRequiredPreviousQueriesAgree() {
        TemporalConsistency check = new TemporalConsistency(3, 2.0);
        assertEquals(ConsistencyState.GATHERING, check.update(Optional.of(group(0, 10, 11)), Optional.empty(), 0.3)
                .state());
        check.update(Optional.of(group(0, 11, 12)), Optional.empty(), 0.3);
        check.update(Optional.of(group(0, 13.5, 14)), Optional.empty(), 0.3);
        Consistency fourth = check.update(Optional.of(group(0, 15, 16)), Optional.empty(), 0.3);
        assertEquals(ConsistencyState.CONFIRMED, fourth.state());
        assertEquals(4, fourth.chainLength());
    }

    @Test
    void distantOrForeignGroupRestartsTheChain() {
        TemporalConsistency check = new TemporalConsistency(1, 2.0);
        check.update(Optional.of(group(0, 10, 11)), Optional.empty(), 0.3);
        Consistency far = check.update(Optional.of(group(0, 13.5, 14)), Optional.empty(), 0.3);
        assertEquals(1, far.chainLength());
        assertTrue(far.reason().contains("2.500 s"), far.reason());
        Consistency foreign = check.update(Optional.of(group(1, 13.5, 14)), Optional.empty(), 0.3);
        assertEquals(ConsistencyState.GATHERING, foreign.state());
        assertTrue(foreign.reason().contains("sequence 1"), foreign.reason());
    }

    @Test
    void missingGroupBreaksAndWeakPredecessorPauses() {
        TemporalConsistency check = new TemporalConsistency(2, 2.0);
        check.update(Optional.of(group(0, 10, 11)), Optional.empty(), 0.3);
        Consistency paused = check.update(Optional.of(group(0, 50, 51)), Optional.of("weak"), 0.3);
        assertEquals(ConsistencyState.WEAK_PREDECESSOR, paused.state());
        assertEquals(2, check.update(Optional.of(group(0, 11, 12)), Optional.empty(), 0.3).chainLength());
        assertEquals(ConsistencyState.NO_GROUP, check.update(Optional.empty(), Optional.empty(), 0.3).state());
        assertEquals(1, check.update(Optional.of(group(0, 12, 13)), Optional.empty(), 0.3).chainLength());
    }

    @Test
    void zeroRequiredQueriesConfirmsAtOnce() {
        TemporalConsistency check = new TemporalConsistency(0, 2.0);
        assertEquals(ConsistencyState.CONFIRMED,
                check.update(Optional.of(group(0, 10, 11)), Optional.empty(), 0.3).state());
    }

    @Test
    void searchConfirmsARevisitedStretchOfTheSequence() {
        // Frame i sees words [10 i, 10 i + 100): neighbours share ~90% of their words. Frames 50..59 revisit the
        // places of frames 10..19, so from the second revisit query on the chosen groups chain up.
        WordWeights weights = new WordWeights(2000, TestFrames.idf(2000, 0.0, 4L));
        RevisitDatabase db = new RevisitDatabase(weights, IndexConfig.defaults().withExclusionSeconds(20));
        RevisitSearch search = new RevisitSearch(db);
        Random random = new Random(21L);
        List<QueryResult> results = new ArrayList<>();
        for (int i = 0; i < 60; i++) {
            int place = i < 50 ? i : i - 40;
            results.add(search.addAndQuery(TestFrames.frame(0, i, i,
                    TestFrames.windowWords(random, 300, place * 10, 100))));
        }
        for (int i = 1; i < 50; i++) {
            assertEquals(ConsistencyState.NO_GROUP, results.get(i).consistency().state(), "frame " + i);
        }
        assertEquals(ConsistencyState.WEAK_PREDECESSOR, results.get(50).consistency().state());
        assertEquals(ConsistencyState.GATHERING, results.get(51).consistency().state());
        assertEquals(ConsistencyState.CONFIRMED, results.get(54).consistency().state());
        for (int i = 54; i < 60; i++) {
            int matched = results.get(i).confirmedMatch().orElseThrow().frameId();
            assertTrue(Math.abs(matched - (i - 40)) <= 1, "frame " + i + " matched " + matched);
        }
    }
}
