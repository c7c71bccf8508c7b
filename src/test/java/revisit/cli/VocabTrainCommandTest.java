package revisit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import revisit.features.FeatureConfig;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;

class VocabTrainCommandTest {

    @TempDir
    Path dir;

    private int run(StringWriter out, StringWriter err, String... args) {
        CommandLine cl = RevisitCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        return cl.execute(args);
    }

    /** Writes {@code count} 320x240 PNGs of random 8x8-pixel blocks (seeded), which are rich in corners. */
    private Path blockImages(int count) throws Exception {
        Path folder = Files.createDirectories(dir.resolve("frames"));
        SplittableRandom rnd = new SplittableRandom(5);
        for (int i = 0; i < count; i++) {
            BufferedImage image = new BufferedImage(320, 240, BufferedImage.TYPE_BYTE_GRAY);
            for (int by = 0; by < 240; by += 8) {
                for (int bx = 0; bx < 320; bx += 8) {
                    int grey = rnd.nextInt(256);
                    for (int y = by; y < by + 8; y++) {
                        for (int x = bx; x < bx + 8; x++) {
                            image.getRaster().setSample(x, y, 0, grey);
                        }
                    }
                }
            }
            ImageIO.write(image, "png", folder.resolve(String.format("f%02d.png", i)).toFile());
        }
        return folder;
    }

    @Test
    void trainsOnAnImageFolderAndRecordsWhatItWasTrainedOn() throws Exception {
        Path frames = blockImages(3);
        Path file = dir.resolve("v.rvoc");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = run(out, err, "vocab-train", frames.toString(), "-o", file.toString(), "--branching", "5",
                "--depth", "3", "--seed", "11", "--quiet");
        assertEquals(0, code, err.toString());
        Vocabulary v = VocabularyFile.read(file);
        assertEquals(5, v.branching());
        assertEquals(3, v.depth());
        assertEquals(3, v.provenance().imageCount());
        assertEquals(11, v.provenance().seed());
        assertTrue(v.provenance().descriptorCount() > 300, "descriptors " + v.provenance().descriptorCount());
        assertTrue(v.wordCount() > 25, "words " + v.wordCount());
        assertEquals(VocabTrainCommand.descriptorKind(FeatureConfig.defaults()), v.descriptorKind());
        assertTrue(v.provenance().sources().get(0).startsWith(frames + " (3 frames, "),
                v.provenance().sources().get(0));
        assertTrue(v.provenance().command().startsWith("revisit vocab-train " + frames), v.provenance().command());
        assertTrue(out.toString().contains("branching k = 5, depth L = 3"), out.toString());
        assertEquals("", err.toString());
    }

    @Test
    void trainsOnRealPhotos() {
        // photos/chair: 21 real 640x480 photos, CC BY 4.0, P. Abeles, BoofCV-Data (../shared/data/README.md).
        Path chair = VocabTestData.require("photos/chair");
        Path file = dir.resolve("chair.rvoc");
        StringWriter err = new StringWriter();
        int code = run(new StringWriter(), err, "vocab-train", chair.toString(), "-o", file.toString(),
                "--depth", "3", "--quiet");
        assertEquals(0, code, err.toString());
        Vocabulary v = VocabularyFile.read(file);
        assertEquals(21, v.provenance().imageCount());
        // 21 textured photos give thousands of descriptors: a 3-level, 10-way tree should be nearly full.
        assertTrue(v.wordCount() > 900, "words " + v.wordCount());
    }

    @Test
    void shippedVocabularyWasTrainedOnTheDefaultDescriptor() {
        // Changing FeatureConfig defaults (pattern seed, angle bins, blur) invalidates vocab/default.rvoc: retrain
        // it with the recipe in vocab/README.md.
        Vocabulary v = VocabularyFile.read(Path.of(System.getProperty("user.dir")).resolve("vocab/default.rvoc"));
        assertEquals(VocabTrainCommand.descriptorKind(FeatureConfig.defaults()), v.descriptorKind());
    }

    @Test
    void namesTheVideoStepAsAnOrdinal() {
        assertEquals("2nd", VocabTrainCommand.ordinal(2));
        assertEquals("3rd", VocabTrainCommand.ordinal(3));
        assertEquals("5th", VocabTrainCommand.ordinal(5));
        assertEquals("12th", VocabTrainCommand.ordinal(12));
        assertEquals("21st", VocabTrainCommand.ordinal(21));
    }

    @Test
    void reportsAMissingInputInOneLine() {
        StringWriter err = new StringWriter();
        int code = run(new StringWriter(), err, "vocab-train", dir.resolve("nowhere").toString(), "-o",
                dir.resolve("v.rvoc").toString(), "--quiet");
        assertEquals(1, code);
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertTrue(err.toString().contains("nowhere"), err.toString());
        assertTrue(Files.notExists(dir.resolve("v.rvoc")));
    }

    @Test
    void rejectsABranchingOutsideItsRangeAsAUsageError() {
        assertEquals(2, run(new StringWriter(), new StringWriter(), "vocab-train", dir.toString(), "-o",
                dir.resolve("v.rvoc").toString(), "--branching", "1"));
    }
}
