package revisit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class RevisitSearchTest {

    private static final int WORDS = 2000;

    private static RevisitDatabase database(IndexConfig config) {
        return new RevisitDatabase(new WordWeights(WORDS, TestFrames.idf(WORDS, 0.05, 3L)), config);
    }

    @Test
    void returnsItsOwnEarlierDuplicateFirst() {
        RevisitDatabase db = database(IndexConfig.defaults());
        Random random = new Random(11L);
        int[] remembered = null;
        for (int i = 0; i < 300; i++) {
            int[] words = TestFrames.skewedWords(random, 200, WORDS);
            remembered = i == 17 ? words : remembered;
            db.add(TestFrames.frame(0, i, i * 0.1, words));
        }
        RevisitSearch search = new RevisitSearch(db);
        QueryResult result = search.query(TestFrames.frame(0, 300, 300.0, remembered));
        Candidate first = result.candidates().get(0);
        assertEquals(17, first.frameId());
        assertEquals(1.0, first.rawScore(), 1e-5);
        assertTrue(result.candidates().get(1).rawScore() < first.rawScore() - 0.05);
    }

    @Test
    void normalisesByTheScoreAgainstThePredecessor() {
        // Hand-worked (see WordVectorTest): idf = {1, 2, 0.5, 0}; A = [0,0,1,2] -> (4/9, 4/9, 1/9);
        // B = [0,1,1,3] -> (1/5, 4/5); P = [1,2,2] -> (0, 2/3, 1/3). s(B, A) = 29/45; s(B, P) = min(4/5, 2/3) = 2/3;
        // eta = (29/45) / (2/3) = 29/30 = 0.96667.
        WordWeights weights = new WordWeights(4, new double[]{1.0, 2.0, 0.5, 0.0});
        RevisitDatabase db = new RevisitDatabase(weights, IndexConfig.defaults().withExclusionSeconds(10));
        db.add(TestFrames.frame(0, 0, 0.0, new int[]{0, 0, 1, 2}));
        RevisitSearch search = new RevisitSearch(db);
        QueryResult first = search.query(TestFrames.frame(0, 100, 100.0, new int[]{1, 2, 2}));
        assertEquals(ConsistencyState.WEAK_PREDECESSOR, first.consistency().state());
        QueryResult second = search.query(TestFrames.frame(0, 101, 101.0, new int[]{0, 1, 1, 3}));
        assertEquals(2.0 / 3, second.predecessorScore().getAsDouble(), 1e-6);
        Candidate a = second.candidates().get(0);
        assertEquals(29.0 / 45, a.rawScore(), 1e-6);
        assertEquals(29.0 / 30, a.normalisedScore(), 1e-6);
        assertEquals(1, second.groups().size());
    }

    @Test
    void neverReturnsFramesInsideTheExclusionWindow() {
        int excludedSomewhere = 0;
        for (long seed = 1; seed <= 60; seed++) {
            Random random = new Random(seed);
            IndexConfig config = IndexConfig.defaults().withExclusionSeconds(random.nextDouble() * 30)
                    .withExclusionFrames(random.nextInt(40)).withMaxCandidates(500).withMinNormalisedScore(0);
            RevisitDatabase db = database(config);
            RevisitSearch search = new RevisitSearch(db);
            IndexConfig open = config.withExclusionSeconds(0).withExclusionFrames(0);
            RevisitSearch unrestricted = new RevisitSearch(db, open);
            int sequences = 1 + random.nextInt(3);
            double[] clock = new double[sequences];
            for (int i = 0; i < 120; i++) {
                int sequence = random.nextInt(sequences);
                clock[sequence] += random.nextDouble() * 2;
                FrameWords frame = TestFrames.frame(sequence, i, clock[sequence],
                        TestFrames.skewedWords(random, 30, 300));
                QueryResult result = search.query(frame, db.vectorOf(frame.words()));
                for (Candidate c : result.candidates()) {
                    assertFalse(inside(c, frame, config), "seed " + seed + " frame " + i + " returned " + c);
                }
                for (MatchGroup g : result.groups()) {
                    assertFalse(inside(g.best(), frame, config), "seed " + seed + " group " + g);
                }
                for (Candidate c : unrestricted.query(frame).candidates()) {
                    excludedSomewhere += inside(c, frame, config) ? 1 : 0;
                }
                db.add(frame);
            }
        }
        assertTrue(excludedSomewhere > 500, "the window excluded too little to test: " + excludedSomewhere);
    }

    private static boolean inside(Candidate c, FrameWords query, IndexConfig config) {
        return c.sequenceId() == query.sequenceId()
                && (Math.abs(c.timeSeconds() - query.timeSeconds()) < config.exclusionSeconds()
                || Math.abs(c.frameId() - query.frameId()) < config.exclusionFrames());
    }

    @Test
    void matchesAnotherSessionDespiteEqualTimes() {
        RevisitDatabase db = database(IndexConfig.defaults().withExclusionSeconds(1000));
        Random random = new Random(5L);
        int[][] session = new int[50][];
        for (int i = 0; i < session.length; i++) {
            session[i] = TestFrames.skewedWords(random, 150, WORDS);
            db.add(TestFrames.frame(0, i, i, session[i]));
        }
        RevisitSearch search = new RevisitSearch(db);
        QueryResult result = search.query(TestFrames.frame(1, 30, 30.0, session[30]));
        assertEquals(0, result.candidates().get(0).sequenceId());
        assertEquals(30, result.candidates().get(0).frameId());
        QueryResult own = search.query(TestFrames.frame(0, 30, 30.0, session[30]));
        assertTrue(own.candidates().isEmpty(), "the window must hide the query's own sequence");
    }

    @Test
    void otherSequencesScopeIgnoresTheQuerysOwnSequence() {
        IndexConfig config = IndexConfig.defaults().withExclusionSeconds(0).withScope(QueryScope.OTHER_SEQUENCES);
        RevisitDatabase db = database(config);
        Random random = new Random(8L);
        int[] shared = TestFrames.skewedWords(random, 150, WORDS);
        db.add(TestFrames.frame(0, 0, 0.0, shared));
        db.add(TestFrames.frame(1, 0, 0.0, shared));
        db.add(TestFrames.frame(1, 1, 1.0, TestFrames.skewedWords(random, 150, WORDS)));
        List<Candidate> found = new RevisitSearch(db).query(TestFrames.frame(1, 2, 2.0, shared)).candidates();
        assertEquals(1, found.size());
        assertEquals(0, found.get(0).sequenceId());
    }

    @Test
    void removedFrameIsNeverReturned() {
        RevisitDatabase db = database(IndexConfig.defaults().withExclusionSeconds(0));
        Random random = new Random(9L);
        int[][] words = new int[40][];
        for (int i = 0; i < words.length; i++) {
            words[i] = TestFrames.skewedWords(random, 100, WORDS);
            db.add(TestFrames.frame(0, i, i, words[i]));
        }
        RevisitSearch search = new RevisitSearch(db);
        assertTrue(db.remove(0, 12));
        assertFalse(db.remove(0, 12));
        assertEquals(39, db.size());
        assertNotEquals(12, search.query(TestFrames.frame(0, 99, 99, words[12])).candidates().get(0).frameId());
        long allPostings = db.postingCount();
        for (int i = 0; i < 20; i++) {
            db.remove(0, i);
        }
        assertEquals(20, db.size());
        assertTrue(db.postingCount() < allPostings * 0.6, "removed frames' postings were not reclaimed");
        db.compact();
        long expected = 0;
        for (int i = 20; i < words.length; i++) {
            expected += db.vectorOf(words[i]).size();
        }
        assertEquals(expected, db.postingCount());
        QueryResult result = search.query(TestFrames.frame(0, 99, 99, words[25]));
        assertTrue(result.candidates().stream().noneMatch(c -> c.frameId() < 20));
        assertEquals(25, result.candidates().get(0).frameId());
    }

    @Test
    void floorsTheNormaliserWhenThePredecessorIsUnrelated() {
        IndexConfig config = IndexConfig.defaults().withExclusionSeconds(0).withMinPredecessorScore(0.05);
        RevisitDatabase db = database(config);
        db.add(TestFrames.frame(0, 0, 0.0, TestFrames.windowWords(new Random(1L), 100, 0, 100)));
        RevisitSearch search = new RevisitSearch(db);
        search.query(TestFrames.frame(0, 1, 1.0, TestFrames.windowWords(new Random(2L), 100, 1000, 100)));
        QueryResult result = search.query(TestFrames.frame(0, 2, 2.0,
                TestFrames.windowWords(new Random(3L), 100, 0, 100)));
        assertEquals(0.0, result.predecessorScore().getAsDouble());
        assertEquals(0.05, result.normaliser());
        assertEquals(ConsistencyState.WEAK_PREDECESSOR, result.consistency().state());
        Candidate c = result.candidates().get(0);
        assertEquals(c.rawScore() / 0.05, c.normalisedScore(), 1e-12);
    }

    @Test
    void refusesDuplicateFramesAndMismatchedFeatureArrays() {
        RevisitDatabase db = database(IndexConfig.defaults());
        FrameWords frame = TestFrames.frame(0, 1, 0.0, new int[]{1, 2, 3});
        db.add(frame);
        assertThrows(IllegalArgumentException.class, () -> db.add(frame));
        assertThrows(IllegalArgumentException.class, () -> new RevisitSearch(db).addAndQuery(frame));
        assertThrows(IllegalArgumentException.class,
                () -> new FrameWords(0, 2, 0.0, new int[]{1, 2}, new int[]{1}));
        assertThrows(IllegalArgumentException.class, () -> db.add(TestFrames.frame(0, 3, 0.0, new int[]{WORDS})));
        assertEquals(1, db.size());
    }
}
