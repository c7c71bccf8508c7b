package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
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
