package revisit.index;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.io.BadInputException;

class DatabaseFileTest {

    private static final int WORDS = 500;
    private static final WordWeights WEIGHTS = new WordWeights(WORDS, TestFrames.idf(WORDS, 0.05, 17L));
    private static final IndexConfig CONFIG = IndexConfig.defaults().withExclusionSeconds(5).withMaxCandidates(20);

    @TempDir
    Path dir;

    /** Two sequences, a frame with a word on 300 features (large count) and two removed frames. */
    private static RevisitDatabase build(int frames, int features, List<FrameWords> queries) {
        RevisitDatabase db = new RevisitDatabase(WEIGHTS, CONFIG);
        Random random = new Random(23L);
        for (int i = 0; i < frames; i++) {
            int[] words = TestFrames.skewedWords(random, features, WORDS);
            if (i == 3) {
                words = Arrays.copyOf(words, words.length + 300);
                Arrays.fill(words, features, words.length, 42);
            }
            FrameWords frame = TestFrames.frame(i % 2, i, i * 0.5, words);
            db.add(frame);
            queries.add(TestFrames.frame(i % 2, 1000 + i, 100 + i * 0.5, words));
        }
        db.remove(0, 0);
        db.remove(1, 5);
        return db;
    }

    private static List<QueryResult> run(RevisitDatabase db, List<FrameWords> queries) {
        RevisitSearch search = new RevisitSearch(db);
        List<QueryResult> results = new ArrayList<>();
        for (FrameWords q : queries) {
            results.add(search.query(q));
        }
        return results;
    }

    @Test
    void roundTripGivesIdenticalQueryResults() {
        List<FrameWords> queries = new ArrayList<>();
        RevisitDatabase db = build(80, 60, queries);
        List<QueryResult> before = run(db, queries);
        Path file = dir.resolve("scan.rvdb");
        db.save(file);
        RevisitDatabase loaded = RevisitDatabase.load(file, WEIGHTS, CONFIG);
        assertEquals(db.size(), loaded.size());
        assertEquals(db.postingCount(), loaded.postingCount());
        assertEquals(before, run(loaded, queries));
        assertTrue(before.stream().anyMatch(r -> !r.groups().isEmpty()), "queries found nothing to compare");
        assertArrayEquals(db.featuresByNode(1, 3).orElseThrow().features(),
                loaded.featuresByNode(1, 3).orElseThrow().features());
        assertFalse(loaded.contains(0, 0));
    }

    @Test
    void loadedDatabaseAcceptsMoreFrames() {
        List<FrameWords> queries = new ArrayList<>();
        RevisitDatabase db = build(20, 40, queries);
        Path file = dir.resolve("scan.rvdb");
        db.save(file);
        RevisitDatabase loaded = RevisitDatabase.load(file, WEIGHTS, CONFIG);
        FrameWords next = TestFrames.frame(0, 500, 500, queries.get(7).words());
        loaded.add(next);
        Candidate best = new RevisitSearch(loaded).query(TestFrames.frame(1, 9, 900, next.words()))
                .candidates().get(0);
        assertEquals(1.0, best.rawScore(), 1e-5);
        assertTrue(best.frameId() == 7 || best.frameId() == 500);
    }

    @Test
    void everyCorruptedOrTruncatedFileGivesOneLineBadInput() throws IOException {
        RevisitDatabase db = build(6, 10, new ArrayList<>());
        Path good = dir.resolve("small.rvdb");
        db.save(good);
        byte[] bytes = Files.readAllBytes(good);
        for (int i = 0; i < bytes.length; i++) {
            byte[] flipped = bytes.clone();
            flipped[i] ^= (byte) (1 << (i % 8));
            expectBadInput(dir.resolve("flip" + i + ".rvdb"), flipped, "flip at byte " + i);
        }
        for (int length = 0; length < bytes.length; length++) {
            expectBadInput(dir.resolve("cut" + length + ".rvdb"), Arrays.copyOf(bytes, length),
                    "truncated to " + length);
        }
        expectBadInput(dir.resolve("long.rvdb"), Arrays.copyOf(bytes, bytes.length + 1), "one byte appended");
    }

    private static void expectBadInput(Path file, byte[] content, String what) throws IOException {
        Files.write(file, content);
        BadInputException e = assertThrows(BadInputException.class,
                () -> RevisitDatabase.load(file, WEIGHTS, CONFIG), what);
        assertTrue(e.getMessage().startsWith(file.toString()) && !e.getMessage().contains("\n"), e.getMessage());
    }

    @Test
    void refusesAnotherVocabularyOrScoreNorm() {
        Path file = dir.resolve("scan.rvdb");
        build(10, 20, new ArrayList<>()).save(file);
        double[] otherIdf = TestFrames.idf(WORDS, 0.05, 18L);
        BadInputException words = assertThrows(BadInputException.class,
                () -> RevisitDatabase.load(file, new WordWeights(WORDS + 1, Arrays.copyOf(otherIdf, WORDS + 1)),
                        CONFIG));
        assertTrue(words.getMessage().contains("vocabulary of 500 words"), words.getMessage());
        assertThrows(BadInputException.class, () -> RevisitDatabase.load(file, new WordWeights(WORDS, otherIdf),
                CONFIG));
        BadInputException norm = assertThrows(BadInputException.class,
                () -> RevisitDatabase.load(file, WEIGHTS, CONFIG.withScoreNorm(ScoreNorm.L2)));
        assertTrue(norm.getMessage().contains("L1"), norm.getMessage());
        assertThrows(BadInputException.class, () -> RevisitDatabase.load(dir.resolve("none.rvdb"), WEIGHTS,
                CONFIG));
    }
}
