package revisit.pipeline;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import revisit.features.FrameFeatures;
import revisit.io.BadInputException;

class FrameCacheTest {

    @TempDir
    Path dir;

    static FrameRecord randomRecord(int frame, Random rand) {
        int n = 5 + rand.nextInt(20);
        float[] x = new float[n];
        float[] y = new float[n];
        int[] level = new int[n];
        int[] words = new int[n];
        int[] nodes = new int[n];
        long[] desc = new long[n * FrameFeatures.STRIDE];
        for (int i = 0; i < n; i++) {
            x[i] = rand.nextFloat() * 640;
            y[i] = rand.nextFloat() * 480;
            level[i] = rand.nextInt(8);
            words[i] = rand.nextInt(100_000);
            nodes[i] = rand.nextInt(1000);
        }
        for (int i = 0; i < desc.length; i++) {
            desc[i] = rand.nextLong();
        }
        FrameFeatures f = new FrameFeatures(n, x, y, new float[n], level, new float[n], new float[n], desc);
        return new FrameRecord(0, frame, frame * 0.1, "f" + frame + ".png", f, words, nodes);
    }

    @Test
    void keepsCompleteRecordsAndCutsATornTail() throws Exception {
        Path file = dir.resolve("scan.ckpt");
        Random rand = new Random(3);
        FrameRecord[] written = new FrameRecord[6];
        try (FrameCache cache = FrameCache.open(file, 42L)) {
            for (int i = 0; i < written.length; i++) {
                written[i] = randomRecord(i, rand);
                cache.append(written[i]);
            }
        }
        long full = Files.size(file);
        try (RandomAccessFile raf = new RandomAccessFile(file.toFile(), "rw")) {
            raf.setLength(full - 13); // tear the last record as a kill -9 mid-write would
        }
        try (FrameCache cache = FrameCache.open(file, 42L)) {
            assertEquals(5, cache.recovered().size());
            for (int i = 0; i < 5; i++) {
                FrameRecord r = cache.recovered().get(i);
                assertEquals(written[i].frame(), r.frame());
                assertArrayEquals(written[i].features().descriptors(), r.features().descriptors());
                assertArrayEquals(written[i].words(), r.words());
                assertArrayEquals(written[i].features().x(), r.features().x());
            }
            cache.append(written[5]);
        }
        try (FrameCache cache = FrameCache.open(file, 42L)) {
            assertEquals(6, cache.recovered().size());
            assertEquals(5, cache.recovered().get(5).frame());
        }
    }

    @Test
    void flippedByteDropsTheDamagedRecordOnwards() throws Exception {
        Path file = dir.resolve("scan.ckpt");
        Random rand = new Random(4);
        try (FrameCache cache = FrameCache.open(file, 1L)) {
            for (int i = 0; i < 4; i++) {
                cache.append(randomRecord(i, rand));
            }
        }
        byte[] bytes = Files.readAllBytes(file);
        bytes[bytes.length - 30] ^= 0x40;
        Files.write(file, bytes);
        try (FrameCache cache = FrameCache.open(file, 1L)) {
            assertEquals(3, cache.recovered().size());
        }
    }

    @Test
    void refusesACheckpointMadeWithOtherSettings() {
        Path file = dir.resolve("scan.ckpt");
        FrameCache.open(file, 1L).close();
        BadInputException e = assertThrows(BadInputException.class, () -> FrameCache.open(file, 2L));
        assertEquals(true, e.getMessage().contains("--fresh"), e.getMessage());
    }

    @Test
    void refusesAForeignFile() throws Exception {
        Path file = dir.resolve("scan.ckpt");
        Files.writeString(file, "hello, this is not a checkpoint at all");
        assertThrows(BadInputException.class, () -> FrameCache.open(file, 1L));
    }
}
