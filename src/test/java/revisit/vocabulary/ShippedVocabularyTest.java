package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.features.Hamming;
import revisit.io.BadInputException;

/** The vocabulary shipped in vocab/ (see vocab/README.md for how it was trained). */
class ShippedVocabularyTest {

    static final Path SHIPPED = Path.of(System.getProperty("user.dir")).resolve("vocab/default.rvoc");

    @TempDir
    Path dir;

    @Test
    void loadsWithTheDocumentedParameters() {
        Vocabulary v = VocabularyFile.read(SHIPPED);
        assertEquals(10, v.branching());
        assertEquals(5, v.depth());
        assertTrue(v.wordCount() > 50_000, "words " + v.wordCount());
        assertEquals(471, v.provenance().imageCount());
        assertTrue(v.provenance().command().startsWith("revisit vocab-train ../shared/data/photos/pixabay"),
                v.provenance().command());
        long sources = v.provenance().sources().stream().filter(s -> s.startsWith("../shared/data/")).count();
        assertEquals(6, sources);
    }

    @Test
    void flatLookupMatchesAPlainDescentThroughTheShippedTree() {
        Vocabulary v = VocabularyFile.read(SHIPPED);
        int n = v.nodeCount();
        int[] firstChild = new int[n];
        for (int i = 0, next = 1; i < n; i++) {
            firstChild[i] = next;
            next += v.childCount(i);
        }
        int[] wordOfNode = new int[n];
        int words = 0;
        ArrayDeque<Integer> stack = new ArrayDeque<>(List.of(0));
        while (!stack.isEmpty()) {
            int node = stack.pop();
            if (v.childCount(node) == 0) {
                wordOfNode[node] = words++;
            }
            for (int c = v.childCount(node) - 1; c >= 0; c--) {
                stack.push(firstChild[node] + c);
            }
        }
        assertEquals(v.wordCount(), words);
        long[] queries = SyntheticDescriptors.random(2000, 17);
        for (int q = 0; q < 2000; q++) {
            int node = 0;
            while (v.childCount(node) > 0) {
                int best = firstChild[node];
                for (int c = firstChild[node]; c < firstChild[node] + v.childCount(node); c++) {
                    int d = Hamming.distance(v.centre(c), 0, queries, q);
                    if (d < Hamming.distance(v.centre(best), 0, queries, q)) {
                        best = c;
                    }
                }
                node = best;
            }
            assertEquals(wordOfNode[node], v.word(queries, q), "query " + q);
        }
    }

    @Test
    void survivesSeededMutationsOfTheRealFileWithOnlyBadInputErrors() throws IOException {
        byte[] original = Files.readAllBytes(SHIPPED);
        Path file = dir.resolve("mutated.rvoc");
        int rejected = 0;
        for (long seed = 0; seed < 100; seed++) {
            Files.write(file, FileMutations.mutate(original, 1000 + seed));
            try {
                Vocabulary v = VocabularyFile.read(file);
                int word = v.word(SyntheticDescriptors.random(1, seed), 0);
                assertTrue(word >= 0 && word < v.wordCount());
            } catch (BadInputException e) {
                assertTrue(e.getMessage().startsWith(file.toString()), "seed " + seed + ": " + e.getMessage());
                assertFalse(e.getMessage().contains("\n"), "seed " + seed + ": " + e.getMessage());
                rejected++;
            }
        }
        assertTrue(rejected > 30, "rejected " + rejected);
    }
}
