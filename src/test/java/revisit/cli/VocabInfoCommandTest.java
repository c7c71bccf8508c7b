package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import revisit.vocabulary.TrainingOrigin;
import revisit.vocabulary.TrainingProgress;
import revisit.vocabulary.TrainingSet;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyConfig;
import revisit.vocabulary.VocabularyFile;
import revisit.vocabulary.VocabularyTrainer;

class VocabInfoCommandTest {

    @TempDir
    Path dir;

    private int run(StringWriter out, StringWriter err, String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    @Test
    void describesParametersWordsWeightsAndProvenance() {
        // 600 random descriptors in 6 images of 100; k = 4, L = 2 gives at most 16 words.
        SplittableRandom rnd = new SplittableRandom(3);
        long[] data = new long[600 * 4];
        for (int i = 0; i < data.length; i++) {
            data[i] = rnd.nextLong();
        }
        Vocabulary v = new VocabularyTrainer(VocabularyConfig.defaults().withBranching(4).withDepth(2)
                .withSeed(77)).train(new TrainingSet(data, 600, new int[]{0, 100, 200, 300, 400, 500}),
                new TrainingOrigin("kind-x", List.of("folder a (6 frames)"), "revisit vocab-train a -o v.rvoc",
                        Instant.parse("2025-03-04T05:06:07Z")), TrainingProgress.NONE);
        Path file = dir.resolve("v.rvoc");
        VocabularyFile.write(file, v);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(0, run(out, err, "vocab-info", file.toString()));
        String text = out.toString();
        assertTrue(text.contains("branching k = 4, depth L = 2, " + v.nodeCount() + " nodes"), text);
        assertTrue(text.contains("words        " + v.wordCount() + " of 16 possible"), text);
        assertTrue(text.contains("kind-x"), text);
        assertTrue(text.contains("2025-03-04T05:06:07Z on 6 images, 600 descriptors; seed 77"), text);
        assertTrue(text.contains("folder a (6 frames)"), text);
        assertTrue(text.contains("revisit vocab-train a -o v.rvoc"), text);
        assertEquals("", err.toString());
    }

    @Test
    void reportsADamagedFileInOneLineWithExitCodeOne() throws Exception {
        Path file = dir.resolve("broken.rvoc");
        Files.writeString(file, "not a vocabulary");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(1, run(out, err, "vocab-info", file.toString()));
        String message = err.toString().strip();
        assertTrue(message.startsWith("revisit: " + file + ": not a Revisit vocabulary file"), message);
        assertEquals(1, message.lines().count(), message);
    }

    @Test
    void missingArgumentIsAUsageError() {
        assertEquals(2, run(new StringWriter(), new StringWriter(), "vocab-info"));
    }
}
