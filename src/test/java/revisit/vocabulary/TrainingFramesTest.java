package revisit.vocabulary;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.features.FeatureConfig;
import revisit.io.BadFrameException;
import revisit.io.FrameSource;
import revisit.io.FrameSources;

class TrainingFramesTest {

    @TempDir
    Path dir;

    /** {@code count} 240x180 PNGs of random 6x6-pixel grey blocks (seeded): plenty of corners. */
    private Path blockImages(int count) throws Exception {
        Path folder = Files.createDirectories(dir.resolve("frames"));
        SplittableRandom rnd = new SplittableRandom(21);
        for (int i = 0; i < count; i++) {
            BufferedImage image = new BufferedImage(240, 180, BufferedImage.TYPE_BYTE_GRAY);
            for (int y = 0; y < 180; y++) {
                for (int x = 0; x < 240; x++) {
                    if (x % 6 == 0 && y % 6 == 0) {
                        int grey = rnd.nextInt(256);
                        for (int dy = 0; dy < 6; dy++) {
                            for (int dx = 0; dx < 6; dx++) {
                                image.getRaster().setSample(x + dx, y + dy, 0, grey);
                            }
                        }
                    }
                }
            }
            ImageIO.write(image, "png", folder.resolve(String.format("f%02d.png", i)).toFile());
        }
        return folder;
    }

    private static final class Recorder implements TrainingFrames.Listener {
        final List<Integer> added = new ArrayList<>();
        final List<BadFrameException> skipped = new ArrayList<>();

        @Override
        public void frameAdded(int frames) {
            added.add(frames);
        }

        @Override
        public void frameSkipped(BadFrameException problem) {
            skipped.add(problem);
        }
    }

    private TrainingSet collect(Path folder, int threads, int max, Recorder recorder) {
        TrainingSet.Builder set = new TrainingSet.Builder();
        try (TrainingFrames frames = new TrainingFrames(FeatureConfig.defaults(), threads);
             FrameSource source = FrameSources.open(folder, 30.0)) {
            frames.collect(source, set, max, recorder);
        }
        return set.build();
    }

    @Test
    void collectsTheSameDescriptorsInFrameOrderOnOneOrTwoThreads() throws Exception {
        Path folder = blockImages(6);
        Recorder one = new Recorder();
        TrainingSet a = collect(folder, 1, Integer.MAX_VALUE, one);
        TrainingSet b = collect(folder, 2, Integer.MAX_VALUE, new Recorder());
        assertEquals(6, a.imageCount());
        assertTrue(a.count() > 600, "descriptors " + a.count());
        assertArrayEquals(a.imageStarts(), b.imageStarts());
        assertArrayEquals(a.descriptors(), b.descriptors());
        assertEquals(List.of(1, 2, 3, 4, 5, 6), one.added);
    }

    @Test
    void stopsAtTheDescriptorCapAndSkipsUnreadableFrames() throws Exception {
        Path folder = blockImages(4);
        Files.writeString(folder.resolve("f01b.png"), "this is not a PNG");
        Recorder recorder = new Recorder();
        TrainingSet all = collect(folder, 2, Integer.MAX_VALUE, recorder);
        assertEquals(4, all.imageCount());
        assertEquals(1, recorder.skipped.size());
        assertTrue(recorder.skipped.get(0).getMessage().contains("f01b.png"), recorder.skipped.get(0).getMessage());
        int cap = all.imageStarts()[1] + 10;
        TrainingSet capped = collect(folder, 2, cap, new Recorder());
        assertEquals(cap, capped.count());
        assertEquals(2, capped.imageCount());
    }
}
