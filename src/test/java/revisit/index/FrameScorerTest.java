package revisit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** Equivalence: the inverted-index scores equal dense brute-force scores for every pair of frames. */
class FrameScorerTest {

    private static final int WORDS = 400;
    private static final long SEED = 20240611L;

    @ParameterizedTest
    @EnumSource(ScoreNorm.class)
    void invertedIndexScoresEqualDenseScoresForEveryPair(ScoreNorm norm) {
        Fixture f = new Fixture(norm, 1.0);
        int compared = 0;
        for (FrameWords query : f.frames) {
            Map<Integer, Double> returned = f.scores(query);
            for (FrameWords other : f.frames) {
                double expected = dense(f.idf, query.words(), other.words(), norm);
                if (expected > 1e-9) { // dense L1 leaves ~1e-16 of rounding for disjoint frames
                    assertEquals(expected, returned.get(other.frameId()), 2e-6,
                            "seed " + SEED + " query " + query.frameId() + " frame " + other.frameId());
                    compared++;
                } else {
                    assertFalse(returned.containsKey(other.frameId()));
                }
            }
        }
        assertTrue(compared > f.frames.size() * 10, "random data gave too few overlapping pairs: " + compared);
    }

    @ParameterizedTest
    @EnumSource(ScoreNorm.class)
    void touchedListAndFullSweepBothMatchDenseScores(ScoreNorm norm) {
        // Frames see narrow windows of the vocabulary, so small queries touch few frames (touched list) and large
        // ones many (sweep of all slots); both paths must give the dense scores.
        double[] idf = TestFrames.idf(WORDS, 0.0, SEED);
        IndexConfig config = IndexConfig.defaults().withScoreNorm(norm).withExclusionSeconds(0).withMaxCandidates(1000);
        RevisitDatabase db = new RevisitDatabase(new WordWeights(WORDS, idf), config);
        Random random = new Random(SEED);
        List<FrameWords> frames = new ArrayList<>();
        for (int i = 0; i < 200; i++) {
            frames.add(TestFrames.frame(0, i, i, TestFrames.windowWords(random, 12, (i * 2) % (WORDS - 20), 20)));
            db.add(frames.get(i));
        }
        RevisitSearch search = new RevisitSearch(db);
        boolean[] modes = new boolean[2];
        for (int q = 0; q < 60; q++) {
            int features = q % 2 == 0 ? 2 : 300;
            FrameWords query = TestFrames.frame(1, q, q, TestFrames.skewedWords(random, features, WORDS));
            Map<Integer, Double> returned = new HashMap<>();
            search.query(query).candidates().forEach(c -> returned.put(c.frameId(), c.rawScore()));
            modes[db.scorer().lastSwept() ? 1 : 0] = true;
            for (FrameWords other : frames) {
                double expected = dense(idf, query.words(), other.words(), norm);
                if (expected > 1e-9) {
                    assertEquals(expected, returned.get(other.frameId()), 2e-6, "seed " + SEED + " query " + q);
                } else {
                    assertFalse(returned.containsKey(other.frameId()));
                }
            }
        }
        assertTrue(modes[0] && modes[1], "both scoring paths must run");
    }

    @ParameterizedTest
    @EnumSource(ScoreNorm.class)
    void stopListLeavesTheCommonWordsOutOfScoresAndNormaliser(ScoreNorm norm) {
        Fixture f = new Fixture(norm, 0.3);
        int[] frameCount = new int[WORDS];
        for (FrameWords frame : f.frames) {
            java.util.Arrays.stream(frame.words()).distinct().filter(w -> f.idf[w] > 0).forEach(w -> frameCount[w]++);
        }
        double stopWeight = 0;
        FrameWords previous = null;
        for (FrameWords query : f.frames) {
            java.util.Set<Integer> stop = new java.util.HashSet<>();
            for (int w : query.words()) {
                if (frameCount[w] > Math.floor(0.3 * f.frames.size())) {
                    stop.add(w);
                }
            }
            QueryResult result = f.search.query(query);
            stopWeight += result.stopWordWeight();
            Map<Integer, Double> returned = new HashMap<>();
            result.candidates().forEach(c -> returned.put(c.frameId(), c.rawScore()));
            for (FrameWords other : f.frames) {
                double expected = restricted(f.idf, query.words(), other.words(), norm, stop);
                if (expected > 0) {
                    assertEquals(expected, returned.get(other.frameId()), 2e-6, "seed " + SEED);
                } else {
                    assertFalse(returned.containsKey(other.frameId()));
                }
            }
            if (previous != null) {
                assertEquals(restricted(f.idf, query.words(), previous.words(), norm, stop),
                        result.predecessorScore().getAsDouble(), 2e-6);
            }
            previous = query;
        }
        assertTrue(stopWeight > 1, "the stop list left out too little to test: " + stopWeight);
    }

    /** Dense reference over the words outside {@code stop}: sum of minima (L1, see WordVectorTest) or products. */
    static double restricted(double[] idf, int[] a, int[] b, ScoreNorm norm, java.util.Set<Integer> stop) {
        double[] va = denseVector(idf, a, norm);
        double[] vb = denseVector(idf, b, norm);
        double s = 0;
        for (int w = 0; w < idf.length; w++) {
            if (!stop.contains(w)) {
                s += norm == ScoreNorm.L1 ? Math.min(va[w], vb[w]) : va[w] * vb[w];
            }
        }
        return s;
    }

    /** Dense reference: full-length tf-idf vectors, normalised, compared by the textbook formula. */
    static double dense(double[] idf, int[] a, int[] b, ScoreNorm norm) {
        double[] va = denseVector(idf, a, norm);
        double[] vb = denseVector(idf, b, norm);
        double s = 0;
        if (norm == ScoreNorm.L1) {
            double distance = 0;
            for (int w = 0; w < idf.length; w++) {
                distance += Math.abs(va[w] - vb[w]);
            }
            s = 1 - 0.5 * distance;
        } else {
            for (int w = 0; w < idf.length; w++) {
                s += va[w] * vb[w];
            }
        }
        return s;
    }

    private static double[] denseVector(double[] idf, int[] words, ScoreNorm norm) {
        double[] v = new double[idf.length];
        for (int w : words) {
            v[w] += idf[w] / words.length;
        }
        double z = 0;
        for (double x : v) {
            z += norm == ScoreNorm.L1 ? x : x * x;
        }
        z = norm == ScoreNorm.L1 ? z : Math.sqrt(z);
        for (int w = 0; w < v.length; w++) {
            v[w] = z == 0 ? 0 : v[w] / z;
        }
        return v;
    }

    private static final class Fixture {
        final double[] idf = TestFrames.idf(WORDS, 0.1, SEED);
        final List<FrameWords> frames = new ArrayList<>();
        final RevisitSearch search;

        Fixture(ScoreNorm norm, double maxWordFrameFraction) {
            IndexConfig config = IndexConfig.defaults().withScoreNorm(norm).withExclusionSeconds(0)
                    .withMaxCandidates(1000).withMaxWordFrameFraction(maxWordFrameFraction).withStopListMinFrames(0);
            RevisitDatabase database = new RevisitDatabase(new WordWeights(WORDS, idf), config);
            Random random = new Random(SEED);
            for (int i = 0; i < 60; i++) {
                int[] words = TestFrames.skewedWords(random, 10 + random.nextInt(70), WORDS);
                if (i == 7) {
                    words = repeatFirst(words, 300);
                }
                frames.add(TestFrames.frame(0, i, i, words));
                database.add(frames.get(i));
            }
            search = new RevisitSearch(database);
        }

        Map<Integer, Double> scores(FrameWords query) {
            Map<Integer, Double> byFrame = new HashMap<>();
            for (Candidate c : search.query(query).candidates()) {
                byFrame.put(c.frameId(), c.rawScore());
            }
            return byFrame;
        }

        /** A frame with one word on 300 features, more than a posting's inline count holds. */
        private static int[] repeatFirst(int[] words, int times) {
            int[] out = new int[words.length + times];
            System.arraycopy(words, 0, out, 0, words.length);
            java.util.Arrays.fill(out, words.length, out.length, words[0]);
            return out;
        }
    }
}
