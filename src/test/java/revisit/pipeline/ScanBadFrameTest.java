package revisit.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.io.BadFramePolicy;
import revisit.vocabulary.Vocabulary;
import revisit.vocabulary.VocabularyFile;

/**
 * A damaged image in the middle of a folder (images are decoded on the worker threads): with the skip policy it is
 * reported once and every other frame is scanned in order; with the stop policy the frames before it are scanned,
 * none after it, and the reason names the file.
 */
class ScanBadFrameTest {

    private static final Vocabulary VOCABULARY = VocabularyFile.read(Path.of("vocab/default.rvoc"));

    @TempDir
    Path dir;

    @BeforeEach
    void writeFrames() throws IOException {
        Random random = new Random(5);
        for (int i = 0; i < 6; i++) {
            BufferedImage img = new BufferedImage(96, 72, BufferedImage.TYPE_BYTE_GRAY);
            for (int y = 0; y < 72; y++) {
                for (int x = 0; x < 96; x++) {
                    img.getRaster().setSample(x, y, 0, random.nextInt(256));
                }
            }
            ImageIO.write(img, "png", dir.resolve(String.format("f%02d.png", i)).toFile());
        }
        byte[] whole = Files.readAllBytes(dir.resolve("f02.png"));
        Files.write(dir.resolve("f02.png"), Arrays.copyOf(whole, whole.length / 3));
    }

    private ScanResult scan(BadFramePolicy policy) {
        ScanConfig config = ScanConfig.defaults();
        config = config.withScan(config.scan().withBadFrames(policy).withThreads(2));
        return new Scanner(config, VOCABULARY, Optional.empty(), Scanner.Options.defaults())
                .run(SequenceInput.ofAll(List.of(dir)), ScanListener.silent());
    }

    @Test
    void skipReportsTheDamagedFrameOnceAndScansTheRestInOrder() {
        ScanResult r = scan(BadFramePolicy.SKIP);
        assertEquals(1, r.skipped().size(), r.skipped().toString());
        assertTrue(r.skipped().get(0).contains("f02.png"), r.skipped().get(0));
        assertEquals(List.of(0, 1, 3, 4, 5), r.traces().stream().map(QueryTrace::frame).toList());
        assertEquals("", r.stoppedEarly());
    }

    @Test
    void stopKeepsTheFramesBeforeTheDamagedOneAndNoneAfter() {
        ScanResult r = scan(BadFramePolicy.STOP);
        assertEquals(List.of(0, 1), r.traces().stream().map(QueryTrace::frame).toList());
        assertTrue(r.stoppedEarly().contains("f02.png"), r.stoppedEarly());
        assertEquals(1, r.skipped().size());
    }
}
